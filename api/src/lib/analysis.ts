/**
 * The server's computations over an athlete's days: trend, rate, projection, drift, adherence,
 * timing breaches, maintenance estimate and flags. Pure functions, no I/O; every figure is checked in
 * analysis.test.ts against a published source or an independent reference library.
 */
import type { GOALS } from '@driftmark/shared';
import type {
  AdherenceWeek,
  CutoffBreach,
  DriftEntry,
  MaintenanceView,
  ProjectionView,
  RateView,
  ResolvedTargets,
  Tolerances,
  TrendFlag,
} from '@driftmark/shared';

export interface WeighInPoint {
  date: string;
  kg: number;
}

/** Tᵢ per weigh-in (T₁ = W₁, Tᵢ = Tᵢ₋₁ + 0.1·(Wᵢ − Tᵢ₋₁); Walker, The Hacker's Diet). Input any order; output date order. */
export function trendSeries(points: readonly WeighInPoint[]): { date: string; trendKg: number }[] {
  void points;
  throw new Error('not implemented');
}

/** Trailing 7-calendar-day mean ending on `date` of the weigh-ins present; null with fewer than 4. */
export function mean7(points: readonly WeighInPoint[], date: string): number | null {
  void points;
  void date;
  throw new Error('not implemented');
}

/** Guidance band for a phase, %/week (negative = loss). Dieting: −1 … −0.5 (Helms 2014). */
export function rateBand(phase: {
  goal: (typeof GOALS)[number] | null;
  countdown: boolean;
}): RateView['band'] {
  void phase;
  throw new Error('not implemented');
}

/**
 * Least-squares slope of weight on day over the 14 calendar days ending `endDate` (x = day number),
 * × 7 = kg/week; % of the window's mean weight. Null with fewer than 7 weigh-ins in the window.
 */
export function rate14(
  points: readonly WeighInPoint[],
  endDate: string,
  band: RateView['band'],
): RateView | null {
  void points;
  void endDate;
  void band;
  throw new Error('not implemented');
}

/**
 * The 14-day line carried to `eventDate` with an 80 % prediction interval
 * (ŷ ± t(0.9, n−2)·s·√(1 + 1/n + (x₀ − x̄)²/Sxx)). Null with fewer than 7 points or no future event.
 */
export function projectTo(
  points: readonly WeighInPoint[],
  endDate: string,
  eventDate: string | null,
): ProjectionView | null {
  void points;
  void endDate;
  void eventDate;
  throw new Error('not implemented');
}

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
  void targets;
  void tolerances;
  void actuals;
  throw new Error('not implemented');
}

/** Fluids after the cut-off (strictly later clock time) beyond the allowance; null without a cut-off or a breach. */
export function cutoffBreachFor(
  cutoff: ResolvedTargets['fluidCutoff'],
  fluids: readonly { time: string; volumeMl: number }[],
): CutoffBreach | null {
  void cutoff;
  void fluids;
  throw new Error('not implemented');
}

/** Per ISO week (Monday start) and metric: logged share and share of logged days on plan. */
export function weeklyAdherence(
  days: readonly { date: string; drift: readonly DriftEntry[] }[],
): AdherenceWeek[] {
  void days;
  throw new Error('not implemented');
}

/**
 * Mean daily energy intake over the last 14–28 logged days (countdown days excluded) minus the
 * trend's change × 7700 kcal/kg ÷ days (common practice, no source). Null with fewer than 14 logged days.
 */
export function maintenanceEstimate(
  days: readonly { date: string; energyKcal: number | null; countdown: boolean }[],
  trend: readonly { date: string; trendKg: number }[],
  endDate: string,
): MaintenanceView | null {
  void days;
  void trend;
  void endDate;
  throw new Error('not implemented');
}

/**
 * Flags: a drop of ≥ 2 % of body mass between consecutive weigh-ins ≤ 48 h apart (ACSM 2007,
 * Sawka et al.), a 14-day rate beyond −1 %/week and beyond −1.4 %/week (Helms 2014; Garthe 2011),
 * any symptom report, two or more missed weigh-ins in a row (up to `today`, exclusive of today).
 */
export function flagsFor(input: {
  points: readonly WeighInPoint[];
  rate: RateView | null;
  symptoms: readonly { date: string; symptoms: readonly string[]; urgent: boolean }[];
  from: string;
  today: string;
}): TrendFlag[] {
  void input;
  throw new Error('not implemented');
}
