import { isInProgress, type TrendDay, type TrendFlag, type TrendView } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import { validationFailed } from '../errors.js';
import {
  flagsFor,
  maintenanceEstimate,
  mean7Series,
  projectTo,
  rate14,
  rateGuidance,
  trendSeries,
  weeklyAdherence,
  type WeighInPoint,
} from '../lib/analysis.js';
import { dayActuals } from '../lib/day-actuals.js';
import { dayDrift } from '../lib/day-drift.js';
import { dayPlanner } from '../lib/day-plan.js';
import { daysBetween, shiftDate } from '../lib/dates.js';
import { localDateTime } from '../lib/local-time.js';
import { weekSpanInRange } from '../lib/weekly-dates.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { TrendRepository, type AthleteHistory, type FluidRow } from '../repositories/trend.repository.js';

/** The longest range the trend answers at once, in days (three years). */
export const TREND_MAX_DAYS = 1100;
/** Days before `from` loaded so the first rows have their 7-day mean. */
const MEAN7_LEAD_DAYS = 6;
/** Days ending at the rate's end loaded for the maintenance estimate (its longest window). */
const MAINTENANCE_DAYS = 28;

const minDate = (a: string, b: string) => (a < b ? a : b);

/** Every weigh-in in the history as a plain point, the one before the window first. */
export function rawPoints(h: AthleteHistory): WeighInPoint[] {
  const points = h.weighIns.map((w) => ({ date: w.date, kg: w.kg }));
  return h.before ? [{ date: h.before.weighIn.date, kg: h.before.weighIn.kg }, ...points] : points;
}

/**
 * The smoothed trend after each weigh-in of the window. The smoothing starts from the trend before
 * the window (T = the EWMA state, computed in SQL) instead of the first weigh-in, which gives the
 * same numbers as smoothing every weigh-in from the first (Walker, The Hacker's Diet: Tᵢ depends on
 * the past only through Tᵢ₋₁).
 */
export function trendByDate(h: Pick<AthleteHistory, 'before' | 'weighIns'>): Map<string, number> {
  const seeded: WeighInPoint[] = h.weighIns.map((w) => ({ date: w.date, kg: w.kg }));
  if (h.before) seeded.unshift({ date: h.before.date, kg: h.before.trendKg });
  return new Map(trendSeries(seeded).map((t) => [t.date, t.trendKg]));
}

/**
 * The trend on each of `dates`: the smoothed trend after the last weigh-in on or before the date,
 * carried over unweighed days (from the trend before the window when there is one, never from
 * invented points); null before the first weigh-in. The trend table, the charts and the body
 * composition's masses all read the day's trend here.
 */
export function trendCarriedOn(
  h: Pick<AthleteHistory, 'before' | 'weighIns'>,
  dates: readonly string[],
): Map<string, number | null> {
  const trend = [...trendByDate(h)];
  const out = new Map<string, number | null>();
  let carried: number | null = h.before?.trendKg ?? null;
  let i = 0;
  for (const date of [...new Set(dates)].sort()) {
    // YYYY-MM-DD strings compare in calendar order; the trend's dates ascend.
    while (i < trend.length && trend[i]![0] <= date) carried = trend[i++]![1];
    out.set(date, carried);
  }
  return out;
}

/** Fluids per date. */
function fluidsByDate(fluids: readonly FluidRow[]): Map<string, FluidRow[]> {
  const map = new Map<string, FluidRow[]>();
  for (const f of fluids) {
    const list = map.get(f.date);
    if (list) list.push(f);
    else map.set(f.date, [f]);
  }
  return map;
}

/**
 * One row per calendar day from..to: weigh-in, trend carried over unweighed days (from the trend
 * before `from` when there is one, never from invented points), 7-day mean, logged totals, the
 * targets in force, drift and cut-off breach.
 */
