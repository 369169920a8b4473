import type { DriftState } from '@driftmark/shared';
import { useId } from 'react';
import { DRIFT_STATE_STYLE } from '@/lib/drift-states';

/** Ids of the textures one chart paints with (unique per chart, safe inside `url(#…)`). */
export interface ChartPatternIds {
  drifting: string;
  offPlan: string;
  countdown: string;
}

export function useChartPatternIds(): ChartPatternIds {
  const base = `dm${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  return { drifting: `${base}-drifting`, offPlan: `${base}-off-plan`, countdown: `${base}-countdown` };
}

/**
 * Textures beside the colours: drifting bars are hatched one way, off-plan bars cross-hatched,
 * countdown days striped, so the states survive greyscale print and colour-blind reading.
 * Drawn in a zero-size SVG next to the chart; the chart's shapes point at them by id.
 */
export function ChartPatterns({ ids }: { ids: ChartPatternIds }) {
  const drifting = DRIFT_STATE_STYLE.drifting;
  const off = DRIFT_STATE_STYLE.off_plan;
  return (
    <svg width="0" height="0" aria-hidden="true" focusable="false" style={{ position: 'absolute' }}>
      <defs>
        <pattern
          id={ids.drifting}
          width="6"
          height="6"
          patternUnits="userSpaceOnUse"
          patternTransform="rotate(45)"
        >
          <rect width="6" height="6" fill={drifting.soft} />
          <path d="M0 3H6" stroke={drifting.color} strokeWidth="1.6" />
        </pattern>
        <pattern
          id={ids.offPlan}
          width="6"
          height="6"
          patternUnits="userSpaceOnUse"
          patternTransform="rotate(45)"
        >
          <rect width="6" height="6" fill={off.soft} />
          <path d="M0 3H6M3 0V6" stroke={off.color} strokeWidth="1.3" />
        </pattern>
        <pattern
          id={ids.countdown}
          width="8"
          height="8"
          patternUnits="userSpaceOnUse"
          patternTransform="rotate(-45)"
        >
          <rect width="8" height="8" fill="var(--color-caution-soft)" />
          <path d="M0 4H8" stroke="var(--color-caution)" strokeOpacity="0.28" strokeWidth="1" />
        </pattern>
      </defs>
    </svg>
  );
}

/**
 * A bar's paint for its drift state (no target: a plain neutral bar). The day in progress is hollow
 * with a dashed outline: figures so far, not a verdict.
 */
export function barPaint(
  state: DriftState | null,
  ids: ChartPatternIds,
): { fill: string; stroke: string; dash?: string } {
  switch (state) {
    case 'in_progress':
      return { fill: 'var(--color-surface)', stroke: DRIFT_STATE_STYLE.in_progress.color, dash: '4 3' };
    case 'on_plan':
      return { fill: DRIFT_STATE_STYLE.on_plan.soft, stroke: DRIFT_STATE_STYLE.on_plan.color };
    case 'drifting':
      return { fill: `url(#${ids.drifting})`, stroke: DRIFT_STATE_STYLE.drifting.color };
    case 'off_plan':
      return { fill: `url(#${ids.offPlan})`, stroke: DRIFT_STATE_STYLE.off_plan.color };
    default:
      return { fill: 'var(--color-sunken)', stroke: 'var(--color-line-strong)' };
  }
}
