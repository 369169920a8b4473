import { z } from 'zod';
import { clockTime, isoDate, text, uuid } from './common.js';
import { LIMITS } from '../limits.js';
import { EVENT_TYPES } from '../vocabulary.js';
import { SEXES } from './athletes.js';
import { plannedMeals } from './meal-plans.js';

/**
 * Plans, countdown templates and guardrails. A plan is a series of versions; each version holds
 * day targets as *expressions* (absolute, or relative to the athlete's baseline) together with the
 * baseline snapshot taken when it was saved, so a past day always resolves to the same numbers.
 */

export const WEEKDAYS = ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'] as const;
export type Weekday = (typeof WEEKDAYS)[number];
export const WEEKDAY_LABELS: Record<Weekday, string> = {
  mon: 'Mon',
  tue: 'Tue',
  wed: 'Wed',
  thu: 'Thu',
  fri: 'Fri',
  sat: 'Sat',
  sun: 'Sun',
};

/** Plausibility limits for targets: refuse nonsense; guardrails judge what is risky. */
export const PLAN_LIMITS = {
  energyKcal: { min: 0, max: 10000 },
  energyFactor: { min: 0.3, max: 2.5 },
  macroG: { min: 0, max: 1500 },
  macroPct: { min: 0, max: 100 },
  macroGPerKg: { min: 0, max: 15 },
  waterMl: { min: 0, max: 15000 },
  /** usual water ± this many mL. */
  waterDeltaMl: { min: -10000, max: 10000 },
  waterFactor: { min: 0, max: 4 },
  sodiumMg: { min: 0, max: 20000 },
  allowanceMl: { min: 0, max: 3000 },
  /** kcal still allowed after a food cut-off. */
  allowanceKcal: { min: 0, max: 2000 },
  /** The most a fluid cap ("only sips") may allow, mL. */
  fluidCapMl: { min: 0, max: 3000 },
  /** How long before the event's clock time an item may be timed, minutes (48 h). */
  minutesBeforeEvent: { min: 0, max: 2880 },
  steps: { min: 0, max: 100000 },
  cardioMinutes: { min: 0, max: 600 },
  supplementsPerDay: 30,
  timesPerSupplement: 12,
  dayTypes: 7,
  dateOverrides: 60,
  note: 500,
  reason: { min: 3, max: 300 },
  templateDays: 15,
  /** Countdown offsets from the event day, E-14 … E+3. */
  offset: { min: -14, max: 3 },
} as const;

const num = (min: number, max: number, what: string, unit = '') =>
  z
    .number({ error: `${what} must be a number` })
    .finite()
    .min(min, `${what} must be at least ${min}${unit}`)
    .max(max, `${what} must be at most ${max}${unit}`);

/** Energy: absolute kcal, or the athlete's usual energy × factor. */
export const energyTarget = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('kcal'), kcal: num(0, PLAN_LIMITS.energyKcal.max, 'Energy', ' kcal') }),
  z.object({
    kind: z.literal('usual_times'),
    factor: num(PLAN_LIMITS.energyFactor.min, PLAN_LIMITS.energyFactor.max, 'Factor'),
  }),
]);
export type EnergyTarget = z.infer<typeof energyTarget>;

/**
 * One macro: grams, a share of the day's energy (%), grams per kg of body weight, or (protein only)
 * grams per kg of lean mass from the latest body-composition measurement (Helms, Aragon & Fitschen
 * 2014, JISSN 11:20: 2.3–3.1 g/kg of lean mass in a diet).
 */
export const macroTarget = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('g'), g: num(0, PLAN_LIMITS.macroG.max, 'Grams', ' g') }),
  z.object({ kind: z.literal('pct'), pct: num(0, 100, 'Share', ' %') }),
  z.object({ kind: z.literal('g_per_kg'), perKg: num(0, PLAN_LIMITS.macroGPerKg.max, 'Grams per kg') }),
  z.object({
    kind: z.literal('g_per_kg_lean'),
    perKg: num(0, PLAN_LIMITS.macroGPerKg.max, 'Grams per kg of lean mass'),
  }),
]);
export type MacroTarget = z.infer<typeof macroTarget>;

