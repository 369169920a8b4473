import type { DayActuals } from '../rules/day-verdicts.js';
import { dayVerdicts } from '../rules/day-verdicts.js';
import { nutrientsAsEaten } from '../meal-items.js';
import type { MealPlanTotals, PlannedPer100g } from '../schemas/meal-plans.js';

/** A food and its grams: what a planned meal's totals are made of. */
export interface FoodAmount {
  per100g: PlannedPer100g;
  quantityG: number;
}
import type { ResolvedTargets, Tolerances } from '../schemas/plans.js';
import type { DriftEntry } from '../schemas/trends.js';

/** One planned food's energy and macros: its per-100 g values × grams / 100 (the meal-entry rule). */
export function plannedFoodTotals(food: FoodAmount): MealPlanTotals {
  const n = nutrientsAsEaten({ ...food.per100g, fibreG: null }, food.quantityG);
  return {
    energyKcal: n.energyKcal,
    proteinG: n.proteinG,
    carbohydrateG: n.carbohydrateG,
    fatG: n.fatG,
    sodiumMg: n.sodiumMg,
  };
}

/** Sums of totals; sodium stays unknown (null) unless some part carries a figure. */
export function addTotals(parts: readonly MealPlanTotals[]): MealPlanTotals {
  const sum: MealPlanTotals = { energyKcal: 0, proteinG: 0, carbohydrateG: 0, fatG: 0, sodiumMg: null };
  for (const p of parts) {
    sum.energyKcal += p.energyKcal;
    sum.proteinG += p.proteinG;
    sum.carbohydrateG += p.carbohydrateG;
    sum.fatG += p.fatG;
    if (p.sodiumMg !== null) sum.sodiumMg = (sum.sodiumMg ?? 0) + p.sodiumMg;
  }
  return sum;
}

/** A planned meal's energy and macros. */
export function plannedMealTotals(meal: { foods: readonly FoodAmount[] }): MealPlanTotals {
  return addTotals(meal.foods.map(plannedFoodTotals));
}

/** A day's planned meals, summed. */
export function mealPlanDayTotals(meals: readonly { foods: readonly FoodAmount[] }[]): MealPlanTotals {
  return addTotals(meals.map(plannedMealTotals));
}

/**
 * The planned day against its energy and macro targets, by the shared day verdicts (as a finished
 * day would be judged if eaten as planned). Water, sodium and activity are not a meal plan's.
 */
export function mealPlanVerdicts(
  totals: MealPlanTotals,
  targets: Pick<ResolvedTargets, 'energyKcal' | 'proteinG' | 'carbohydrateG' | 'fatG'>,
  tolerances: Tolerances,
): DriftEntry[] {
  const actuals: DayActuals = {
    energyKcal: totals.energyKcal,
    proteinG: totals.proteinG,
    carbohydrateG: totals.carbohydrateG,
    fatG: totals.fatG,
    fluidMl: null,
    sodiumMg: null,
    steps: null,
    cardioMinutes: null,
  };
  return dayVerdicts({
    targets: {
      energyKcal: targets.energyKcal,
      proteinG: targets.proteinG,
      carbohydrateG: targets.carbohydrateG,
      fatG: targets.fatG,
      waterMl: null,
      sodiumMg: null,
      steps: null,
      cardioMinutes: null,
    },
    tolerances,
    actuals,
    inProgress: false,
  });
}
