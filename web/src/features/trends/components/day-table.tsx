import { DRIFT_METRIC_LABELS, DRIFT_METRICS, type TrendDay } from '@driftmark/shared';
import { Link } from 'react-router';
import { Badge } from '@/components/ui/badge';
import { cn } from '@/lib/cn';
import { formatDate, formatVolume, formatWeight } from '@/lib/format';
import { actualAndTarget } from '../utils/chart-data';
import { DriftStateBadge } from './drift-glyph';
import { actualOverTarget, type ViewerUnits } from './metric-values';

interface DayTableProps {
  days: TrendDay[];
  units: ViewerUnits;
  /** Where a day opens (the day view); plain text without it. */
  dayHref?: (date: string) => string;
  className?: string;
}

/**
 * The range day by day, newest first: weight and trend, each metric's drift state (shape, label,
 * logged against target), cut-off breaches and countdown days. Scrolls sideways on narrow screens.
 */
export function DayTable({ days, units, dayHref, className }: DayTableProps) {
  const metrics = DRIFT_METRICS.filter((m) => days.some((d) => d.drift.some((e) => e.metric === m)));
  const rows = [...days].reverse();
  const hasBreaches = days.some((d) => d.breach && d.breach.excessMl > 0);
  const head = 'px-3 py-2.5 text-left font-semibold whitespace-nowrap';
  const cell = 'px-3 py-2 align-top whitespace-nowrap tabular-nums';
  return (
    <div
      role="region"
      aria-label="Days, newest first"
      tabIndex={0}
      className={cn(
        'relative max-h-[36rem] overflow-auto rounded-lg border border-line bg-surface shadow-card print:max-h-none print:overflow-visible',
        className,
      )}
    >
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">
          One row per day, newest first, with each metric’s drift from plan: logged against target and its
          state.
        </caption>
        <thead>
          <tr className="sticky top-0 z-10 border-b border-line bg-sunken text-xs tracking-wide text-ink-muted uppercase">
            <th scope="col" className={cn(head, 'sticky left-0 z-10 bg-sunken')}>
              Date
            </th>
            <th scope="col" className={head}>
              Weight
            </th>
            <th scope="col" className={head}>
              Trend
            </th>
            {metrics.map((m) => (
              <th key={m} scope="col" className={head}>
                {DRIFT_METRIC_LABELS[m]}
              </th>
            ))}
            {hasBreaches ? (
              <th scope="col" className={head}>
                Cut-off
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {rows.map((day) => (
            <tr
              key={day.date}
              data-date={day.date}
              className={day.countdown ? 'bg-caution-soft/40' : undefined}
            >
              <th scope="row" className={cn(cell, 'sticky left-0 bg-surface text-left font-semibold')}>
                <span className="flex items-center gap-2">
                  {dayHref ? (
                    <Link to={dayHref(day.date)}>{formatDate(day.date)}</Link>
                  ) : (
                    formatDate(day.date)
                  )}
                  {day.countdown ? <Badge tone="caution">{day.countdown.dayLabel}</Badge> : null}
                </span>
              </th>
              <td className={cell}>
                {day.weightKg !== null ? formatWeight(day.weightKg, units.weight) : '—'}
              </td>
              <td className={cn(cell, 'text-ink-muted')}>
                {day.trendKg !== null ? formatWeight(day.trendKg, units.weight) : '—'}
              </td>
              {metrics.map((m) => {
                const entry = day.drift.find((e) => e.metric === m);
                if (!entry) {
                  const { actual } = actualAndTarget(day, m);
                  return (
                    <td key={m} className={cn(cell, 'text-ink-faint')}>
                      {actual !== null ? `${actualOverTarget(m, actual, null, units)}` : '—'}
                    </td>
                  );
                }
                return (
                  <td key={m} className={cell} data-metric={m} data-state={entry.state}>
                    <span className="flex flex-col items-start gap-1">
                      <DriftStateBadge state={entry.state} />
                      <span className="text-xs text-ink-muted">
                        {actualOverTarget(m, entry.actual, entry.target, units)}
                      </span>
                    </span>
                  </td>
                );
              })}
              {hasBreaches ? (
                <td className={cell}>
                  {day.breach && day.breach.excessMl > 0 ? (
                    <span className="flex flex-col items-start gap-1">
                      <Badge tone="caution">Breach</Badge>
                      <span className="text-xs text-ink-muted">
                        +{formatVolume(day.breach.excessMl, units.volume)} after {day.breach.cutoff}
                      </span>
                    </span>
                  ) : (
                    <span className="text-ink-faint">—</span>
                  )}
                </td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