/** Water: absolute mL, usual water ± mL, or usual water × factor. */
export const waterTarget = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('ml'), ml: num(0, PLAN_LIMITS.waterMl.max, 'Water', ' mL') }),
  z.object({
    kind: z.literal('usual_plus'),
    ml: num(PLAN_LIMITS.waterDeltaMl.min, PLAN_LIMITS.waterDeltaMl.max, 'Change from usual water', ' mL'),
  }),
  z.object({
    kind: z.literal('usual_times'),
    factor: num(PLAN_LIMITS.waterFactor.min, PLAN_LIMITS.waterFactor.max, 'Factor'),
  }),
]);
export type WaterTarget = z.infer<typeof waterTarget>;

/** A supplement the athlete is to take, at clock times and/or at times before the event. */
export const scheduleItem = z
  .object({
    /** Stable id; a supplement entry ticks it via `scheduleItemId`. */
    id: uuid,
    /** What to take ("Creatine monohydrate"). */
    item: text('Item', LIMITS.planItem),
    /** Dose amount, optional. */
    dose: num(0, 100000, 'Dose').nullable(),
    /** Dose unit ("g", "mg", "capsule"), optional. */
    unit: text('Unit', LIMITS.planUnit).nullable(),
    /** Clock times, HH:MM in the athlete's time zone. */
    times: z
      .array(clockTime)
      .max(PLAN_LIMITS.timesPerSupplement, `At most ${PLAN_LIMITS.timesPerSupplement} times`),
    /**
     * Times before the event's clock time, in minutes (180 = "3 h before"); only on countdown days.
     * The event's time zone places them; the athlete sees them on their own clock. Absent in
     * versions saved before these existed.
     */
    minutesBeforeEvent: z
      .array(
        z
          .number({ error: 'Time before the event must be a number' })
          .int('Whole minutes before the event')
          .min(PLAN_LIMITS.minutesBeforeEvent.min, 'Time before the event cannot be negative')
          .max(PLAN_LIMITS.minutesBeforeEvent.max, 'At most 48 h before the event'),
      )
      .max(PLAN_LIMITS.timesPerSupplement, `At most ${PLAN_LIMITS.timesPerSupplement} times`)
      .optional(),
  })
  .refine((s) => s.times.length + (s.minutesBeforeEvent?.length ?? 0) > 0, {
    message: 'Add a clock time or a time before the event',
    path: ['times'],
  });
export type ScheduleItem = z.infer<typeof scheduleItem>;

/** No fluids after this clock time beyond the allowance. */
export const fluidCutoff = z.object({
  /** HH:MM in the athlete's time zone. */
  time: clockTime,
  /** mL still allowed after the cut-off (sips with supplements, say). */
  allowanceMl: num(0, PLAN_LIMITS.allowanceMl.max, 'Allowance', ' mL'),
});
export type FluidCutoff = z.infer<typeof fluidCutoff>;

/** No food after this clock time beyond the allowance ("all food before 13:00"). */
export const foodCutoff = z.object({
  /** HH:MM in the athlete's time zone. */
  time: clockTime,
  /** kcal still allowed after the cut-off. */
  allowanceKcal: num(0, PLAN_LIMITS.allowanceKcal.max, 'Food allowance', ' kcal'),
});
export type FoodCutoff = z.infer<typeof foodCutoff>;

/** "Only sips": at most `maxMl` of fluids over the whole day, or after `after` when set. */
export const fluidCap = z.object({
  maxMl: num(0, PLAN_LIMITS.fluidCapMl.max, 'Fluid cap', ' mL'),
  /** HH:MM in the athlete's time zone; null: the cap is for the whole day. */
  after: clockTime.nullable(),
});
export type FluidCap = z.infer<typeof fluidCap>;

