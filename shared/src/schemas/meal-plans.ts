import { z } from 'zod';
import { DRIFT_STATES } from '../vocabulary.js';
import { clockTime, text, uuid } from './common.js';
import { foodRef } from './check-ins.js';
import { driftEntry } from './trends.js';

/**
 * Meal plans: a day's planned meals (clock time, foods with quantities) are part of the day's
 * targets, so they live in a plan version's day types, dated (countdown) days and template days,
 * and a day resolves to its meals through the same resolution as its targets.
 */

export const MEAL_PLAN_LIMITS = {
  mealsPerDay: 10,
  foodsPerMeal: 15,
  /** Grams of one food in a planned meal. */
  quantityG: { min: 0, max: 3000 },
  /** Fitting steps: 1 g up to a whole unit of 500 g. */
  stepG: { min: 1, max: 500 },
  /** Foods one fit may work on. */
  fitFoods: 60,
} as const;

/** What the default fit bounds are when a food carries none (common practice, no source). */
export const DEFAULT_FIT_BOUNDS = { minG: 0, maxG: 400, stepG: 5 } as const;

/** A food's per-100 g values as the plan keeps them (the server fills them from the food list on save). */
export const plannedPer100g = z.object({
  energyKcal: z.number().finite().min(0).max(1000),
  proteinG: z.number().finite().min(0).max(100),
  carbohydrateG: z.number().finite().min(0).max(100),
  fatG: z.number().finite().min(0).max(100),
  sodiumMg: z.number().finite().min(0).max(50000).nullable(),
});
export type PlannedPer100g = z.infer<typeof plannedPer100g>;

