import { DRIFT_METRIC_LABELS, DRIFT_METRICS, type AdherenceWeekInRange } from '@driftmark/shared';
import { cn } from '@/lib/cn';
import { formatDate, formatNumber, NBSP } from '@/lib/format';
import { adherenceGrid } from '../utils/figures';

/**
 * Weekly adherence per metric: the share of logged days on plan, with the logged share beside it
 * (a day not logged never counts as on plan).
 */
export function AdherenceTable({
  adherence,
  className,
}: {
  adherence: readonly AdherenceWeekInRange[];
  className?: string;
}) {
  const grid = adherenceGrid(adherence, DRIFT_METRICS);
  if (grid.weeks.length === 0 || grid.metrics.length === 0) {
    return (
      <p className="text-sm text-ink-muted">No targets in this range, so there is no adherence to show.</p>
    );
  }
  const head = 'px-3 py-2.5 text-left font-semibold whitespace-nowrap';
  return (
    <div
      role="region"
      aria-label="Weekly adherence"
      tabIndex={0}
      className={cn('overflow-x-auto rounded-lg border border-line bg-surface shadow-card', className)}
    >
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">
          Weekly adherence: share of logged days on plan for each metric, and how many days were logged.
        </caption>
        <thead>
          <tr className="border-b border-line bg-sunken text-xs tracking-wide text-ink-muted uppercase">
            <th scope="col" className={head}>
              Week
            </th>
            {grid.metrics.map((m) => (
              <th key={m} scope="col" className={head}>
                {DRIFT_METRIC_LABELS[m]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {grid.weeks.map((week) => (
            <tr key={week.weekStart}>
              <th scope="row" className="px-3 py-2 text-left font-semibold whitespace-nowrap tabular-nums">
                {formatDate(week.from, 'short')} – {formatDate(week.to, 'short')}
                {week.partial ? (
                  <span className="block text-xs font-normal text-ink-muted">
                    partial week: {week.days} {week.days === 1 ? 'day' : 'days'} in range
                  </span>
                ) : null}
              </th>
              {grid.metrics.map((m) => {
                const w = grid.at(week.weekStart, m);
                if (!w || w.targetDays === 0) {
                  return (
                    <td key={m} className="px-3 py-2 text-ink-faint">
                      —
                    </td>
                  );
                }
                return (
                  <td key={m} className="px-3 py-2 whitespace-nowrap tabular-nums">
                    <span className="block font-semibold text-ink">
                      {w.adherence !== null ? `${formatNumber(w.adherence * 100)}${NBSP}%` : '—'}
                    </span>
                    <span className="block text-xs text-ink-muted">
                      {w.onPlanDays}/{w.loggedDays} on plan · {w.loggedDays} of {w.targetDays} logged
                    </span>
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
