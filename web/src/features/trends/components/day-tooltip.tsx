import { DRIFT_METRIC_LABELS, type DriftMetric, type TrendDay } from '@driftmark/shared';
import { Badge } from '@/components/ui/badge';
import { formatDate, formatVolume, formatWeight } from '@/lib/format';
import { actualAndTarget } from '../utils/chart-data';
import { DriftStateBadge } from './drift-glyph';
import { actualOverTarget, type ViewerUnits } from './metric-values';

interface DayTooltipProps {
  day: TrendDay | undefined;
  /** The date shown when the day has no row (a day past the range, on the way to the event). */
  date: string;
  units: ViewerUnits;
  /** Show weight and trend. */
  weight?: boolean;
  /** Which metrics' drift to show (default: every metric with a target that day). */
  metrics?: readonly DriftMetric[];
  /** Extra lines (the projection on the event date). */
  extra?: React.ReactNode;
}

/** One day in a chart's tooltip: the date and countdown day, values against targets, each metric's drift. */
export function DayTooltip({ day, date, units, weight = false, metrics, extra }: DayTooltipProps) {
  const drift = day ? day.drift.filter((e) => !metrics || metrics.includes(e.metric)) : [];
  const untargeted =
    day && metrics
      ? metrics.filter((m) => !day.drift.some((e) => e.metric === m) && untargetedActual(day, m) !== null)
      : [];
  return (
    <div
      data-day-tooltip={date}
      className="max-w-72 min-w-52 rounded-md border border-line-strong bg-surface px-3 py-2.5 text-sm text-ink shadow-card print:hidden"
    >
      <p className="flex flex-wrap items-center justify-between gap-2 font-semibold tabular-nums">
        {formatDate(date)}
        {day?.countdown ? <Badge tone="caution">{day.countdown.dayLabel}</Badge> : null}
      </p>
      {weight && day ? (
        <dl className="mt-1.5 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 tabular-nums">
          <dt className="text-ink-muted">Weigh-in</dt>
          <dd className="text-right font-semibold">
            {day.weightKg !== null ? formatWeight(day.weightKg, units.weight) : 'not weighed'}
          </dd>
          {day.trendKg !== null ? (
            <>
              <dt className="text-ink-muted">Trend</dt>
              <dd className="text-right">{formatWeight(day.trendKg, units.weight)}</dd>
            </>
          ) : null}
          {day.mean7Kg !== null ? (
            <>
              <dt className="text-ink-muted">7-day mean</dt>
              <dd className="text-right">{formatWeight(day.mean7Kg, units.weight)}</dd>
            </>
          ) : null}
        </dl>
      ) : null}
      {drift.length > 0 || untargeted.length > 0 ? (
        <ul className="mt-2 space-y-1 border-t border-line pt-2">
          {drift.map((e) => (
            <li
              key={e.metric}
              data-metric={e.metric}
              data-state={e.state}
              className="flex flex-wrap items-center justify-between gap-x-3 gap-y-0.5"
            >
              <span className="font-medium">{DRIFT_METRIC_LABELS[e.metric]}</span>
              <span className="flex items-center gap-2">
                <span className="text-ink-muted tabular-nums">
                  {actualOverTarget(e.metric, e.actual, e.target, units)}
                </span>
                <DriftStateBadge state={e.state} />
              </span>
            </li>
          ))}
          {untargeted.map((m) => (
            <li key={m} className="flex justify-between gap-3">
              <span className="font-medium">{DRIFT_METRIC_LABELS[m]}</span>
              <span className="text-ink-muted tabular-nums">
                {actualOverTarget(m, untargetedActual(day!, m), null, units)} (no target)
              </span>
            </li>
          ))}
        </ul>
      ) : day && metrics && !weight ? (
        <p className="mt-1 text-ink-muted">Nothing logged, no target.</p>
      ) : null}
      {day?.breach && day.breach.excessMl > 0 && (!metrics || metrics.includes('water')) ? (
        <p className="mt-2 font-medium text-caution">
          ▲ {formatVolume(day.breach.afterCutoffMl, units.volume)} after the {day.breach.cutoff} cut-off (
          {formatVolume(day.breach.excessMl, units.volume)} over the allowance)
        </p>
      ) : null}
      {extra}
    </div>
  );
}

function untargetedActual(day: TrendDay, metric: DriftMetric): number | null {
  return actualAndTarget(day, metric).actual;
}
