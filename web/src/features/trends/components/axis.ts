import { DISPLAY_LOCALE, formatNumber } from '@/lib/format';

const dayMonth = new Intl.DateTimeFormat(DISPLAY_LOCALE, { day: 'numeric', month: 'short', timeZone: 'UTC' });

/** A date-axis tick: "3 May". */
export function tickDate(value: unknown): string {
  if (typeof value !== 'string') return '';
  const [y, m, d] = value.split('-').map(Number);
  if (!y || !m || !d) return value;
  return dayMonth.format(new Date(Date.UTC(y, m - 1, d)));
}

export function tickNumber(digits = 0) {
  return (value: unknown) => (typeof value === 'number' ? formatNumber(value, digits) : String(value));
}

/** Shared look of the axes and grid: dark enough to print, quiet on screen. */
export const AXIS_TICK = { fontSize: 11, fill: 'var(--color-ink-muted)' } as const;
export const AXIS_STROKE = 'var(--color-line-strong)';
export const GRID_STROKE = 'var(--color-line)';
export const CHART_MARGIN = { top: 22, right: 12, bottom: 0, left: 0 } as const;
