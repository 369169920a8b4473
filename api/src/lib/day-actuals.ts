import type { DayActuals } from './analysis.js';

/** A day's meal sums; sodium null when no meal of the day carries a value. */
export interface MealTotals {
  energyKcal: number;
  proteinG: number;
  carbohydrateG: number;
  fatG: number;
  sodiumMg: number | null;
}

/** Steps and cardio from the evening card. */
export interface EveningFigures {
  steps: number | null;
  cardioMinutes: number | null;
}

/** A drink as the day's figures read it: its volume and the sodium it carried, if known. */
export interface DrinkFigures {
  volumeMl: number;
  sodiumMg: number | null;
}

/** Sodium summed over what carries a figure; unknown stays unknown (null when neither does). */
export function addSodium(a: number | null, b: number | null): number | null {
  return a === null ? b : b === null ? a : a + b;
}

/**
 * What was logged on a day, for drift: null for a metric with no entry at all (no meals, no
 * fluids, no evening card or the field left empty), so it reads as not logged, never as zero eaten.
 * The day's sodium is the meals' and the drinks' (a recovery drink logs its sodium).
 */
export function dayActuals(
  meals: MealTotals | null,
  drinks: readonly DrinkFigures[],
  evening: EveningFigures | null,
): DayActuals {
  const fluidMl = drinks.length > 0 ? drinks.reduce((sum, d) => sum + d.volumeMl, 0) : null;
  const drinkSodium = drinks.reduce<number | null>((sum, d) => addSodium(sum, d.sodiumMg), null);
  return {
    energyKcal: meals?.energyKcal ?? null,
    proteinG: meals?.proteinG ?? null,
    carbohydrateG: meals?.carbohydrateG ?? null,
    fatG: meals?.fatG ?? null,
    fluidMl,
    sodiumMg: addSodium(meals?.sodiumMg ?? null, drinkSodium),
    steps: evening?.steps ?? null,
    cardioMinutes: evening?.cardioMinutes ?? null,
  };
}

/** The meal sums of a list of meals (the day view's entries); null without meals. */
export function mealTotals(
  meals: readonly {
    energyKcal: number;
    proteinG: number;
    carbohydrateG: number;
    fatG: number;
    sodiumMg: number | null;
  }[],
): MealTotals | null {
  if (meals.length === 0) return null;
  let sodium: number | null = null;
  const totals = { energyKcal: 0, proteinG: 0, carbohydrateG: 0, fatG: 0 };
  for (const m of meals) {
    totals.energyKcal += m.energyKcal;
    totals.proteinG += m.proteinG;
    totals.carbohydrateG += m.carbohydrateG;
    totals.fatG += m.fatG;
    if (m.sodiumMg !== null) sodium = (sodium ?? 0) + m.sodiumMg;
  }
  return { ...totals, sodiumMg: sodium };
}