/** A day's targets as written by the coach (each metric optional: null = no target). */
export const dayTargets = z.object({
  energy: energyTarget.nullable(),
  protein: macroTarget.nullable(),
  carbohydrate: macroTarget.nullable(),
  fat: macroTarget.nullable(),
  water: waterTarget.nullable(),
  /** Sodium, mg. */
  sodiumMg: num(0, PLAN_LIMITS.sodiumMg.max, 'Sodium', ' mg').nullable(),
  fluidCutoff: fluidCutoff.nullable(),
  /** Absent in versions saved before it existed (read as null). */
  foodCutoff: foodCutoff.nullable().optional(),
  /** Absent in versions saved before it existed (read as null). */
  fluidCap: fluidCap.nullable().optional(),
  steps: num(0, PLAN_LIMITS.steps.max, 'Steps').int('Steps must be a whole number').nullable(),
  cardioMinutes: num(0, PLAN_LIMITS.cardioMinutes.max, 'Cardio', ' min').nullable(),
  supplements: z
    .array(scheduleItem)
    .max(PLAN_LIMITS.supplementsPerDay, `At most ${PLAN_LIMITS.supplementsPerDay} items`),
  /** A note the athlete reads with the day's targets. */
  note: text('Note', { max: PLAN_LIMITS.note }).nullable(),
  /** The day's meal plan: meals at clock times with foods and quantities. Absent in older versions. */
  meals: plannedMeals.optional(),
});
export type DayTargets = z.infer<typeof dayTargets>;

/** When a logged value counts as on plan: |actual − target| within these. */
export const tolerances = z.object({
  energyPct: num(0, 50, 'Energy tolerance', ' %'),
  proteinG: num(0, 200, 'Protein tolerance', ' g'),
  carbohydrateG: num(0, 300, 'Carbohydrate tolerance', ' g'),
  fatG: num(0, 100, 'Fat tolerance', ' g'),
  waterPct: num(0, 50, 'Water tolerance', ' %'),
  sodiumPct: num(0, 50, 'Sodium tolerance', ' %'),
  /**
   * Steps and cardio are minimums: how far short of the target (% of it) still counts as on plan.
   * Absent in versions saved before it existed: the default applies.
   */
  activityPct: num(0, 50, 'Steps and cardio tolerance', ' %').optional(),
});
export type Tolerances = z.infer<typeof tolerances>;

/** Defaults from the product brief (common practice, no source); steps and cardio 10 % short (the same). */
export const DEFAULT_TOLERANCES: Required<Tolerances> = {
  energyPct: 5,
  proteinG: 10,
  carbohydrateG: 15,
  fatG: 7,
  waterPct: 10,
  sodiumPct: 15,
  activityPct: 10,
};

/** A kind of day in the weekly pattern ("Training day", "Rest day"). */
export const dayType = z.object({
  /** Short stable key, lower-case letters, digits and dashes ("training"). */
  key: z.string().regex(/^[a-z0-9-]{1,24}$/, 'Use lower-case letters, digits and dashes'),
  name: text('Name', LIMITS.dayTypeName),
  targets: dayTargets,
});
export type DayType = z.infer<typeof dayType>;

/** Targets for one dated day, overriding the weekday pattern. */
export const dateOverride = z.object({
  date: isoDate,
  /** Shown with the day ("E-3 · Water load"). */
  label: text('Label', LIMITS.dayLabel).nullable(),
  /** Days from the event day when this day belongs to a countdown (−3 for E-3); else null. */
  countdownOffset: z.number().int().min(PLAN_LIMITS.offset.min).max(PLAN_LIMITS.offset.max).nullable(),
  targets: dayTargets,
});
export type DateOverride = z.infer<typeof dateOverride>;

/** The countdown a version carries, if any. */
export const countdownInfo = z.object({
  templateId: uuid.nullable(),
  templateName: z.string(),
  eventDate: isoDate,
  eventType: z.enum(EVENT_TYPES),
});
export type CountdownInfo = z.infer<typeof countdownInfo>;

/** What one plan version holds. Structural rules (keys exist, dates unique, shares add up) are in `validatePlanContent`. */
export const planContent = z.object({
  dayTypes: z.array(dayType).min(1, 'Add a day type').max(PLAN_LIMITS.dayTypes),
  /** Which day type each weekday follows. */
  weekdays: z.object(
    Object.fromEntries(WEEKDAYS.map((d) => [d, z.string().min(1)])) as Record<Weekday, z.ZodString>,
  ),
  dates: z
    .array(dateOverride)
    .max(PLAN_LIMITS.dateOverrides, `At most ${PLAN_LIMITS.dateOverrides} dated days`),
  tolerances,
  countdown: countdownInfo.nullable(),
});
export type PlanContent = z.infer<typeof planContent>;

