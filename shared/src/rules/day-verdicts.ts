import { DEFAULT_TOLERANCES, type ResolvedTargets, type Tolerances } from '../schemas/plans.js';
import { amountAfter } from '../plans/cutoff.js';
import {
  DRIFT_METRICS,
  type CutoffStatus,
  type DriftEntry,
  type DriftMetric,
  type TargetKind,
} from '../schemas/trends.js';
import type { DriftState, JudgedState } from '../vocabulary.js';

/*
 * The day-verdict rules, in one place: how each metric's target is met (its kind), its tolerance,
 * and the state a day gets for it. The server applies them (day view, trend rows, CSV, roster,
 * review queue, weekly figures); the web renders the server's states and never grades a day itself.
 *
 * States (the product brief, "Deviation"): on plan within the tolerance, drifting up to twice it,
 * off plan beyond, not logged without an entry, and `in_progress` for the athlete's today until
 * their local day ends: a day in progress shows its figures "so far" and is never judged or counted.
 */

const COMMON_PRACTICE = 'common practice, no source';

/** How a metric's target is met, and why. */
export interface MetricRule {
  kind: TargetKind;
  source: string;
}

/**
 * Per metric: intake targets are amounts to land on, so a range (the product brief: "on plan within
 * the metric's tolerance"); steps and cardio are minimums: reaching or passing them is on plan, and
 * only a shortfall is measured against the tolerance (common practice, no source).
 */
export const METRIC_RULES: Record<DriftMetric, MetricRule> = {
  energy: { kind: 'range', source: 'Product brief: target ± the plan tolerance' },
  protein: { kind: 'range', source: 'Product brief: target ± the plan tolerance' },
  carbohydrate: { kind: 'range', source: 'Product brief: target ± the plan tolerance' },
  fat: { kind: 'range', source: 'Product brief: target ± the plan tolerance' },
  water: { kind: 'range', source: 'Product brief: target ± the plan tolerance' },
  sodium: { kind: 'range', source: 'Product brief: target ± the plan tolerance' },
  steps: { kind: 'at_least', source: `Steps are a minimum: ${COMMON_PRACTICE}` },
  cardio: { kind: 'at_least', source: `Cardio minutes are a minimum: ${COMMON_PRACTICE}` },
};

/**
 * Fluids after the cut-off: at most the allowance (the product brief, "Timing": beyond the allowance
 * is a breach). The allowance is the tolerance already, so none is added: any excess is off plan.
 */
export const CUTOFF_RULE: { kind: 'at_most'; source: string; toleranceMl: 0 } = {
  kind: 'at_most',
  source: 'Product brief: fluids after the cut-off beyond the allowance are a breach',
  toleranceMl: 0,
};

/**
 * Steps and cardio: how far short of the target (% of it) still counts as on plan, unless the plan
 * sets its own (common practice, no source).
 */
export const ACTIVITY_TOLERANCE_PCT = DEFAULT_TOLERANCES.activityPct;

const pctOf = (target: number, pct: number): number => (Math.abs(target) * pct) / 100;

/** A metric's tolerance in its own unit: a share of the target (energy, water, sodium, activity) or grams. */
export function metricTolerance(metric: DriftMetric, target: number, tol: Tolerances): number {
  switch (metric) {
    case 'energy':
      return pctOf(target, tol.energyPct);
    case 'protein':
      return tol.proteinG;
    case 'carbohydrate':
      return tol.carbohydrateG;
    case 'fat':
      return tol.fatG;
    case 'water':
      return pctOf(target, tol.waterPct);
    case 'sodium':
      return pctOf(target, tol.sodiumPct);
    case 'steps':
    case 'cardio':
      return pctOf(target, tol.activityPct ?? ACTIVITY_TOLERANCE_PCT);
  }
}

/**
 * Comparisons at a threshold allow for binary rounding, so a value exactly at a boundary (2,640 kcal
 * against 2,400 ± 120) lands on the side the rule names.
 */
const EPSILON = 1e-9;
const atMost = (value: number, limit: number): boolean =>
  value <= limit + EPSILON * Math.max(1, Math.abs(limit));

