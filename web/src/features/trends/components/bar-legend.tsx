import { DRIFT_STATE_LABELS } from '@driftmark/shared';
import { barPaint, type ChartPatternIds } from './chart-patterns';
import { LegendItem } from './chart-frame';
import { ChartGlyph } from './drift-glyph';

/** What the bars, their textures and shapes, the target line and the breach marker mean. */
export function BarLegend({ ids, breaches = false }: { ids: ChartPatternIds; breaches?: boolean }) {
  return (
    <>
      {(['on_plan', 'drifting', 'off_plan', 'in_progress'] as const).map((state) => {
        const paint = barPaint(state, ids);
        return (
          <LegendItem
            key={state}
            swatch={
              <>
                <rect
                  x="1"
                  y="3"
                  width="9"
                  height="8"
                  fill={paint.fill}
                  stroke={paint.stroke}
                  strokeDasharray={paint.dash ? '2 1.5' : undefined}
                />
                <ChartGlyph state={state} cx={14} cy={6} r={3.5} />
              </>
            }
          >
            {state === 'in_progress'
              ? `Today ${DRIFT_STATE_LABELS[state].toLowerCase()}`
              : DRIFT_STATE_LABELS[state]}
          </LegendItem>
        );
      })}
      <LegendItem swatch={<ChartGlyph state="not_logged" cx={9} cy={6} r={4} />}>
        {DRIFT_STATE_LABELS.not_logged}
      </LegendItem>
      <LegendItem swatch={<path d="M1 8h6V4h10" fill="none" stroke="var(--color-ink)" strokeWidth="2" />}>
        Target
      </LegendItem>
      {breaches ? (
        <LegendItem swatch={<path d="M9 1l5 9H4z" fill="var(--color-caution)" />}>
          Fluids after the cut-off
        </LegendItem>
      ) : null}
    </>
  );
}
