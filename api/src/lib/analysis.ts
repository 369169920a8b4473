/**
 * The server's computations over an athlete's days: trend, rate, projection, drift, adherence,
 * timing breaches, maintenance estimate and flags. Pure functions, no I/O; every figure is checked in
 * analysis.test.ts against a published source or an independent reference library
 * (analysis.property.test.ts).
 *
 * Dates are calendar dates (YYYY-MM-DD) in the athlete's own time zone; a weigh-in's date stands for
 * that morning's weigh-in, so consecutive dates are 24 h apart.
 */
import {
  adherenceOf,
  amountAfter,
  dayVerdicts,
  DRIFT_METRICS,
  rateVerdict,
  isCounted,
  KCAL_PER_KG_LOST,
  LOSS_RATE_STRONG_PCT_PER_WEEK,
  LOSS_RATE_WARNING_PCT_PER_WEEK,
  SYMPTOM_LABELS,
} from '@driftmark/shared';
import type {
  DayActuals as SharedDayActuals,
  AdherenceWeek,
  CutoffBreach,
  DriftEntry,
  DriftMetric,
  DriftState,
  GOALS,
  MaintenanceView,
  ProjectionView,
  RateView,
  ResolvedTargets,
  Tolerances,
  TrendFlag,
} from '@driftmark/shared';
import { daysBetween, shiftDate } from './dates.js';

export interface WeighInPoint {
  date: string;
  kg: number;
}

const byDate = <T extends { date: string }>(a: T, b: T): number =>
  a.date < b.date ? -1 : a.date > b.date ? 1 : 0;
const sortedByDate = <T extends { date: string }>(items: readonly T[]): T[] => [...items].sort(byDate);
const mean = (values: readonly number[]): number => values.reduce((s, v) => s + v, 0) / values.length;

/**
 * Comparisons at a threshold allow for binary rounding, so a value exactly at a boundary (2,640 kcal
 * against 2,400 ± 120, or a drop of exactly 2 %) lands on the side the rule names.
 */
const EPSILON = 1e-9;
const atMost = (value: number, limit: number): boolean =>
  value <= limit + EPSILON * Math.max(1, Math.abs(limit));

// Trend -----------------------------------------------------------------------------------------

/** Smoothing of the exponentially smoothed moving average: 10 % (Walker, The Hacker's Diet). */
export const TREND_ALPHA = 0.1;

/**
 * Tᵢ per weigh-in (T₁ = W₁, Tᵢ = Tᵢ₋₁ + 0.1·(Wᵢ − Tᵢ₋₁); Walker, The Hacker's Diet). Input any order;
 * output date order. One step per weigh-in: a day without one adds no step (never invented); the
 * increments are not rounded to 0.1 as Walker does by hand.
 */
export function trendSeries(points: readonly WeighInPoint[]): { date: string; trendKg: number }[] {
  let trend: number | null = null;
  return sortedByDate(points).map(({ date, kg }) => {
    trend = trend === null ? kg : trend + TREND_ALPHA * (kg - trend);
    return { date, trendKg: trend };
  });
}

/** The trend weight after the last weigh-in (the last of trendSeries); null without weigh-ins. */
export function trendWeightKg(points: readonly WeighInPoint[]): number | null {
  return trendSeries(points).at(-1)?.trendKg ?? null;
}

/** Weigh-ins a 7-day window needs before its mean is shown (the brief: at least 4). */
export const MEAN7_MIN_POINTS = 4;

/** Trailing 7-calendar-day mean ending on `date` of the weigh-ins present; null with fewer than 4. */
export function mean7(points: readonly WeighInPoint[], date: string): number | null {
  return mean7Series(points, [date])[0] ?? null;
}

/**
 * mean7 for each of `dates` (ascending) in one pass: the window slides over the weigh-ins in date
 * order instead of filtering all of them once per day, and each mean sums its window in that same
 * order, so every value is the one mean7 gives for its date alone.
 */