/** How far actual − target lies on the wrong side of the target for its kind (0 when on the right side). */
export function shortfall(kind: TargetKind, diff: number): number {
  if (kind === 'at_least') return Math.max(0, -diff);
  if (kind === 'at_most') return Math.max(0, diff);
  return Math.abs(diff);
}

/**
 * The state of a logged value on a finished day: its deviation on the wrong side (see `shortfall`)
 * within the tolerance is on plan, within twice it drifting, beyond off plan (the product brief).
 */
export function judge(kind: TargetKind, diff: number, tolerance: number): JudgedState {
  const off = shortfall(kind, diff);
  if (atMost(off, tolerance)) return 'on_plan';
  if (atMost(off, 2 * tolerance)) return 'drifting';
  return 'off_plan';
}

/** The values that count as on plan: [target − tol, target + tol], from target − tol up, or up to target + tol. */
export function onPlanBounds(
  kind: TargetKind,
  target: number,
  tolerance: number,
): { min: number | null; max: number | null } {
  const low = Math.max(0, target - tolerance);
  const high = target + tolerance;
  if (kind === 'at_least') return { min: low, max: null };
  if (kind === 'at_most') return { min: null, max: high };
  return { min: low, max: high };
}

/**
 * Whether `date` is still in progress: it is the athlete's own today (`today` from the injected
 * clock in the athlete's time zone). A later date has no verdict at all; an earlier one is finished.
 */
export function isInProgress(date: string, today: string): boolean {
  return date === today;
}

/** Whether a state is a finished day's verdict on a logged value (the only ones adherence counts as logged). */
export function isJudged(state: DriftState): state is JudgedState {
  return state === 'on_plan' || state === 'drifting' || state === 'off_plan';
}

/** Whether a metric-day counts at all in adherence, drift counts and "logged N of M": a finished day's. */
export function isCounted(state: DriftState): boolean {
  return state !== 'in_progress';
}

/** One metric on one day against its target. */
export function metricVerdict(input: {
  metric: DriftMetric;
  target: number;
  actual: number | null;
  tolerances: Tolerances;
  inProgress: boolean;
}): DriftEntry {
  const { metric, target, actual } = input;
  const { kind } = METRIC_RULES[metric];
  const tolerance = metricTolerance(metric, target, input.tolerances);
  const base = { metric, target, tolerance, kind, onPlan: onPlanBounds(kind, target, tolerance) };
  const diff = actual === null ? null : actual - target;
  const relative = diff === null || target === 0 ? null : diff / target;
  const state: DriftState = input.inProgress
    ? 'in_progress'
    : diff === null
      ? 'not_logged'
      : judge(kind, diff, tolerance);
  return { ...base, actual, diff, relative, state };
}

/** What was logged on a day, per metric. Null = nothing logged for that metric (never zero eaten). */
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

type Targets = Pick<
  ResolvedTargets,
  'energyKcal' | 'proteinG' | 'carbohydrateG' | 'fatG' | 'waterMl' | 'sodiumMg' | 'steps' | 'cardioMinutes'
>;

const TARGET_OF: Record<DriftMetric, (t: Targets) => number | null> = {
  energy: (t) => t.energyKcal,
  protein: (t) => t.proteinG,
  carbohydrate: (t) => t.carbohydrateG,
  fat: (t) => t.fatG,
  water: (t) => t.waterMl,
  sodium: (t) => t.sodiumMg,
  steps: (t) => t.steps,
  cardio: (t) => t.cardioMinutes,
};

const ACTUAL_OF: Record<DriftMetric, (a: DayActuals) => number | null> = {
  energy: (a) => a.energyKcal,
  protein: (a) => a.proteinG,
  carbohydrate: (a) => a.carbohydrateG,
  fat: (a) => a.fatG,
  water: (a) => a.fluidMl,
  sodium: (a) => a.sodiumMg,
  steps: (a) => a.steps,
  cardio: (a) => a.cardioMinutes,
};

