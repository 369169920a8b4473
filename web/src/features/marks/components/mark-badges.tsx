import { MARK_METRIC_LABELS, type MarkMetric } from '@driftmark/shared';
import { Badge } from '@/components/ui/badge';
import { cn } from '@/lib/cn';
import { formatNumber } from '@/lib/format';

/** The chart a mark is pinned to. */
export function MarkMetricBadge({ metric, className }: { metric: MarkMetric; className?: string }) {
  return (
    <Badge tone="accent" className={className}>
      {MARK_METRIC_LABELS[metric]}
    </Badge>
  );
}

/** The brand's mark dot; decoration only, always beside words that say the same. */
function MarkDot({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 8 8" aria-hidden="true" className={cn('size-2 shrink-0', className)}>
      <circle cx="4" cy="4" r="3.5" fill="var(--color-mark)" stroke="var(--color-ink)" strokeWidth="0.8" />
    </svg>
  );
}

/** "New" beside a mark that holds something the viewer has not read: a dot and the word. */
export function NewMarker({ className }: { className?: string }) {
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1.5 rounded-pill border border-accent/40 bg-accent-soft px-2 py-0.5 text-xs font-bold text-accent-strong',
        className,
      )}
    >
      <MarkDot />
      New
    </span>
  );
}

/**
 * How many marks are new for the viewer, for a nav item or a heading ("2 new"); nothing when none.
 * Screen readers hear "2 new marks".
 */
export function UnreadMarksBadge({ count, className }: { count: number; className?: string }) {
  if (count <= 0) return null;
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1 rounded-pill bg-accent px-1.5 py-px text-xs leading-4 font-bold text-on-accent tabular-nums',
        className,
      )}
    >
      <MarkDot />
      {formatNumber(count)}
      <span className="sr-only"> new {count === 1 ? 'mark' : 'marks'}</span>
    </span>
  );
}