export function mean7Series(points: readonly WeighInPoint[], dates: readonly string[]): (number | null)[] {
  const ordered = sortedByDate(points);
  const out: (number | null)[] = [];
  let lo = 0;
  let hi = 0;
  for (const date of dates) {
    const from = shiftDate(date, -6);
    while (hi < ordered.length && ordered[hi]!.date <= date) hi += 1;
    while (lo < hi && ordered[lo]!.date < from) lo += 1;
    if (hi - lo < MEAN7_MIN_POINTS) {
      out.push(null);
      continue;
    }
    let sum = 0;
    for (let i = lo; i < hi; i += 1) sum += ordered[i]!.kg;
    out.push(sum / (hi - lo));
  }
  return out;
}

// Rate and projection ---------------------------------------------------------------------------

export const RATE_WINDOW_DAYS = 14;
export const RATE_MIN_POINTS = 7;

const HELMS_2014 = 'Helms, Aragon & Fitschen 2014, JISSN 11:20';
const GARTHE_2011 = 'Garthe et al. 2011, IJSNEM 21:97–104';
const ACSM_2007 = 'Sawka et al. 2007, ACSM position stand "Exercise and fluid replacement", MSSE 39:377–390';
const NO_SOURCE = 'common practice, no source';

/** Why the rate band is withheld inside a countdown (shown where the band would be). */
export const RATE_PAUSED_NOTE =
  'Rate guidance paused during the countdown (water and glycogen change on purpose).';
/** Why there is no band while regaining (REFERENCES §4) or before the athlete has a goal. */
export const RATE_NO_BAND_NOTES = {
  gain: 'No guidance band for a regain: no published limit to hold it to.',
  none: 'No guidance band until the athlete has a goal.',
} as const;

/** The rate guidance for a phase: the band, or why there is none; `paused` inside a countdown. */
export interface RateGuidance {
  band: RateView['band'];
  /** Why `band` is null, in words; null with a band. */
  note: string | null;
  /** Inside a countdown: no band and no rate flags. */
  paused: boolean;
}

/**
 * Guidance for a phase, %/week (negative = loss).
 * - Dieting (goal lose, outside a countdown): −1 … −0.5 (Helms 2014).
 * - Maintaining: −0.25 … +0.25, common practice, no source.
 * - Gaining, which is also the time after a show: none; REFERENCES §4 found no published numeric
 *   limit for post-show regain, and we do not invent one.
 * - Countdown: paused; water and carbohydrate manipulation in the last days moves the scale by
 *   kilograms that are not tissue, so a weekly rate says nothing then, and no rate flag is raised.
 */
export function rateGuidance(phase: {
  goal: (typeof GOALS)[number] | null;
  countdown: boolean;
}): RateGuidance {
  if (phase.countdown) return { band: null, note: RATE_PAUSED_NOTE, paused: true };
  if (phase.goal === 'lose') {
    return {
      band: { minPct: -1, maxPct: -0.5, label: 'Lose 0.5–1 % of body weight a week', source: HELMS_2014 },
      note: null,
      paused: false,
    };
  }
  if (phase.goal === 'maintain') {
    return {
      band: { minPct: -0.25, maxPct: 0.25, label: 'Hold within ±0.25 % a week', source: NO_SOURCE },
      note: null,
      paused: false,
    };
  }
  const note = phase.goal === 'gain' ? RATE_NO_BAND_NOTES.gain : RATE_NO_BAND_NOTES.none;
  return { band: null, note, paused: false };
}

/** An ordinary least-squares line of kg on day number over one window, with what the interval needs. */
interface LineFit {
  from: string;
  to: string;
  n: number;
  slope: number;
  meanX: number;
  meanY: number;
  sxx: number;
  r2: number | null;
  /** Residual sum of squares. */
  sse: number;
}