/** The athlete figures relative targets resolve against; snapshotted into each version. */
export const planBaseline = z.object({
  usualWaterMl: z.number().nullable(),
  usualEnergyKcal: z.number().nullable(),
  /**
   * Latest trend weight (or the latest weigh-in when too few), kg; before the athlete's first
   * weigh-in, the weight they gave at intake (`weightFromIntake`).
   */
  weightKg: z.number().nullable(),
  /** True when `weightKg` is the intake's weight (no weigh-in yet). Absent in older versions. */
  weightFromIntake: z.boolean().optional(),
  sex: z.enum(SEXES).nullable(),
  /**
   * Lean (fat-free) mass of the latest body-composition measurement, kg, from that day's trend
   * weight; what g/kg-of-lean-mass targets resolve against. Absent in older versions.
   */
  leanMassKg: z.number().nullable().optional(),
  /** The date of that measurement. */
  leanMassDate: z.string().nullable().optional(),
});
export type PlanBaseline = z.infer<typeof planBaseline>;

/** Team guardrail floors per sex (owner sets them; defaults in GUARDRAIL_DEFAULTS). */
export const guardrailFloors = z.object({
  energyKcal: z.object({ female: num(0, 5000, 'Energy floor'), male: num(0, 5000, 'Energy floor') }),
  waterMl: z.object({ female: num(0, 8000, 'Water floor'), male: num(0, 8000, 'Water floor') }),
});
export type GuardrailFloors = z.infer<typeof guardrailFloors>;

/** Concrete numbers for one day, after resolving expressions against the baseline. */
export const resolvedTargets = z.object({
  energyKcal: z.number().nullable(),
  proteinG: z.number().nullable(),
  carbohydrateG: z.number().nullable(),
  fatG: z.number().nullable(),
  /** Share of the energy target (or of the macros' Atwater energy without one), %. */
  proteinPct: z.number().nullable(),
  carbohydratePct: z.number().nullable(),
  fatPct: z.number().nullable(),
  waterMl: z.number().nullable(),
  sodiumMg: z.number().nullable(),
  fluidCutoff: fluidCutoff.nullable(),
  foodCutoff: foodCutoff.nullable(),
  fluidCap: fluidCap.nullable(),
  steps: z.number().nullable(),
  cardioMinutes: z.number().nullable(),
  supplements: z.array(scheduleItem),
  /** One row per supplement time set before the event, placed on the athlete's clock. */
  eventTimed: z.array(
    z.object({
      itemId: uuid,
      item: z.string(),
      dose: z.number().nullable(),
      unit: z.string().nullable(),
      minutesBefore: z.number().int(),
      /**
       * The athlete's local date and clock time it falls on (the IANA tz database via Intl); null
       * when the event has no clock time or the day is not resolved against an event.
       */
      at: z.object({ date: z.string(), time: z.string() }).nullable(),
    }),
  ),
  note: z.string().nullable(),
  /** The day's planned meals (absent before meal plans existed). */
  meals: plannedMeals.optional(),
  /** How each relative figure was reached, by metric ("usual water 3000 mL + 1000 mL"). */
  basis: z.record(z.string(), z.string()),
});
export type ResolvedTargets = z.infer<typeof resolvedTargets>;

export const GUARDRAIL_CODES = [
  'energy_floor',
  'water_floor',
  'sodium_low',
  'potassium',
  'loss_rate',
  'loss_rate_strong',
  'make_weight_rate',
  'diuretic',
  'fluid_restriction',
  'carb_load',
] as const;
export type GuardrailCode = (typeof GUARDRAIL_CODES)[number];

/** Where a warning applies: the whole version, one day type of the pattern, or one date. */
export const guardrailScope = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('plan') }),
  z.object({ kind: z.literal('day_type'), key: z.string() }),
  z.object({ kind: z.literal('date'), date: isoDate }),
]);
export type GuardrailScope = z.infer<typeof guardrailScope>;

export const guardrailWarning = z.object({
  /** Stable within a content: `${code}:${scope}` ("sodium_low:date:2026-12-05"). */
  key: z.string(),
  code: z.enum(GUARDRAIL_CODES),
  /** `strong` for the ones that can put someone in hospital. */
  severity: z.enum(['warning', 'strong']),
  scope: guardrailScope,
  /** Plain words for coach and athlete, with the figures. */
  message: z.string(),
  /** The published source (or "common practice, no source"). */
  source: z.string(),
  /** The form path it concerns, for showing it beside the field ("dayTypes.1.targets.sodiumMg"). */
  field: z.string().nullable(),
});
export type GuardrailWarning = z.infer<typeof guardrailWarning>;

