import { z } from 'zod';
import { DRIFT_STATES } from '../vocabulary.js';
import { isoDate, uuid } from './common.js';

/**
 * Trend, rate, projection, drift from plan and adherence, as the server computes them
 * (api/src/lib/analysis.ts). All weights in kg, fluids in mL, energy in kcal, sodium in mg.
 */

/**
 * How a target is met: `range` (target ± tolerance), `at_least` (reaching or passing it is on plan),
 * `at_most` (staying at or under it is on plan).
 */
export const TARGET_KINDS = ['range', 'at_least', 'at_most'] as const;
export type TargetKind = (typeof TARGET_KINDS)[number];

/** Metrics a day can drift on (each only when the day has a target for it). */
export const DRIFT_METRICS = [
  'energy',
  'protein',
  'carbohydrate',
  'fat',
  'water',
  'sodium',
  'steps',
  'cardio',
] as const;
export type DriftMetric = (typeof DRIFT_METRICS)[number];
export const DRIFT_METRIC_LABELS: Record<DriftMetric, string> = {
  energy: 'Energy',
  protein: 'Protein',
  carbohydrate: 'Carbohydrate',
  fat: 'Fat',
  water: 'Water',
  sodium: 'Sodium',
  steps: 'Steps',
  cardio: 'Cardio',
};
export const DRIFT_METRIC_UNITS: Record<DriftMetric, string> = {
  energy: 'kcal',
  protein: 'g',
  carbohydrate: 'g',
  fat: 'g',
  water: 'mL',
  sodium: 'mg',
  steps: 'steps',
  cardio: 'min',
};

/** One metric's drift on one day. */
export const driftEntry = z.object({
  metric: z.enum(DRIFT_METRICS),
  target: z.number(),
  /** Null when nothing was logged for it (state not_logged). */
  actual: z.number().nullable(),
  /** actual − target. */
  diff: z.number().nullable(),
  /** (actual − target) / target; null when the target is 0 or nothing was logged. */
  relative: z.number().nullable(),
  /** The tolerance in the metric's own unit (energy ±5 % of 2,400 kcal → 120). */
  tolerance: z.number(),
  /** How the target is met (a range for energy, macros, water, sodium; at least for steps, cardio). */
  kind: z.enum(TARGET_KINDS),
  /** The values that count as on plan (null: no bound on that side). */
  onPlan: z.object({ min: z.number().nullable(), max: z.number().nullable() }),
  state: z.enum(DRIFT_STATES),
});
export type DriftEntry = z.infer<typeof driftEntry>;

/** Fluids after the day's cut-off beyond its allowance. */
export const cutoffBreach = z.object({
  cutoff: z.string(),
  allowanceMl: z.number(),
  afterCutoffMl: z.number(),
  /** afterCutoffMl − allowanceMl (> 0 means a breach). */
  excessMl: z.number(),
});
export type CutoffBreach = z.infer<typeof cutoffBreach>;

/** Fluids after the day's cut-off against its allowance: an at-most target, judged like the others. */
export const cutoffStatus = z.object({
  cutoff: z.string(),
  allowanceMl: z.number(),
  /** Fluids logged at a clock time later than the cut-off, mL. */
  afterCutoffMl: z.number(),
  /** max(0, afterCutoffMl − allowanceMl). */
  excessMl: z.number(),
  kind: z.literal('at_most'),
  state: z.enum(DRIFT_STATES),
});
export type CutoffStatus = z.infer<typeof cutoffStatus>;

export const FLAG_KINDS = [
  'acute_drop',
  'rate_beyond',
  'rate_far_beyond',
  'symptom',
  'missed_weigh_ins',
] as const;
export type FlagKind = (typeof FLAG_KINDS)[number];

/**
 * The flags that count as safety flags (the brief: a drop of 2 % of body mass or more, a weekly
 * rate far beyond guidance, any symptom report). A rate just beyond guidance is drift and missed
 * weigh-ins are missed check-ins: flags, but not safety flags. The roster's count and the review
 * queue's safety items both read this list.
 */
