import {
  DRIFT_METRIC_LABELS,
  weightFromKg,
  WEIGHT_UNIT_LABELS,
  type RateView,
  type TrendView,
} from '@driftmark/shared';
import { formatDate, formatNumber, NBSP } from '@/lib/format';
import { addDays } from '../utils/dates';
import { latestWeek, signed, type WeekSummary } from '../utils/figures';
import type { ViewerUnits } from './metric-values';

function bandWords(band: NonNullable<RateView['band']>): string {
  const lo = Math.min(band.minPct, band.maxPct);
  const hi = Math.max(band.minPct, band.maxPct);
  const sameSign = (lo <= 0 && hi <= 0) || (lo >= 0 && hi >= 0);
  const a = sameSign ? formatNumber(Math.min(Math.abs(lo), Math.abs(hi)), 2) : signed(lo, 2);
  const b = sameSign ? formatNumber(Math.max(Math.abs(lo), Math.abs(hi)), 2) : signed(hi, 2);
  return `${a} to ${b}${NBSP}% a week`;
}

/** The 14-day rate against the plan's pace, said plainly. */
export function rateInWords(rate: RateView | null, units: Pick<ViewerUnits, 'weight'>): string {
  if (!rate)
    return 'There are not enough weigh-ins in the last 14 days to work out a rate yet: it takes at least 7.';
  const pct = Math.abs(rate.percentPerWeek);
  const amount = `${formatNumber(Math.abs(weightFromKg(rate.kgPerWeek, units.weight)), 1)}${NBSP}${WEIGHT_UNIT_LABELS[units.weight]}`;
  const first =
    pct < 0.05
      ? 'Over the last 14 days your trend has held steady.'
      : `Over the last 14 days your trend has gone ${rate.kgPerWeek < 0 ? 'down' : 'up'} by about ${amount} a week (${formatNumber(pct, 1)}${NBSP}% of your body weight).`;
  // In a countdown the server withholds the band and says why; say it too.
  if (rate.paused) return `${first} ${rate.bandNote ?? ''}`.trim();
  const pace = rate.verdict?.pace ?? null;
  if (!rate.band || pace === null) return first;
  const words = bandWords(rate.band);
  const second = {
    inside: `That is within the pace your plan aims for (${words}).`,
    faster: `That is faster than the pace your plan aims for (${words}); your coach sees this too.`,
    slower: `That is slower than the pace your plan aims for (${words}).`,
    outside: `That is outside the steady range your plan aims for (${words}).`,
  }[pace];
  return `${first} ${second}`;
}

function weekWords(w: WeekSummary): string {
  const notLogged = w.targetDays - w.loggedDays;
  if (w.loggedDays === 0)
    return `not logged on any of the ${w.targetDays} ${w.targetDays === 1 ? 'day' : 'days'}.`;
  const base = `on plan on ${w.onPlanDays} of the ${w.loggedDays} ${w.loggedDays === 1 ? 'day' : 'days'} you logged`;
  return notLogged > 0 ? `${base}; ${notLogged} ${notLogged === 1 ? 'day' : 'days'} not logged.` : `${base}.`;
}

/** The athlete's figures in plain words: the rate against the plan's pace and the latest week's adherence. */
export function TrendInWords({ view, units }: { view: TrendView; units: ViewerUnits }) {
  const week = latestWeek(view.adherence);
  const span = week[0];
  const current = span !== undefined && addDays(span.weekStart, 6) >= view.today;
  return (
    <div className="space-y-3 text-ink">
      <p data-testid="rate-words">{rateInWords(view.rate, units)}</p>
      {span !== undefined ? (
        <div>
          <p className="font-semibold">
            {current ? 'This week so far' : span.partial ? 'Part of a week' : 'Week'} (
            {formatDate(span.from, 'short')} – {formatDate(span.to, 'short')}
            {span.partial ? `, ${span.days} ${span.days === 1 ? 'day' : 'days'}` : ''})
          </p>
          <ul className="mt-1 space-y-1 text-sm text-ink-muted">
            {week.map((w) => (
              <li key={w.metric}>
                <span className="font-semibold text-ink">{DRIFT_METRIC_LABELS[w.metric]}</span>:{' '}
                {weekWords(w)}
              </li>
            ))}
          </ul>
        </div>
      ) : (
        <p className="text-sm text-ink-muted">
          Once your plan has targets, how closely you kept to them shows here.
        </p>
      )}
    </div>
  );
}