/** Every metric with a target that day, in DRIFT_METRICS order. */
export function dayVerdicts(input: {
  targets: Targets;
  tolerances: Tolerances;
  actuals: DayActuals;
  inProgress: boolean;
}): DriftEntry[] {
  return DRIFT_METRICS.flatMap((metric) => {
    const target = TARGET_OF[metric](input.targets);
    if (target === null) return [];
    return [
      metricVerdict({
        metric,
        target,
        actual: ACTUAL_OF[metric](input.actuals),
        tolerances: input.tolerances,
        inProgress: input.inProgress,
      }),
    ];
  });
}

/**
 * Fluids logged at a clock time strictly later than the cut-off: "no fluids after 18:00" leaves a
 * drink at 18:00 itself before it (the one timing rule, `amountAfter` in plans/cutoff.ts).
 */
export function fluidsAfterCutoff(
  cutoffTime: string,
  fluids: readonly { time: string; volumeMl: number }[],
): number {
  return amountAfter(
    fluids.map((f) => ({ time: f.time, amount: f.volumeMl })),
    cutoffTime,
    0,
  ).logged;
}

/**
 * The cut-off as an at-most target: on plan at or under the allowance, off plan beyond it (no
 * tolerance on top of the allowance), not logged without any fluids, in progress on the athlete's
 * today. Null when the day has no cut-off.
 */
export function cutoffVerdict(
  cutoff: { time: string; allowanceMl: number } | null,
  fluids: readonly { time: string; volumeMl: number }[],
  inProgress: boolean,
): CutoffStatus | null {
  if (!cutoff) return null;
  const afterCutoffMl = fluidsAfterCutoff(cutoff.time, fluids);
  const diff = afterCutoffMl - cutoff.allowanceMl;
  const state: DriftState = inProgress
    ? 'in_progress'
    : fluids.length === 0
      ? 'not_logged'
      : judge(CUTOFF_RULE.kind, diff, CUTOFF_RULE.toleranceMl);
  return {
    cutoff: cutoff.time,
    allowanceMl: cutoff.allowanceMl,
    afterCutoffMl,
    excessMl: Math.max(0, diff),
    kind: CUTOFF_RULE.kind,
    state,
  };
}

/**
 * Adherence over metric-days: the share of logged days on plan (the product brief). Days in
 * progress count nowhere (neither as target days nor as logged); not logged counts as a target day
 * only, never as on plan. Null adherence with nothing logged.
 */
export function adherenceOf(states: Iterable<DriftState>): {
  targetDays: number;
  loggedDays: number;
  onPlanDays: number;
  adherence: number | null;
} {
  let targetDays = 0;
  let loggedDays = 0;
  let onPlanDays = 0;
  for (const state of states) {
    if (!isCounted(state)) continue;
    targetDays += 1;
    if (isJudged(state)) loggedDays += 1;
    if (state === 'on_plan') onPlanDays += 1;
  }
  return { targetDays, loggedDays, onPlanDays, adherence: loggedDays === 0 ? null : onPlanDays / loggedDays };
}

/**
 * Adherence to the meal plan: planned meals logged against planned, an at-least target with a
 * tolerance of a quarter of the planned meals (common practice, no source): with four meals, one
 * missed is on plan, two drifting, three off plan; with three, one missed is drifting.
 */
export const MEAL_PLAN_ADHERENCE_RULE = {
  kind: 'at_least' as const,
  tolerancePct: 25,
  source: `Planned meals logged of planned, a quarter of them short still on plan: ${COMMON_PRACTICE}`,
};

/**
 * The day's meal-plan adherence: null without planned meals; `in_progress` on the athlete's today;
 * `not_logged` on a finished day without any meal logged at all; otherwise judged by the rule above.
 */
export function mealPlanAdherence(input: {
  planned: number;
  logged: number;
  anyMealLogged: boolean;
  inProgress: boolean;
}): { planned: number; logged: number; state: DriftState; source: string } | null {
  const { planned, logged } = input;
  if (planned === 0) return null;
  const { kind, tolerancePct, source } = MEAL_PLAN_ADHERENCE_RULE;
  const state: DriftState = input.inProgress
    ? 'in_progress'
    : !input.anyMealLogged
      ? 'not_logged'
      : judge(kind, logged - planned, pctOf(planned, tolerancePct));
  return { planned, logged, state, source };
}