export const SAFETY_FLAG_KINDS = [
  'acute_drop',
  'rate_far_beyond',
  'symptom',
] as const satisfies readonly FlagKind[];

export const trendFlag = z.object({
  kind: z.enum(FLAG_KINDS),
  /** The day it concerns (the later weigh-in, the last missed day, the symptom's day…). */
  date: z.string(),
  severity: z.enum(['warning', 'strong']),
  message: z.string(),
  source: z.string(),
  /**
   * An acute drop's figures: the highest weigh-in of the 48 h before (date, kg), the flagged one (kg)
   * and the drop as a percentage of the earlier weight.
   */
  drop: z
    .object({ fromDate: z.string(), fromKg: z.number(), toKg: z.number(), percent: z.number() })
    .optional(),
});
export type TrendFlag = z.infer<typeof trendFlag>;

/** One row per calendar day in the range (days with nothing logged included). */
export const trendDay = z.object({
  date: z.string(),
  /** Morning weigh-in, null when not weighed. */
  weightKg: z.number().nullable(),
  /** Smoothed trend (10 % smoothing), carried over unweighed days (not recomputed from invented points). */
  trendKg: z.number().nullable(),
  /** Trailing 7-day mean of the weigh-ins present; null with fewer than 4 in the window. */
  mean7Kg: z.number().nullable(),
  /** What was logged that day (totals). */
  actuals: z.object({
    energyKcal: z.number().nullable(),
    proteinG: z.number().nullable(),
    carbohydrateG: z.number().nullable(),
    fatG: z.number().nullable(),
    fluidMl: z.number().nullable(),
    sodiumMg: z.number().nullable(),
    steps: z.number().nullable(),
    cardioMinutes: z.number().nullable(),
  }),
  /** Resolved targets in force that day (null without a plan). */
  targets: z
    .object({
      energyKcal: z.number().nullable(),
      proteinG: z.number().nullable(),
      carbohydrateG: z.number().nullable(),
      fatG: z.number().nullable(),
      waterMl: z.number().nullable(),
      sodiumMg: z.number().nullable(),
      steps: z.number().nullable(),
      cardioMinutes: z.number().nullable(),
      fluidCutoff: z.object({ time: z.string(), allowanceMl: z.number() }).nullable(),
      versionNumber: z.number().int(),
    })
    .nullable(),
  drift: z.array(driftEntry),
  breach: cutoffBreach.nullable(),
  /** Countdown day label ("E-3") or null. */
  countdown: z.object({ offset: z.number().int(), dayLabel: z.string() }).nullable(),
});
export type TrendDay = z.infer<typeof trendDay>;

export const rateView = z.object({
  /** Least-squares slope × 7, kg per week. */
  kgPerWeek: z.number(),
  /** kgPerWeek / mean weight of the window × 100. */
  percentPerWeek: z.number(),
  /** Null when the weigh-ins are all one reading at the scale's resolution (R² undefined). */
  r2: z.number().nullable(),
  /** Weigh-ins used (≥ 7) and the 14-day window. */
  points: z.number().int(),
  from: z.string(),
  to: z.string(),
  /** Guidance for the athlete's phase, %/week (negative = loss), e.g. −1 … −0.5 while dieting (Helms 2014). */
  band: z
    .object({ minPct: z.number(), maxPct: z.number(), label: z.string(), source: z.string() })
    .nullable(),
  /** Why there is no band, in words (paused during a countdown, none for a regain); null with a band. */
  bandNote: z.string().nullable(),
  /** During a countdown: no band and no rate flags (water and glycogen change on purpose). */
  paused: z.boolean(),
  /** The rate against the band (rules/rate-verdict.ts); null without a band. */
  verdict: z
    .object({
      pace: z.enum(['inside', 'faster', 'slower', 'outside']),
      state: z.enum(['on_plan', 'drifting', 'off_plan']),
    })
    .nullable(),
});
export type RateView = z.infer<typeof rateView>;