/** What the guardrails need beyond the content. */
export const guardrailContext = z.object({
  baseline: planBaseline,
  floors: guardrailFloors,
  /** The athlete's today (YYYY-MM-DD); with the event, for the make-weight rate. */
  today: isoDate,
  eventType: z.enum(EVENT_TYPES).nullable(),
  eventDate: isoDate.nullable(),
  weighInLimitKg: z.number().nullable(),
});
export type GuardrailContext = z.infer<typeof guardrailContext>;

// ---------------------------------------------------------------------------------------------
// API shapes

const reason = text('Reason', PLAN_LIMITS.reason);

/** Warning keys the coach has read and accepts. Each current warning must be listed. */
const acknowledgedKeys = z.array(text('Warning key', LIMITS.warningKey)).max(200);

/** POST /api/athletes/:athleteId/plan/versions: save a new version. */
export const createPlanVersionRequest = z.object({
  /** First day it is in force, the athlete's date; today or later. */
  effectiveFrom: isoDate,
  /** Why it changed, for the history. */
  reason,
  content: planContent,
  acknowledgedKeys,
});
export type CreatePlanVersionRequest = z.infer<typeof createPlanVersionRequest>;

/** POST /api/athletes/:athleteId/plan/check: the guardrails and field errors for a draft. */
export const checkPlanRequest = z.object({ effectiveFrom: isoDate.optional(), content: planContent });
export type CheckPlanRequest = z.infer<typeof checkPlanRequest>;
export const planCheckResult = z.object({
  /** Refusals (shares not adding up, unknown day type…), path → message. */
  errors: z.record(z.string(), z.string()),
  warnings: z.array(guardrailWarning),
});
export type PlanCheckResult = z.infer<typeof planCheckResult>;

export const acknowledgementView = z.object({
  key: z.string(),
  code: z.enum(GUARDRAIL_CODES),
  severity: z.enum(['warning', 'strong']),
  scope: guardrailScope,
  message: z.string(),
  source: z.string(),
  by: z.object({ id: uuid, name: z.string() }),
  at: z.string(),
});
export type AcknowledgementView = z.infer<typeof acknowledgementView>;

/** One version as listed in the history. */
export const planVersionSummary = z.object({
  id: uuid,
  number: z.number().int(),
  effectiveFrom: z.string(),
  reason: z.string(),
  createdBy: z.object({ id: uuid, name: z.string() }),
  createdAt: z.string(),
  /** What changed from the version before, in plain words. */
  changes: z.array(z.string()),
  countdown: countdownInfo.nullable(),
  acknowledgementCount: z.number().int(),
});
export type PlanVersionSummary = z.infer<typeof planVersionSummary>;

export const planVersionView = planVersionSummary.extend({
  content: planContent,
  baseline: planBaseline,
  acknowledgements: z.array(acknowledgementView),
});
export type PlanVersionView = z.infer<typeof planVersionView>;

/** GET /api/athletes/:athleteId/plan */
export const planView = z.object({
  athleteId: uuid,
  /** The athlete's today. */
  today: z.string(),
  /** Newest first. */
  versions: z.array(planVersionSummary),
  /** The version in force today (null before the first). */
  current: planVersionView.nullable(),
  /** The newest version (may start in the future). */
  latest: planVersionView.nullable(),
  /** The athlete's figures now, for a new version and live checks. */
  baseline: planBaseline,
  floors: guardrailFloors,
  guardrailContext,
});
export type PlanView = z.infer<typeof planView>;

/** POST /api/athletes/:athleteId/plan/countdown: preview (preview: true) or apply a template. */
export const applyCountdownRequest = z.object({
  templateId: uuid,
  /** The event day (E-0), in the event's calendar. */
  eventDate: isoDate,
  /** Only compute and return the preview. */
  preview: z.boolean().default(false),
  reason: reason.optional(),
  acknowledgedKeys: acknowledgedKeys.default([]),
});
export type ApplyCountdownRequest = z.input<typeof applyCountdownRequest>;

