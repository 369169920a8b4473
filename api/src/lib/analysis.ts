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
  amountAfter,
  DRIFT_METRICS,
  KCAL_PER_KG_LOST,
  LOSS_RATE_STRONG_PCT_PER_WEEK,
  LOSS_RATE_WARNING_PCT_PER_WEEK,
  SYMPTOM_LABELS,
} from '@driftmark/shared';
import type {
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
import { TREND_ALPHA } from './trend.js';

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

/** Weigh-ins a 7-day window needs before its mean is shown (the brief: at least 4). */
export const MEAN7_MIN_POINTS = 4;

/** Trailing 7-calendar-day mean ending on `date` of the weigh-ins present; null with fewer than 4. */
export function mean7(points: readonly WeighInPoint[], date: string): number | null {
  const from = shiftDate(date, -6);
  const inWindow = points.filter((p) => p.date >= from && p.date <= date);
  return inWindow.length < MEAN7_MIN_POINTS ? null : mean(inWindow.map((p) => p.kg));
}

// Rate and projection ---------------------------------------------------------------------------

export const RATE_WINDOW_DAYS = 14;
export const RATE_MIN_POINTS = 7;

const HELMS_2014 = 'Helms, Aragon & Fitschen 2014, JISSN 11:20';
const GARTHE_2011 = 'Garthe et al. 2011, IJSNEM 21:97–104';
const ACSM_2007 = 'Sawka et al. 2007, ACSM position stand "Exercise and fluid replacement", MSSE 39:377–390';
const NO_SOURCE = 'common practice, no source';

/**
 * Guidance band for a phase, %/week (negative = loss).
 * - Dieting (goal lose, outside a countdown): −1 … −0.5 (Helms 2014).
 * - Maintaining: −0.25 … +0.25, common practice, no source.
 * - Gaining, which is also the time after a show: none; REFERENCES §4 found no published numeric
 *   limit for post-show regain, and we do not invent one.
 * - Countdown: none; water and carbohydrate manipulation in the last days moves the scale by kilograms
 *   that are not tissue, so a weekly rate says nothing then.
 */
export function rateBand(phase: {
  goal: (typeof GOALS)[number] | null;
  countdown: boolean;
}): RateView['band'] {
  if (phase.countdown) return null;
  if (phase.goal === 'lose') {
    return { minPct: -1, maxPct: -0.5, label: 'Lose 0.5–1 % of body weight a week', source: HELMS_2014 };
  }
  if (phase.goal === 'maintain') {
    return { minPct: -0.25, maxPct: 0.25, label: 'Hold within ±0.25 % a week', source: NO_SOURCE };
  }
  return null;
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
  r2: number;
  /** Residual sum of squares. */
  sse: number;
}

/**
 * The least-squares fit over the 14 calendar days ending `endDate`, x = day number (1 … 14, as in
 * REFERENCES §8). Sums are taken about the means, which keeps them accurate at 80 kg. Null with
 * fewer than 7 weigh-ins, or when they share one date (no spread in x).
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
  // With every weigh-in equal the flat line fits them exactly; call that R² = 1 rather than 0/0.
  const r2 = syy === 0 ? 1 : 1 - sse / syy;
  return { from, to: endDate, n: used.length, slope, meanX, meanY, sxx, r2, sse };
}

/**
 * Least-squares slope of weight on day over the 14 calendar days ending `endDate` (x = day number),
 * × 7 = kg/week; % of the window's mean weight. Null with fewer than 7 weigh-ins in the window.
 * The regression, not the smoothed trend, gives the rate: the trend lags (REFERENCES §8).
 */
export function rate14(
  points: readonly WeighInPoint[],
  endDate: string,
  band: RateView['band'],
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
    band,
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
 * (ŷ ± t(0.9, n−2)·s·√(1 + 1/n + (x₀ − x̄)²/Sxx)). Null with fewer than 7 points or no future event.
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
  const s = Math.sqrt(fit.sse / (fit.n - 2));
  const t = studentTQuantile(1 - (1 - PROJECTION_LEVEL) / 2, fit.n - 2);
  const half = t * s * Math.sqrt(1 + 1 / fit.n + (x0 - fit.meanX) ** 2 / fit.sxx);
  return { date: eventDate, kg, lowKg: kg - half, highKg: kg + half, level: PROJECTION_LEVEL };
}

// Drift -----------------------------------------------------------------------------------------

/** What was logged on a day, for drift. Null = nothing logged for that metric. */
export interface DayActuals {
  energyKcal: number | null;
  proteinG: number | null;
  carbohydrateG: number | null;
  fatG: number | null;
  fluidMl: number | null;
  sodiumMg: number | null;
  steps: number | null;
  cardioMinutes: number | null;
}

/** Steps and cardio have no plan tolerance; ±10 % of the target is common practice, no source. */
export const ACTIVITY_TOLERANCE_PCT = 10;

const pctOf = (target: number, pct: number): number => (Math.abs(target) * pct) / 100;

/** Where each metric's target, actual and tolerance come from. */
const METRIC_SOURCES: Record<
  DriftMetric,
  {
    target: (t: ResolvedTargets) => number | null;
    actual: (a: DayActuals) => number | null;
    tolerance: (target: number, tol: Tolerances) => number;
  }
> = {
  energy: {
    target: (t) => t.energyKcal,
    actual: (a) => a.energyKcal,
    tolerance: (v, tol) => pctOf(v, tol.energyPct),
  },
  protein: { target: (t) => t.proteinG, actual: (a) => a.proteinG, tolerance: (_, tol) => tol.proteinG },
  carbohydrate: {
    target: (t) => t.carbohydrateG,
    actual: (a) => a.carbohydrateG,
    tolerance: (_, tol) => tol.carbohydrateG,
  },
  fat: { target: (t) => t.fatG, actual: (a) => a.fatG, tolerance: (_, tol) => tol.fatG },
  water: {
    target: (t) => t.waterMl,
    actual: (a) => a.fluidMl,
    tolerance: (v, tol) => pctOf(v, tol.waterPct),
  },
  sodium: {
    target: (t) => t.sodiumMg,
    actual: (a) => a.sodiumMg,
    tolerance: (v, tol) => pctOf(v, tol.sodiumPct),
  },
  steps: {
    target: (t) => t.steps,
    actual: (a) => a.steps,
    tolerance: (v) => pctOf(v, ACTIVITY_TOLERANCE_PCT),
  },
  cardio: {
    target: (t) => t.cardioMinutes,
    actual: (a) => a.cardioMinutes,
    tolerance: (v) => pctOf(v, ACTIVITY_TOLERANCE_PCT),
  },
};

/** The state of a logged value: within the tolerance, within twice it, or beyond. */
export function driftState(diff: number, tolerance: number): Exclude<DriftState, 'not_logged'> {
  const off = Math.abs(diff);
  if (atMost(off, tolerance)) return 'on_plan';
  if (atMost(off, 2 * tolerance)) return 'drifting';
  return 'off_plan';
}

/**
 * Drift for each metric with a target: on plan within the tolerance, drifting up to twice it, off
 * plan beyond, not logged without an entry (never on plan). Energy/water/sodium tolerances are %
 * of the target; protein/carbohydrate/fat in g; steps and cardio: common practice ±10 %.
 */
export function driftFor(
  targets: ResolvedTargets,
  tolerances: Tolerances,
  actuals: DayActuals,
): DriftEntry[] {
  return DRIFT_METRICS.flatMap((metric): DriftEntry[] => {
    const source = METRIC_SOURCES[metric];
    const target = source.target(targets);
    if (target === null) return [];
    const actual = source.actual(actuals);
    const tolerance = source.tolerance(target, tolerances);
    if (actual === null) {
      return [{ metric, target, actual: null, diff: null, relative: null, tolerance, state: 'not_logged' }];
    }
    const diff = actual - target;
    const relative = target === 0 ? null : diff / target;
    return [{ metric, target, actual, diff, relative, tolerance, state: driftState(diff, tolerance) }];
  });
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

/** Per ISO week (Monday start) and metric: logged share and share of logged days on plan. */
export function weeklyAdherence(
  days: readonly { date: string; drift: readonly DriftEntry[] }[],
): AdherenceWeek[] {
  const weeks = new Map<string, Map<DriftMetric, AdherenceWeek>>();
  for (const day of sortedByDate(days)) {
    const weekStart = mondayOf(day.date);
    const week = weeks.get(weekStart) ?? new Map<DriftMetric, AdherenceWeek>();
    weeks.set(weekStart, week);
    for (const { metric, state } of day.drift) {
      const row = week.get(metric) ?? {
        weekStart,
        metric,
        targetDays: 0,
        loggedDays: 0,
        onPlanDays: 0,
        adherence: null,
        loggedShare: null,
      };
      row.targetDays += 1;
      if (state !== 'not_logged') row.loggedDays += 1;
      if (state === 'on_plan') row.onPlanDays += 1;
      week.set(metric, row);
    }
  }
  return [...weeks.values()].flatMap((week) =>
    DRIFT_METRICS.flatMap((metric) => {
      const row = week.get(metric);
      if (!row) return [];
      return [
        {
          ...row,
          adherence: row.loggedDays === 0 ? null : row.onPlanDays / row.loggedDays,
          loggedShare: row.targetDays === 0 ? null : row.loggedDays / row.targetDays,
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
  '(common practice, no source). Countdown days are left out.';

type MaintenanceDay = { date: string; energyKcal: number | null; countdown: boolean };

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
  const logged = stretches.map((s) => s.filter((d) => d.energyKcal !== null));
  for (let i = logged.length - 1; i >= 0; i -= 1) {
    if (logged[i]!.length >= MAINTENANCE_MIN_DAYS) return logged[i]!;
  }
  return null;
}

/**
 * Mean daily energy intake over the last 14–28 logged days (countdown days excluded) minus the
 * trend's change × 7700 kcal/kg ÷ days (common practice, no source). Null with fewer than 14 logged days.
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

function acuteDropFlags(points: readonly WeighInPoint[]): TrendFlag[] {
  const ordered = sortedByDate(points);
  return ordered.flatMap((cur, i): TrendFlag[] => {
    const prev = ordered[i - 1];
    if (!prev) return [];
    const gap = daysBetween(prev.date, cur.date);
    const drop = prev.kg - cur.kg;
    if (gap < 1 || gap > ACUTE_DROP_MAX_DAYS || !atMost(ACUTE_DROP_SHARE * prev.kg, drop)) return [];
    return [
      {
        kind: 'acute_drop',
        date: cur.date,
        severity: 'warning',
        message:
          `Down ${drop.toFixed(1)} kg (${formatPct((drop / prev.kg) * 100)}) since ${prev.date}: ` +
          'likely water loss; a water deficit above 2 % of body weight impairs performance.',
        source: ACSM_2007,
      },
    ];
  });
}

function rateFlags(rate: RateView | null): TrendFlag[] {
  if (!rate || rate.percentPerWeek >= -LOSS_RATE_WARNING_PCT_PER_WEEK) return [];
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
 * Flags: a drop of ≥ 2 % of body mass between consecutive weigh-ins ≤ 48 h apart (ACSM 2007,
 * Sawka et al.), a 14-day rate beyond −1 %/week and beyond −1.4 %/week (Helms 2014; Garthe 2011),
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