export const projectionView = z.object({
  date: z.string(),
  kg: z.number(),
  /** 80 % prediction interval. */
  lowKg: z.number(),
  highKg: z.number(),
  level: z.literal(0.8),
});
export type ProjectionView = z.infer<typeof projectionView>;

/** The projection at the weigh-in against the limit (shared/src/rules/weight-cut.ts limitGap). */
export const limitGapView = z.object({
  projectedKg: z.number(),
  lowKg: z.number(),
  highKg: z.number(),
  overKg: z.number(),
  overPct: z.number(),
  over: z.boolean(),
  rangeOver: z.boolean(),
  daysLeft: z.number().int(),
  extraPctPerWeek: z.number().nullable(),
  /** "Projected 0.6 kg over the 63.0 kg limit, needs 0.7 %/week more". */
  summary: z.string(),
});
export type LimitGapView = z.infer<typeof limitGapView>;

/** Weekly adherence for one metric: share of logged days on plan. */
export const adherenceWeek = z.object({
  /** Monday of the week. */
  weekStart: z.string(),
  metric: z.enum(DRIFT_METRICS),
  /** Days that week with a target for the metric. */
  targetDays: z.number().int(),
  loggedDays: z.number().int(),
  onPlanDays: z.number().int(),
  /** onPlanDays / loggedDays; null with nothing logged. */
  adherence: z.number().nullable(),
  /** loggedDays / targetDays. */
  loggedShare: z.number().nullable(),
});
export type AdherenceWeek = z.infer<typeof adherenceWeek>;

/** A week of a trend range: its adherence with the span of it that lies inside the range. */
export const adherenceWeekInRange = adherenceWeek.extend({
  /** First and last day of the week inside the range (a range starting on a Wednesday: Wednesday … Sunday). */
  from: z.string(),
  to: z.string(),
  /** Calendar days of the week inside the range (1–7). */
  days: z.number().int(),
  /** Fewer than 7 days of the week lie inside the range: judged over those days only. */
  partial: z.boolean(),
});
export type AdherenceWeekInRange = z.infer<typeof adherenceWeekInRange>;

export const maintenanceView = z.object({
  kcalPerDay: z.number(),
  /** Logged days used (countdown days excluded). */
  days: z.number().int(),
  from: z.string(),
  to: z.string(),
  /** Always says it is a rule-of-thumb estimate. */
  note: z.string(),
});
export type MaintenanceView = z.infer<typeof maintenanceView>;

/** GET /api/athletes/:athleteId/trend?from&to */
export const trendQuery = z.object({ from: isoDate, to: isoDate });
export type TrendQuery = z.infer<typeof trendQuery>;

export const trendView = z.object({
  athleteId: uuid,
  from: z.string(),
  to: z.string(),
  /** The athlete's today. */
  today: z.string(),
  eventDate: z.string().nullable(),
  days: z.array(trendDay),
  /** Rate over the 14 days ending at `to` (or today when earlier); null with fewer than 7 weigh-ins. */
  rate: rateView.nullable(),
  /** To the event date; null without an event ahead or too few points. */
  projection: projectionView.nullable(),
  /** Per Monday-start week and metric, each labelled with its real span inside the range. */
  adherence: z.array(adherenceWeekInRange),
  maintenance: maintenanceView.nullable(),
  flags: z.array(trendFlag),
});
export type TrendView = z.infer<typeof trendView>;

// The trend as sent: its days as columns ------------------------------------------------------

const column = <T extends z.ZodType>(item: T) => z.array(item);
const numbers = column(z.number().nullable());

/** One metric's drift entries over the range, a column per field; null on days without an entry. */
export const driftColumns = z.object({
  target: numbers,
  actual: numbers,
  diff: numbers,
  relative: numbers,
  tolerance: numbers,
  kind: column(z.enum(TARGET_KINDS).nullable()),
  onPlanMin: numbers,
  onPlanMax: numbers,
  /** Null: no drift entry for the metric that day (no target). */
  state: column(z.enum(DRIFT_STATES).nullable()),
});
export type DriftColumns = z.infer<typeof driftColumns>;