/**
 * The scale's reading step, kg: bathroom scales read to 0.1 kg or 0.2 lb (0.091 kg); the coarser
 * of the two is taken for everyone (common practice, no source; the steps from memory).
 */
export const SCALE_STEP_KG = 0.1;

/**
 * The smallest residual standard deviation the interval uses: a reading rounded to a step q carries
 * an error uniform over ±q/2, whose standard deviation is q/√12 (the standard result for uniform
 * quantisation; Widrow & Kollár 2008, Quantization Noise, Cambridge University Press; the citation
 * from memory). Below it, a "perfect" fit only
 * says the scale could not see the noise, not that there is none. We floor at the scale's resolution
 * rather than at the day-to-day variation of morning body mass (Cheuvront et al. 2004, IJSNEM 14:532,
 * CV ≈ 0.66 %): that study measured active men under exercise-heat stress, and the athlete's own 14
 * days already estimate their own variation; the scale's step is what no series can beat.
 */
export const RESIDUAL_SD_FLOOR_KG = SCALE_STEP_KG / Math.sqrt(12);

/**
 * The least-squares fit over the 14 calendar days ending `endDate`, x = day number (1 … 14, as in
 * REFERENCES §8). Sums are taken about the means, which keeps them accurate at 80 kg. Null with
 * fewer than 7 weigh-ins, or when they share one date (no spread in x).
 *
 * R² is null (undefined) when the weigh-ins are all one reading at the scale's resolution (they
 * spread by less than half a step): the total sum of squares is then 0 up to rounding noise, and
 * 1 − SSE/SST would be 0/0 read as 1 or 0 by chance.
 */
function fitWindow(points: readonly WeighInPoint[], endDate: string): LineFit | null {
  const from = shiftDate(endDate, -(RATE_WINDOW_DAYS - 1));
  const used = points.filter((p) => p.date >= from && p.date <= endDate);
  if (used.length < RATE_MIN_POINTS) return null;
  const xs = used.map((p) => daysBetween(from, p.date) + 1);
  const ys = used.map((p) => p.kg);
  const meanX = mean(xs);
  const meanY = mean(ys);
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  xs.forEach((x, i) => {
    const dx = x - meanX;
    const dy = ys[i]! - meanY;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  });
  if (sxx === 0) return null;
  const slope = sxy / sxx;
  const sse = xs.reduce((s, x, i) => s + (ys[i]! - (meanY + slope * (x - meanX))) ** 2, 0);
  const oneReading = Math.max(...ys) - Math.min(...ys) < SCALE_STEP_KG / 2;
  const r2 = oneReading ? null : 1 - sse / syy;
  return { from, to: endDate, n: used.length, slope, meanX, meanY, sxx, r2, sse };
}

/**
 * Least-squares slope of weight on day over the 14 calendar days ending `endDate` (x = day number),
 * × 7 = kg/week; % of the window's mean weight, with the phase's guidance. Null with fewer than 7
 * weigh-ins in the window.
 * The regression, not the smoothed trend, gives the rate: the trend lags (REFERENCES §8).
 */
export function rate14(
  points: readonly WeighInPoint[],
  endDate: string,
  guidance: RateGuidance,
): RateView | null {
  const fit = fitWindow(points, endDate);
  if (!fit) return null;
  const kgPerWeek = fit.slope * 7;
  return {
    kgPerWeek,
    percentPerWeek: (kgPerWeek / fit.meanY) * 100,
    r2: fit.r2,
    points: fit.n,
    from: fit.from,
    to: fit.to,
    band: guidance.band,
    bandNote: guidance.note,
    paused: guidance.paused,
    verdict: guidance.band ? rateVerdict((kgPerWeek / fit.meanY) * 100, guidance.band) : null,
  };
}

/**
 * P(|T| < t) for Student's t with `df` degrees of freedom, in closed form for whole df
 * (Abramowitz & Stegun 1964, 26.7.3 odd df and 26.7.4 even df; the formulas from memory, checked in
 * analysis.test.ts against the exact df 1 and df 2 distributions and against a standard t table).
 */
