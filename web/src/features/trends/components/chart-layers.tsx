import { ReferenceArea, ReferenceDot, ReferenceLine } from 'recharts';
import type { ChartMark } from '../utils/chart-data';
import { MarkPin } from './mark-pin';

/**
 * The marks' extents (a dashed line for one day, a tinted area for a range) and their numbered pins
 * at the top of the plot. Returned as arrays so they sit directly among the chart's children.
 */
export function markLayers(
  chartMarks: ChartMark[],
  top: number,
  onMarkClick?: (markId: string) => void,
  selectedMarkId: string | null = null,
) {
  const extents = chartMarks.map((m) =>
    m.x1 === m.x2 ? (
      <ReferenceLine
        key={m.mark.id}
        x={m.x1}
        stroke={m.mark.id === selectedMarkId ? 'var(--color-ink)' : 'var(--color-mark)'}
        strokeWidth={m.mark.id === selectedMarkId ? 2.5 : 2}
        strokeDasharray="3 3"
        ifOverflow="hidden"
      />
    ) : (
      <ReferenceArea
        key={m.mark.id}
        x1={m.x1}
        x2={m.x2}
        fill="var(--color-mark)"
        fillOpacity={m.mark.id === selectedMarkId ? 0.32 : 0.16}
        stroke={m.mark.id === selectedMarkId ? 'var(--color-ink)' : 'var(--color-mark)'}
        strokeDasharray="3 3"
        ifOverflow="hidden"
      />
    ),
  );
  const pins = chartMarks.map((m) => (
    <ReferenceDot
      key={`pin-${m.mark.id}`}
      x={m.x1}
      y={top}
      ifOverflow="visible"
      shape={(p: { cx?: number; cy?: number }) => (
        <MarkPin
          chartMark={m}
          cx={p.cx ?? 0}
          cy={(p.cy ?? 0) + (m.row === 1 ? 12 : -10)}
          onOpen={onMarkClick}
          selected={m.mark.id === selectedMarkId}
        />
      )}
    />
  ));
  return { extents, pins };
}

/** The days being dragged across, while the pointer is down. */
export function selectionLayer(selection: { start: string; end: string } | null) {
  if (!selection) return null;
  const [x1, x2] =
    selection.start <= selection.end ? [selection.start, selection.end] : [selection.end, selection.start];
  return (
    <ReferenceArea
      x1={x1}
      x2={x2}
      fill="var(--color-mark)"
      fillOpacity={0.3}
      stroke="var(--color-ink)"
      strokeWidth={1}
    />
  );
}