/**
 * The trend's days as columns (index i is the range's i-th day): each field name is sent once
 * instead of once per day, which is most of a 3-year answer's size. trendDaysFromColumns gives back
 * exactly the TrendDay rows.
 */
export const trendDayColumns = z.object({
  date: column(z.string()),
  weightKg: numbers,
  trendKg: numbers,
  mean7Kg: numbers,
  actuals: z.object({
    energyKcal: numbers,
    proteinG: numbers,
    carbohydrateG: numbers,
    fatG: numbers,
    fluidMl: numbers,
    sodiumMg: numbers,
    steps: numbers,
    cardioMinutes: numbers,
  }),
  /** The day's targets; `versionNumber` null: no plan that day (targets null). */
  targets: z.object({
    energyKcal: numbers,
    proteinG: numbers,
    carbohydrateG: numbers,
    fatG: numbers,
    waterMl: numbers,
    sodiumMg: numbers,
    steps: numbers,
    cardioMinutes: numbers,
    fluidCutoff: column(z.object({ time: z.string(), allowanceMl: z.number() }).nullable()),
    versionNumber: column(z.number().int().nullable()),
  }),
  /** Per metric with at least one entry in the range. */
  drift: z.object(
    Object.fromEntries(DRIFT_METRICS.map((m) => [m, driftColumns.optional()])) as Record<
      DriftMetric,
      z.ZodOptional<typeof driftColumns>
    >,
  ),
  breach: column(cutoffBreach.nullable()),
  countdown: column(z.object({ offset: z.number().int(), dayLabel: z.string() }).nullable()),
});
export type TrendDayColumns = z.infer<typeof trendDayColumns>;

/** GET /api/athletes/:athleteId/trend answers this: the trend view with its days as columns. */
export const trendResponse = trendView.extend({ days: trendDayColumns });
export type TrendResponse = z.infer<typeof trendResponse>;

const ACTUAL_FIELDS = [
  'energyKcal',
  'proteinG',
  'carbohydrateG',
  'fatG',
  'fluidMl',
  'sodiumMg',
  'steps',
  'cardioMinutes',
] as const;
const TARGET_FIELDS = [
  'energyKcal',
  'proteinG',
  'carbohydrateG',
  'fatG',
  'waterMl',
  'sodiumMg',
  'steps',
  'cardioMinutes',
] as const;

/** TrendDay rows → columns (the server's side). */
export function trendDaysToColumns(days: readonly TrendDay[]): TrendDayColumns {
  const pick = <T>(get: (d: TrendDay) => T): T[] => days.map(get);
  const drift: TrendDayColumns['drift'] = {};
  for (const metric of DRIFT_METRICS) {
    const entries = days.map((d) => d.drift.find((e) => e.metric === metric) ?? null);
    if (entries.every((e) => e === null)) continue;
    const field = <T>(get: (e: DriftEntry) => T): (T | null)[] => entries.map((e) => (e ? get(e) : null));
    drift[metric] = {
      target: field((e) => e.target),
      actual: field((e) => e.actual),
      diff: field((e) => e.diff),
      relative: field((e) => e.relative),
      tolerance: field((e) => e.tolerance),
      kind: field((e) => e.kind),
      onPlanMin: field((e) => e.onPlan.min),
      onPlanMax: field((e) => e.onPlan.max),
      state: field((e) => e.state),
    };
  }
  return {
    date: pick((d) => d.date),
    weightKg: pick((d) => d.weightKg),
    trendKg: pick((d) => d.trendKg),
    mean7Kg: pick((d) => d.mean7Kg),
    actuals: Object.fromEntries(
      ACTUAL_FIELDS.map((f) => [f, pick((d) => d.actuals[f])]),
    ) as TrendDayColumns['actuals'],
    targets: {
      ...(Object.fromEntries(TARGET_FIELDS.map((f) => [f, pick((d) => d.targets?.[f] ?? null)])) as Omit<
        TrendDayColumns['targets'],
        'fluidCutoff' | 'versionNumber'
      >),
      fluidCutoff: pick((d) => d.targets?.fluidCutoff ?? null),
      versionNumber: pick((d) => d.targets?.versionNumber ?? null),
    },
    drift,
    breach: pick((d) => d.breach),
    countdown: pick((d) => d.countdown),
  };
}