function studentTCentralProbability(t: number, df: number): number {
  const theta = Math.atan(t / Math.sqrt(df));
  const cos2 = Math.cos(theta) ** 2;
  // Sum of the series in cos²θ; odd df start from cosθ and k = 3, even df from 1 and k = 2.
  const odd = df % 2 === 1;
  let term = odd ? Math.cos(theta) : 1;
  let sum = df === 1 ? 0 : term;
  for (let k = odd ? 3 : 2; k <= df - 2; k += 2) {
    term *= (cos2 * (k - 1)) / k;
    sum += term;
  }
  return odd ? (2 / Math.PI) * (theta + Math.sin(theta) * sum) : Math.sin(theta) * sum;
}

/**
 * The p quantile of Student's t (p > 0.5) for whole `df` ≥ 1. Bisection on θ = atan(t/√df) in
 * (0, π/2), where the central probability rises monotonically, so it cannot fail to converge.
 */
export function studentTQuantile(p: number, df: number): number {
  if (!(p > 0.5 && p < 1) || !Number.isInteger(df) || df < 1) {
    throw new RangeError(`studentTQuantile needs 0.5 < p < 1 and a whole df ≥ 1 (got p ${p}, df ${df})`);
  }
  const central = 2 * p - 1;
  let lo = 0;
  let hi = Math.PI / 2;
  for (let i = 0; i < 100; i += 1) {
    const mid = (lo + hi) / 2;
    if (studentTCentralProbability(Math.sqrt(df) * Math.tan(mid), df) < central) lo = mid;
    else hi = mid;
  }
  return Math.sqrt(df) * Math.tan((lo + hi) / 2);
}

export const PROJECTION_LEVEL = 0.8;

/**
 * The 14-day line carried to `eventDate` with an 80 % prediction interval
 * (ŷ ± t(0.9, n−2)·s·√(1 + 1/n + (x₀ − x̄)²/Sxx)), s never below RESIDUAL_SD_FLOOR_KG (the scale's
 * quantisation, so seven perfectly fitting weigh-ins never give a zero-width interval). Null with
 * fewer than 7 points or no future event.
 */
export function projectTo(
  points: readonly WeighInPoint[],
  endDate: string,
  eventDate: string | null,
): ProjectionView | null {
  if (eventDate === null || eventDate <= endDate) return null;
  const fit = fitWindow(points, endDate);
  if (!fit) return null;
  const x0 = daysBetween(fit.from, eventDate) + 1;
  const kg = fit.meanY + fit.slope * (x0 - fit.meanX);
  const s = Math.max(Math.sqrt(fit.sse / (fit.n - 2)), RESIDUAL_SD_FLOOR_KG);
  const t = studentTQuantile(1 - (1 - PROJECTION_LEVEL) / 2, fit.n - 2);
  const half = t * s * Math.sqrt(1 + 1 / fit.n + (x0 - fit.meanX) ** 2 / fit.sxx);
  return { date: eventDate, kg, lowKg: kg - half, highKg: kg + half, level: PROJECTION_LEVEL };
}

// Drift -----------------------------------------------------------------------------------------

/** What was logged on a day, for drift (shared/src/rules/day-verdicts.ts). */
export type DayActuals = SharedDayActuals;

/**
 * Drift for each metric with a target, by the shared day-verdict rules (shared/src/rules/day-verdicts.ts):
 * a range for energy, macros, water and sodium, at least for steps and cardio; on plan within the
 * tolerance, drifting up to twice it, off plan beyond, not logged without an entry (never on plan),
 * in progress on the athlete's today (never judged).
 */
export function driftFor(
  targets: ResolvedTargets,
  tolerances: Tolerances,
  actuals: DayActuals,
  inProgress = false,
): DriftEntry[] {
  return dayVerdicts({ targets, tolerances, actuals, inProgress });
}