/** POST /api/athletes/:athleteId/plan/countdown/move: shift the countdown to a new event date. */
export const moveCountdownRequest = z.object({
  eventDate: isoDate,
  preview: z.boolean().default(false),
  reason: reason.optional(),
  acknowledgedKeys: acknowledgedKeys.default([]),
});
export type MoveCountdownRequest = z.input<typeof moveCountdownRequest>;

export const countdownPreviewDay = z.object({
  date: z.string(),
  offset: z.number().int(),
  /** "E-3", "E+1". */
  dayLabel: z.string(),
  label: z.string().nullable(),
  targets: resolvedTargets,
  /** Before the athlete's today: not applied (past days keep the plan they had). */
  past: z.boolean(),
});
export type CountdownPreviewDay = z.infer<typeof countdownPreviewDay>;

export const countdownPreview = z.object({
  eventDate: z.string(),
  /** The new version's first day: the first countdown day, or today when that has passed. */
  effectiveFrom: z.string(),
  days: z.array(countdownPreviewDay),
  baseline: planBaseline,
  warnings: z.array(guardrailWarning),
  /** The content that would be saved. */
  content: planContent,
});
export type CountdownPreview = z.infer<typeof countdownPreview>;

/** PATCH /api/athletes/:athleteId/event: the coach changes the event. */
export const updateEventRequest = z.object({
  eventDate: isoDate,
  eventTime: clockTime.nullable().optional(),
  eventName: text('Event name', LIMITS.eventName).nullable().optional(),
});
export type UpdateEventRequest = z.infer<typeof updateEventRequest>;

// Countdown templates --------------------------------------------------------------------------

export const templateDay = z.object({
  /** Days from the event (E-3 = −3, E+1 = 1). */
  offset: z
    .number({ error: 'Day is required' })
    .int()
    .min(PLAN_LIMITS.offset.min, `No earlier than E${PLAN_LIMITS.offset.min}`)
    .max(PLAN_LIMITS.offset.max, `No later than E+${PLAN_LIMITS.offset.max}`),
  /** Short name for the day ("Water load"). */
  label: text('Label', LIMITS.dayLabel).nullable(),
  targets: dayTargets,
});
export type TemplateDay = z.infer<typeof templateDay>;

/** POST /api/countdown-templates, PUT /api/countdown-templates/:id */
export const templateRequest = z.object({
  name: text('Name', LIMITS.templateName),
  /** The kind of event it is written for. */
  eventType: z.enum(EVENT_TYPES, { error: 'Choose an event type' }),
  description: text('Description', LIMITS.templateDescription).nullable(),
  days: z.array(templateDay).min(1, 'Add at least one day').max(PLAN_LIMITS.templateDays),
});
export type TemplateRequest = z.infer<typeof templateRequest>;

export const templateView = templateRequest.extend({
  id: uuid,
  createdBy: z.object({ id: uuid, name: z.string() }),
  updatedAt: z.string(),
});
export type TemplateView = z.infer<typeof templateView>;

// The day view's plan part ---------------------------------------------------------------------

/** What `GET /api/athletes/:athleteId/days/:date` carries as `targets`. */
export const dayTargetsInForce = z.object({
  versionId: uuid,
  versionNumber: z.number().int(),
  effectiveFrom: z.string(),
  /** Where the day's targets come from: a weekday's day type or a dated day. */
  source: z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('pattern'), dayTypeKey: z.string(), dayTypeName: z.string() }),
    z.object({ kind: z.literal('date'), label: z.string().nullable() }),
  ]),
  targets: resolvedTargets,
  tolerances,
});
export type DayTargetsInForce = z.infer<typeof dayTargetsInForce>;

export const countdownDay = z.object({
  eventDate: z.string(),
  eventType: z.enum(EVENT_TYPES),
  offset: z.number().int(),
  /** "E-3". */
  dayLabel: z.string(),
  label: z.string().nullable(),
});
export type CountdownDay = z.infer<typeof countdownDay>;

export const dayCaution = z.object({
  code: z.union([z.enum(GUARDRAIL_CODES), z.literal('countdown')]),
  severity: z.enum(['warning', 'strong']),
  message: z.string(),
  source: z.string(),
  /** When the coach acknowledged it (null for the standing countdown caution). */
  acknowledgedAt: z.string().nullable(),
});
export type DayCaution = z.infer<typeof dayCaution>;
