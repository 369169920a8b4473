import { cn } from '@/lib/cn';
import { TREND_RANGE_LABELS, TREND_RANGES, type TrendRange } from '../utils/range';

/** The range the charts cover: a row of pressed/unpressed buttons. */
export function RangePicker({
  value,
  onChange,
  className,
}: {
  value: TrendRange;
  onChange: (range: TrendRange) => void;
  className?: string;
}) {
  return (
    <div
      role="group"
      aria-label="Range"
      className={cn('inline-flex rounded-md border border-line-strong bg-surface p-0.5', className)}
    >
      {TREND_RANGES.map((r) => (
        <button
          key={r}
          type="button"
          aria-pressed={r === value}
          onClick={() => onChange(r)}
          className={cn(
            'min-h-touch rounded-[calc(var(--radius-md)-2px)] px-4 text-sm font-semibold sm:min-h-9',
            r === value ? 'bg-accent text-on-accent' : 'text-ink-muted hover:bg-sunken hover:text-ink',
          )}
        >
          {TREND_RANGE_LABELS[r]}
        </button>
      ))}
    </div>
  );
}