// Timing ----------------------------------------------------------------------------------------

/**
 * Fluids after the cut-off beyond the allowance; null without a cut-off or a breach. The timing rule
 * itself (strictly later clock time) is `amountAfter` in shared/, shared with the food cut-off.
 */
export function cutoffBreachFor(
  cutoff: ResolvedTargets['fluidCutoff'],
  fluids: readonly { time: string; volumeMl: number }[],
): CutoffBreach | null {
  if (!cutoff) return null;
  const { logged, excess } = amountAfter(
    fluids.map((f) => ({ time: f.time, amount: f.volumeMl })),
    cutoff.time,
    cutoff.allowanceMl,
  );
  if (excess <= 0) return null;
  return { cutoff: cutoff.time, allowanceMl: cutoff.allowanceMl, afterCutoffMl: logged, excessMl: excess };
}

// Adherence -------------------------------------------------------------------------------------

/** The Monday on or before `date` (ISO weeks start on Monday). */
export function mondayOf(date: string): string {
  const weekday = new Date(`${date}T00:00:00Z`).getUTCDay(); // 0 Sunday … 6 Saturday
  return shiftDate(date, -((weekday + 6) % 7));
}

/**
 * Per ISO week (Monday start) and metric: logged share and share of logged days on plan
 * (adherenceOf in shared/src/rules/day-verdicts.ts: a day in progress counts nowhere).
 */
export function weeklyAdherence(
  days: readonly { date: string; drift: readonly DriftEntry[] }[],
): AdherenceWeek[] {
  const weeks = new Map<string, Map<DriftMetric, DriftState[]>>();
  for (const day of sortedByDate(days)) {
    const weekStart = mondayOf(day.date);
    const week = weeks.get(weekStart) ?? new Map<DriftMetric, DriftState[]>();
    weeks.set(weekStart, week);
    for (const { metric, state } of day.drift) {
      if (!isCounted(state)) continue;
      week.set(metric, [...(week.get(metric) ?? []), state]);
    }
  }
  return [...weeks].flatMap(([weekStart, week]) =>
    DRIFT_METRICS.flatMap((metric) => {
      const states = week.get(metric);
      if (!states) return [];
      const counts = adherenceOf(states);
      return [
        {
          weekStart,
          metric,
          ...counts,
          loggedShare: counts.targetDays === 0 ? null : counts.loggedDays / counts.targetDays,
        },
      ];
    }),
  );
}

// Maintenance -----------------------------------------------------------------------------------

export const MAINTENANCE_MIN_DAYS = 14;
export const MAINTENANCE_MAX_DAYS = 28;

export const MAINTENANCE_NOTE =
  'Rule-of-thumb estimate: mean energy intake minus the trend weight change × 7,700 kcal per kg, per day ' +
  '(common practice, no source). Countdown days and the day in progress are left out.';

/** One day's intake; `inProgress` marks the athlete's today, whose partial intake never counts. */
type MaintenanceDay = { date: string; energyKcal: number | null; countdown: boolean; inProgress?: boolean };

/**
 * The most recent run of days between countdown days that has enough logged intake. A countdown
 * splits the window because its water manipulation moves the trend by kilograms that are not
 * stored energy; a trend change across it would bias the estimate.
 */
function latestUsableStretch(days: readonly MaintenanceDay[]): MaintenanceDay[] | null {
  const stretches: MaintenanceDay[][] = [[]];
  for (const day of sortedByDate(days)) {
    if (day.countdown) stretches.push([]);
    else stretches[stretches.length - 1]!.push(day);
  }
  const logged = stretches.map((s) => s.filter((d) => d.energyKcal !== null && !d.inProgress));
  for (let i = logged.length - 1; i >= 0; i -= 1) {
    if (logged[i]!.length >= MAINTENANCE_MIN_DAYS) return logged[i]!;
  }
  return null;
}