/** Columns → the TrendDay rows they were made from (the web's side), drift in DRIFT_METRICS order. */
export function trendDaysFromColumns(c: TrendDayColumns): TrendDay[] {
  return c.date.map((date, i) => {
    const at = <T>(values: readonly T[]): T => values[i] as T;
    const versionNumber = at(c.targets.versionNumber);
    const drift: DriftEntry[] = [];
    for (const metric of DRIFT_METRICS) {
      const m = c.drift[metric];
      const state = m ? at(m.state) : null;
      if (!m || state === null) continue;
      drift.push({
        metric,
        target: at(m.target) as number,
        actual: at(m.actual),
        diff: at(m.diff),
        relative: at(m.relative),
        tolerance: at(m.tolerance) as number,
        kind: at(m.kind) as TargetKind,
        onPlan: { min: at(m.onPlanMin), max: at(m.onPlanMax) },
        state,
      });
    }
    return {
      date,
      weightKg: at(c.weightKg),
      trendKg: at(c.trendKg),
      mean7Kg: at(c.mean7Kg),
      actuals: Object.fromEntries(ACTUAL_FIELDS.map((f) => [f, at(c.actuals[f])])) as TrendDay['actuals'],
      targets:
        versionNumber === null
          ? null
          : {
              ...(Object.fromEntries(TARGET_FIELDS.map((f) => [f, at(c.targets[f])])) as Omit<
                NonNullable<TrendDay['targets']>,
                'fluidCutoff' | 'versionNumber'
              >),
              fluidCutoff: at(c.targets.fluidCutoff),
              versionNumber,
            },
      drift,
      breach: at(c.breach),
      countdown: at(c.countdown),
    };
  });
}

/** The trend answer read back as a TrendView (rows per day). */
export function trendViewFromResponse(response: TrendResponse): TrendView {
  return { ...response, days: trendDaysFromColumns(response.days) };
}

// Roster and review queue ----------------------------------------------------------------------

export const PHASES = ['countdown', 'dieting', 'maintaining', 'regaining', 'no_plan'] as const;
export type Phase = (typeof PHASES)[number];
export const PHASE_LABELS: Record<Phase, string> = {
  countdown: 'Countdown',
  dieting: 'Dieting',
  maintaining: 'Maintaining',
  regaining: 'Regaining',
  no_plan: 'No plan',
};

/** Extra roster columns (merged into RosterRow). */
export const rosterFigures = z.object({
  phase: z.enum(PHASES),
  /** "E-3" when today is a countdown day. */
  countdownLabel: z.string().nullable(),
  latestWeightKg: z.number().nullable(),
  latestWeighInDate: z.string().nullable(),
  trendKg: z.number().nullable(),
  /** 14-day rate, %/week; null with too few weigh-ins. */
  ratePercentPerWeek: z.number().nullable(),
  rateBand: z.object({ minPct: z.number(), maxPct: z.number() }).nullable(),
  /** Why there is no band (e.g. paused during the countdown); null with a band. */
  rateBandNote: z.string().nullable(),
  /** The rate against the band, judged by the server (rules/rate-verdict.ts); null without rate or band. */
  rateVerdict: rateView.shape.verdict,
  /** Share of logged metric-days on plan over the last 7 days; null with nothing to judge. */
  adherence7: z.number().nullable(),
  /** The athlete's last day with anything logged. */
  lastCheckInDate: z.string().nullable(),
  /** Open flags (kinds) over the last 7 days. */
  flags: z.array(z.enum(FLAG_KINDS)),
  /** Whether any of them is a safety flag (SAFETY_FLAG_KINDS; the review queue's safety items). */
  safetyFlag: z.boolean(),
  /** For a weigh-in ahead: the projection against the class limit (rules/weight-cut.ts); null otherwise. */
  weighInGap: limitGapView.nullable(),
});
export type RosterFigures = z.infer<typeof rosterFigures>;
