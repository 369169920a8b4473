import { DRIFT_STATE_LABELS, type DriftState } from '@driftmark/shared';
import { Badge } from '@/components/ui/badge';
import { DRIFT_STATE_STYLE } from '@/lib/drift-states';

/** A drift state as the tables and the tooltip show it: its shape, its label, its colour. */
export function DriftStateBadge({ state, className }: { state: DriftState; className?: string }) {
  return (
    <Badge tone={DRIFT_STATE_STYLE[state].tone} className={className}>
      {DRIFT_STATE_LABELS[state]}
    </Badge>
  );
}

/**
 * The state's shape drawn inside a chart at (cx, cy): filled dot, half-filled dot, square, dashed
 * ring, clock (the same shapes as the badges), so print and colour-blind readers tell states apart.
 */
export function ChartGlyph({
  state,
  cx,
  cy,
  r = 4,
}: {
  state: DriftState;
  cx: number;
  cy: number;
  r?: number;
}) {
  const { color, shape } = DRIFT_STATE_STYLE[state];
  switch (shape) {
    case 'dot':
      return <circle cx={cx} cy={cy} r={r} fill={color} stroke="var(--color-surface)" strokeWidth={1} />;
    case 'half':
      return (
        <g>
          <circle cx={cx} cy={cy} r={r - 0.5} fill="var(--color-surface)" stroke={color} strokeWidth={1.4} />
          <path d={`M${cx} ${cy - r + 0.5}a${r - 0.5} ${r - 0.5} 0 0 1 0 ${2 * r - 1}z`} fill={color} />
        </g>
      );
    case 'square':
      return (
        <rect
          x={cx - r}
          y={cy - r}
          width={2 * r}
          height={2 * r}
          rx={1}
          fill={color}
          stroke="var(--color-surface)"
          strokeWidth={1}
        />
      );
    case 'clock':
      return (
        <g>
          <circle cx={cx} cy={cy} r={r - 0.5} fill="var(--color-surface)" stroke={color} strokeWidth={1.4} />
          <path
            d={`M${cx} ${cy - r * 0.55}V${cy}H${cx + r * 0.45}`}
            fill="none"
            stroke={color}
            strokeWidth={1.2}
          />
        </g>
      );
    case 'ring':
      return (
        <circle
          cx={cx}
          cy={cy}
          r={r - 0.5}
          fill="var(--color-surface)"
          stroke={color}
          strokeWidth={1.5}
          strokeDasharray="2 1.5"
        />
      );
  }
}

/** The same glyph as a small inline image (legends). */
export function GlyphSwatch({ state }: { state: DriftState }) {
  return (
    <svg width="12" height="12" viewBox="0 0 12 12" aria-hidden="true" className="shrink-0">
      <ChartGlyph state={state} cx={6} cy={6} r={5} />
    </svg>
  );
}