/**
 * Mean daily energy intake over the last 14–28 logged days (countdown days and the day in progress
 * excluded) minus the trend's change × 7700 kcal/kg ÷ days (common practice, no source). Null with
 * fewer than 14 logged days.
 * The window is the 28 calendar days ending `endDate`; the trend change is taken between the first and
 * last trend values inside the days used and divided by the calendar days between them.
 */
export function maintenanceEstimate(
  days: readonly MaintenanceDay[],
  trend: readonly { date: string; trendKg: number }[],
  endDate: string,
): MaintenanceView | null {
  const windowStart = shiftDate(endDate, -(MAINTENANCE_MAX_DAYS - 1));
  const used = latestUsableStretch(days.filter((d) => d.date >= windowStart && d.date <= endDate));
  if (!used) return null;
  const from = used[0]!.date;
  const to = used[used.length - 1]!.date;
  const inside = sortedByDate(trend).filter((t) => t.date >= from && t.date <= to);
  const first = inside[0];
  const last = inside[inside.length - 1];
  if (!first || !last || last.date <= first.date) return null;
  const kgPerDay = (last.trendKg - first.trendKg) / daysBetween(first.date, last.date);
  const intake = mean(used.map((d) => d.energyKcal!));
  return {
    kcalPerDay: intake - kgPerDay * KCAL_PER_KG_LOST,
    days: used.length,
    from,
    to,
    note: MAINTENANCE_NOTE,
  };
}

// Flags -----------------------------------------------------------------------------------------

/** ≥ 2 % of body mass within 48 h is likely water loss (ACSM 2007; REFERENCES §7 rule 2). */
export const ACUTE_DROP_SHARE = 0.02;
export const ACUTE_DROP_MAX_DAYS = 2;
/** Missed weigh-ins in a row that raise a flag (the brief; common practice, no source). */
export const MISSED_WEIGH_INS_IN_A_ROW = 2;

const formatPct = (value: number): string => `${Math.abs(value).toFixed(1)} %`;

/**
 * Each weigh-in against the highest weigh-in of the 48 h before it (1 or 2 calendar days earlier,
 * whatever lies between: 80 → 79.0 → 78.05 kg is −2.4 % in 48 h). A drop that was already flagged
 * from the same earlier weigh-in is raised again only when it has grown (one episode, one flag;
 * our own convention, no source).
 */
function acuteDropFlags(points: readonly WeighInPoint[]): TrendFlag[] {
  const ordered = sortedByDate(points);
  const flags: TrendFlag[] = [];
  let lastFlagged: { fromDate: string; kg: number } | null = null;
  ordered.forEach((cur, i) => {
    let high: WeighInPoint | null = null;
    for (let j = i - 1; j >= 0; j -= 1) {
      const earlier = ordered[j]!;
      const gap = daysBetween(earlier.date, cur.date);
      if (gap > ACUTE_DROP_MAX_DAYS) break;
      if (gap >= 1 && (high === null || earlier.kg > high.kg)) high = earlier;
    }
    if (!high) return;
    const drop = high.kg - cur.kg;
    if (!atMost(ACUTE_DROP_SHARE * high.kg, drop)) return;
    if (lastFlagged && lastFlagged.fromDate === high.date && cur.kg >= lastFlagged.kg) return;
    lastFlagged = { fromDate: high.date, kg: cur.kg };
    const gap = daysBetween(high.date, cur.date);
    const percent = (drop / high.kg) * 100;
    flags.push({
      kind: 'acute_drop',
      date: cur.date,
      severity: 'warning',
      message:
        `Down ${drop.toFixed(1)} kg (${formatPct(percent)}) ` +
        `${gap === 1 ? 'from the day before' : `in ${gap} days`}, since ${high.date}: ` +
        'likely water loss; a water deficit above 2 % of body weight impairs performance.',
      source: ACSM_2007,
      drop: { fromDate: high.date, fromKg: high.kg, toKg: cur.kg, percent },
    });
  });
  return flags;
}