const grams = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a number` })
    .finite()
    .min(min, `${what} must be at least ${min} g`)
    .max(max, `${what} must be at most ${max} g`);

/** A food of the food list, named as meal items name it. */
export const plannedFoodId = foodRef;

/** One food of a planned meal. */
export const plannedFood = z.object({
  /** The food's id from GET /api/foods. */
  foodId: plannedFoodId,
  /** The food's name when the version was saved (the server sets it from the food list). */
  name: text('Food', { max: 200 }),
  /** Grams planned. */
  quantityG: grams('Quantity', MEAL_PLAN_LIMITS.quantityG.min, MEAL_PLAN_LIMITS.quantityG.max),
  /** Per-100 g values when the version was saved; the server replaces what a request sends. */
  per100g: plannedPer100g,
  /** Fitting bounds: least grams (default 0). */
  minG: grams('Least', 0, MEAL_PLAN_LIMITS.quantityG.max).optional(),
  /** Fitting bounds: most grams (default 400). */
  maxG: grams('Most', 0, MEAL_PLAN_LIMITS.quantityG.max).optional(),
  /** Fitting step, g (5 g, or one unit's weight for foods eaten whole). */
  stepG: grams('Step', MEAL_PLAN_LIMITS.stepG.min, MEAL_PLAN_LIMITS.stepG.max).optional(),
});
export type PlannedFood = z.infer<typeof plannedFood>;

/** A planned meal: a name, a clock time and its foods. */
export const plannedMeal = z.object({
  /** Stable id; a logged meal names it (`plannedMealId`), a new version keeps it. */
  id: uuid,
  /** "Breakfast", "Pre-training". */
  name: text('Meal name', { min: 1, max: 120 }),
  /** HH:MM in the athlete's time zone. */
  time: clockTime,
  foods: z
    .array(plannedFood)
    .min(1, 'Add a food')
    .max(MEAL_PLAN_LIMITS.foodsPerMeal, `At most ${MEAL_PLAN_LIMITS.foodsPerMeal} foods`),
});
export type PlannedMeal = z.infer<typeof plannedMeal>;

export const plannedMeals = z
  .array(plannedMeal)
  .max(MEAL_PLAN_LIMITS.mealsPerDay, `At most ${MEAL_PLAN_LIMITS.mealsPerDay} meals`);

/** Energy and macros of a meal or a day, as planned. */
export const mealPlanTotals = z.object({
  energyKcal: z.number(),
  proteinG: z.number(),
  carbohydrateG: z.number(),
  fatG: z.number(),
  sodiumMg: z.number().nullable(),
});
export type MealPlanTotals = z.infer<typeof mealPlanTotals>;

// Fitting --------------------------------------------------------------------------------------

/** The energy and macro figures a fit aims at (null: no target for it). */
export const fitTargets = z.object({
  energyKcal: z.number().finite().min(0).max(10000).nullable(),
  proteinG: z.number().finite().min(0).max(1500).nullable(),
  carbohydrateG: z.number().finite().min(0).max(1500).nullable(),
  fatG: z.number().finite().min(0).max(1500).nullable(),
});
export type FitTargets = z.infer<typeof fitTargets>;

/** POST /api/meal-plans/fit: propose quantities for the chosen foods. */
export const fitMealPlanRequest = z.object({
  /** The day's resolved energy and macro targets. */
  targets: fitTargets,
  /** The plan's tolerances (energy %, macros g). */
  tolerances: z.object({
    energyPct: z.number().finite().min(0).max(50),
    proteinG: z.number().finite().min(0).max(200),
    carbohydrateG: z.number().finite().min(0).max(300),
    fatG: z.number().finite().min(0).max(100),
  }),
  /** The day's meals with their foods and bounds; quantities are ignored. */
  meals: z
    .array(
      z.object({
        id: uuid,
        foods: z
          .array(
            z.object({
              foodId: plannedFoodId,
              minG: grams('Least', 0, MEAL_PLAN_LIMITS.quantityG.max).optional(),
              maxG: grams('Most', 0, MEAL_PLAN_LIMITS.quantityG.max).optional(),
              stepG: grams('Step', MEAL_PLAN_LIMITS.stepG.min, MEAL_PLAN_LIMITS.stepG.max).optional(),
            }),
          )
          .min(1, 'Add a food')
          .max(MEAL_PLAN_LIMITS.foodsPerMeal),
      }),
    )
    .min(1, 'Add a meal')
    .max(MEAL_PLAN_LIMITS.mealsPerDay),
});
export type FitMealPlanRequest = z.infer<typeof fitMealPlanRequest>;

/** The answer of a fit. */
export const mealPlanFit = z.object({
  /** True when every target with a figure lands within its tolerance. */
  fits: z.boolean(),
  /** Proposed grams per meal and food, in the request's order. */
  meals: z.array(
    z.object({ id: uuid, foods: z.array(z.object({ foodId: z.string(), quantityG: z.number() })) }),
  ),
  totals: mealPlanTotals,
  /** Each target against the proposal, by the shared day verdicts. */
  verdicts: z.array(driftEntry),
  /** One line per target that cannot be met, with by how much ("Protein: 40 g short of 180 g …"). */
  unmet: z.array(z.string()),
});
export type MealPlanFit = z.infer<typeof mealPlanFit>;

// The day view's part --------------------------------------------------------------------------

/** A planned meal on a day, as the day view carries it. */
export const plannedMealView = plannedMeal.extend({
  totals: mealPlanTotals,
  /** The meal entry logging it that day, if any. */
  loggedEntryId: uuid.nullable(),
});
export type PlannedMealView = z.infer<typeof plannedMealView>;

/** Planned meals logged against planned, judged by the shared rule (`mealPlanAdherence`). */
export const mealPlanAdherenceView = z.object({
  planned: z.number().int(),
  logged: z.number().int(),
  state: z.enum(DRIFT_STATES),
  source: z.string(),
});
export type MealPlanAdherenceView = z.infer<typeof mealPlanAdherenceView>;

export const dayMealPlan = z.object({
  meals: z.array(plannedMealView),
  totals: mealPlanTotals,
  adherence: mealPlanAdherenceView,
});
export type DayMealPlan = z.infer<typeof dayMealPlan>;

/** POST /api/athletes/:athleteId/days/:date/planned-meals/:mealId: log a planned meal as eaten. */
export const logPlannedMealRequest = z.object({
  /** Client-generated id (idempotency). */
  clientId: uuid,
  /** Clock time eaten; the planned time when absent. */
  time: clockTime.optional(),
  /** Changed quantities or swapped foods; the plan's foods when absent. */
  foods: z
    .array(
      z.object({
        foodId: plannedFoodId,
        quantityG: grams('Quantity', 1, MEAL_PLAN_LIMITS.quantityG.max),
      }),
    )
    .min(1, 'Add a food')
    .max(MEAL_PLAN_LIMITS.foodsPerMeal)
    .optional(),
});
export type LogPlannedMealRequest = z.infer<typeof logPlannedMealRequest>;
