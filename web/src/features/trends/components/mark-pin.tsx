import type { KeyboardEvent } from 'react';
import type { ChartMark } from '../utils/chart-data';
import { markDates } from './chart-frame';

/**
 * A mark's pin inside a chart: a numbered marker at the top of its first day. A press on it opens
 * the mark (and does not start a new pin underneath).
 */
export function MarkPin({
  chartMark,
  cx,
  cy,
  onOpen,
  selected = false,
}: {
  chartMark: ChartMark;
  cx: number;
  cy: number;
  onOpen?: (markId: string) => void;
  selected?: boolean;
}) {
  const { mark, number } = chartMark;
  const label = `Mark ${number}, ${markDates(mark.fromDate, mark.toDate)}${mark.unread ? ', new' : ''}`;
  const open = onOpen ? () => onOpen(mark.id) : undefined;
  return (
    <g
      role={open ? 'button' : 'img'}
      tabIndex={open ? 0 : undefined}
      aria-label={label}
      aria-pressed={open ? selected : undefined}
      data-pin-mark-id={mark.id}
      style={open ? { cursor: 'pointer' } : undefined}
      onMouseDown={(e) => e.stopPropagation()}
      onClick={(e) => {
        e.stopPropagation();
        open?.();
      }}
      onKeyDown={(e: KeyboardEvent) => {
        if (open && (e.key === 'Enter' || e.key === ' ')) {
          e.preventDefault();
          e.stopPropagation();
          open();
        }
      }}
    >
      <title>{label}</title>
      <circle cx={cx} cy={cy} r={14} fill="transparent" />
      {selected ? (
        <circle cx={cx} cy={cy} r={12} fill="none" stroke="var(--color-accent)" strokeWidth={2.5} />
      ) : null}
      <circle cx={cx} cy={cy} r={9} fill="var(--color-mark)" stroke="var(--color-ink)" strokeWidth={1.2} />
      <text
        x={cx}
        y={cy}
        dy="0.35em"
        textAnchor="middle"
        fontSize={10}
        fontWeight={700}
        fill="var(--color-ink)"
        style={{ fontVariantNumeric: 'tabular-nums' }}
      >
        {number}
      </text>
      {mark.unread ? (
        <circle cx={cx + 8} cy={cy - 8} r={3} fill="var(--color-accent)" stroke="var(--color-surface)" />
      ) : null}
    </g>
  );
}