/** None while the guidance is paused (a countdown): the scale then moves by water on purpose. */
function rateFlags(rate: RateView | null): TrendFlag[] {
  if (!rate || rate.paused || rate.percentPerWeek >= -LOSS_RATE_WARNING_PCT_PER_WEEK) return [];
  const losing = `Losing ${formatPct(rate.percentPerWeek)} of body weight a week over ${rate.from} – ${rate.to}`;
  if (rate.percentPerWeek < -LOSS_RATE_STRONG_PCT_PER_WEEK) {
    return [
      {
        kind: 'rate_far_beyond',
        date: rate.to,
        severity: 'strong',
        message: `${losing}: about 1.4 % a week cost lean mass where 0.7 % a week did not.`,
        source: `${GARTHE_2011}; ${HELMS_2014}`,
      },
    ];
  }
  return [
    {
      kind: 'rate_beyond',
      date: rate.to,
      severity: 'warning',
      message: `${losing}: faster than the 0.5–1 % a week advised to keep muscle.`,
      source: HELMS_2014,
    },
  ];
}

const symptomLabel = (s: string): string => SYMPTOM_LABELS[s as keyof typeof SYMPTOM_LABELS] ?? s;

function symptomFlags(
  symptoms: readonly { date: string; symptoms: readonly string[]; urgent: boolean }[],
): TrendFlag[] {
  return symptoms.map((report): TrendFlag => ({
    kind: 'symptom',
    date: report.date,
    severity: report.urgent ? 'strong' : 'warning',
    message: `Reported: ${report.symptoms.map(symptomLabel).join(', ')}`,
    source: "The athlete's own report",
  }));
}

/** Runs of days without a weigh-in between the first weigh-in and yesterday (today may still come). */
function missedWeighInFlags(points: readonly WeighInPoint[], today: string): TrendFlag[] {
  const weighed = new Set(points.map((p) => p.date));
  const first = sortedByDate(points)[0];
  if (!first) return [];
  const flags: TrendFlag[] = [];
  let runStart: string | null = null;
  for (let day = shiftDate(first.date, 1); day <= today; day = shiftDate(day, 1)) {
    const missed = day < today && !weighed.has(day);
    if (missed) {
      runStart ??= day;
      continue;
    }
    if (runStart !== null) {
      const last = shiftDate(day, -1);
      const length = daysBetween(runStart, last) + 1;
      if (length >= MISSED_WEIGH_INS_IN_A_ROW) {
        flags.push({
          kind: 'missed_weigh_ins',
          date: last,
          severity: 'warning',
          message: `No weigh-in on ${length} days in a row (${runStart} – ${last}).`,
          source: NO_SOURCE,
        });
      }
      runStart = null;
    }
  }
  return flags;
}

/**
 * Flags: a drop of ≥ 2 % of body mass within 48 h, from the highest weigh-in of the 2 days before
 * (ACSM 2007, Sawka et al.), a 14-day rate beyond −1 %/week and beyond −1.4 %/week (Helms 2014;
 * Garthe 2011) except during a countdown,
 * any symptom report, two or more missed weigh-ins in a row (up to `today`, exclusive of today).
 * Only flags dated from `from` to `today` are returned, in date order; `points` must hold every
 * weigh-in up to today (earlier ones too: a drop or a run of missed days may start before `from`).
 */
export function flagsFor(input: {
  points: readonly WeighInPoint[];
  rate: RateView | null;
  symptoms: readonly { date: string; symptoms: readonly string[]; urgent: boolean }[];
  from: string;
  today: string;
}): TrendFlag[] {
  const { points, rate, symptoms, from, today } = input;
  return [
    ...acuteDropFlags(points),
    ...rateFlags(rate),
    ...symptomFlags(symptoms),
    ...missedWeighInFlags(points, today),
  ]
    .filter((f) => f.date >= from && f.date <= today)
    .sort(byDate);
}