export function trendDays(h: AthleteHistory, from: string, to: string, today: string): TrendDay[] {
  const weights = new Map(h.weighIns.map((w) => [w.date, w.kg]));
  const fluids = fluidsByDate(h.fluids);
  const planFor = dayPlanner(h.versions);
  const dates: string[] = [];
  for (let date = from; date <= to; date = shiftDate(date, 1)) dates.push(date);
  const means = mean7Series(rawPoints(h), dates);
  const trendOn = trendCarriedOn(h, dates);

  const days: TrendDay[] = [];
  for (const [i, date] of dates.entries()) {
    const meals = h.meals.get(date) ?? null;
    const dayFluids = fluids.get(date) ?? [];
    const evening = h.evenings.get(date) ?? null;
    const actuals = dayActuals(meals, dayFluids, evening);
    const plan = planFor(date);
    const { drift, breach } = dayDrift({ plan, actuals, fluids: dayFluids, date, today });
    days.push({
      date,
      weightKg: weights.get(date) ?? null,
      trendKg: trendOn.get(date) ?? null,
      mean7Kg: means[i] ?? null,
      actuals,
      targets: plan
        ? {
            energyKcal: plan.targets.energyKcal,
            proteinG: plan.targets.proteinG,
            carbohydrateG: plan.targets.carbohydrateG,
            fatG: plan.targets.fatG,
            waterMl: plan.targets.waterMl,
            sodiumMg: plan.targets.sodiumMg,
            steps: plan.targets.steps,
            cardioMinutes: plan.targets.cardioMinutes,
            fluidCutoff: plan.targets.fluidCutoff,
            versionNumber: plan.versionNumber,
          }
        : null,
      drift,
      breach,
      countdown: plan?.countdown
        ? { offset: plan.countdown.offset, dayLabel: plan.countdown.dayLabel }
        : null,
    });
  }
  return days;
}

/** The flags dated from..to: drops, rate, symptoms, missed weigh-ins (missed days counted up to `to`). */
export function trendFlags(
  h: AthleteHistory,
  rate: TrendView['rate'],
  from: string,
  to: string,
  today: string,
): TrendFlag[] {
  return flagsFor({
    points: rawPoints(h).filter((p) => p.date <= to),
    rate,
    symptoms: h.symptoms.filter((s) => s.date >= from && s.date <= to),
    from,
    // Missed weigh-ins count up to the day before `today`; for a past range, up to `to` itself.
    today: minDate(today, shiftDate(to, 1)),
  }).filter((f) => f.date <= to);
}

type TrendDeps = { dataSource: DataSource; clock: () => Date };

export class TrendService {
  constructor(private readonly deps: TrendDeps) {}

  /**
   * The trend view for from..to (at most TREND_MAX_DAYS): a fixed number of queries (six) whatever
   * the range. Rate and projection use the 14 days ending at `to` or today, whichever is earlier.
   */
  async getTrend(athlete: AthleteWithPeople, from: string, to: string): Promise<TrendView> {
    const span = daysBetween(from, to) + 1;
    if (span < 1) throw validationFailed({ to: 'Must be on or after the start date' });
    if (span > TREND_MAX_DAYS) throw validationFailed({ from: `At most ${TREND_MAX_DAYS} days at a time` });

    const today = localDateTime(this.deps.clock(), athlete.user.timeZone).date;
    const end = minDate(to, today);
    const loadFrom = minDate(shiftDate(from, -MEAN7_LEAD_DAYS), shiftDate(end, -(MAINTENANCE_DAYS - 1)));
    const loaded = await new TrendRepository(this.deps.dataSource.manager).load([
      { athleteId: athlete.id, from: loadFrom, to },
    ]);
    const h = loaded.get(athlete.id);
    if (!h) throw new Error('trend history missing for a loaded window');

    const all = trendDays(h, loadFrom, to, today);
    const days = all.filter((d) => d.date >= from);
    const points = rawPoints(h);
    const countdownAtEnd = all.find((d) => d.date === end)?.countdown != null;
    const rate = rate14(points, end, rateGuidance({ goal: athlete.goal, countdown: countdownAtEnd }));
    const trend = [...trendByDate(h)].map(([date, trendKg]) => ({ date, trendKg }));

    return {
      athleteId: athlete.id,
      from,
      to,
      today,
      eventDate: athlete.eventDate,
      days,
      rate,
      projection: projectTo(points, end, athlete.eventDate),
      adherence: weeklyAdherence(days).map((w) => ({ ...w, ...weekSpanInRange(w.weekStart, from, to) })),
      maintenance: maintenanceEstimate(
        all
          .filter((d) => d.date <= end)
          .map((d) => ({
            date: d.date,
            energyKcal: d.actuals.energyKcal,
            countdown: d.countdown !== null,
            inProgress: isInProgress(d.date, today),
          })),
        trend,
        end,
      ),
      flags: trendFlags(h, rate, from, to, today),
    };
  }
}
