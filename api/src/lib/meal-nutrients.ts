import { atwaterKcal } from '@driftmark/shared';
import { addSodium } from './day-actuals.js';

/** What a meal entry stores: grams as eaten and the energy they carry. */
export interface MealNutrients {
  proteinG: number;
  carbohydrateG: number;
  fatG: number;
  fibreG: number | null;
  alcoholG: number | null;
  energyKcal: number;
  /** mg; null when unknown (not typed, or the food lists none). */
  sodiumMg: number | null;
}

/** A food's nutrients per 100 g (energy already decided by the food's source). */
export interface Per100g {
  energyKcal: number;
  proteinG: number;
  carbohydrateG: number;
  fatG: number;
  fibreG: number | null;
  alcoholG?: number | null;
  /** mg per 100 g; null or absent when the food lists none. */
  sodiumMg?: number | null;
}

/** A meal typed as grams: energy from the Atwater general factors (fibre carries none). */
export function macroMealNutrients(m: {
  proteinG: number;
  carbohydrateG: number;
  fatG: number;
  fibreG?: number | null;
  alcoholG?: number | null;
  sodiumMg?: number | null;
}): MealNutrients {
  return {
    proteinG: m.proteinG,
    carbohydrateG: m.carbohydrateG,
    fatG: m.fatG,
    fibreG: m.fibreG ?? null,
    alcoholG: m.alcoholG ?? null,
    energyKcal: atwaterKcal(m),
    sodiumMg: m.sodiumMg ?? null,
  };
}

/** A food eaten by weight: every per-100 g value × quantity / 100, energy included. */
export function foodMealNutrients(per100g: Per100g, quantityG: number): MealNutrients {
  const f = quantityG / 100;
  const scale = (v: number | null | undefined) => (v === null || v === undefined ? null : v * f);
  return {
    proteinG: per100g.proteinG * f,
    carbohydrateG: per100g.carbohydrateG * f,
    fatG: per100g.fatG * f,
    fibreG: scale(per100g.fibreG),
    alcoholG: scale(per100g.alcoholG),
    energyKcal: per100g.energyKcal * f,
    sodiumMg: scale(per100g.sodiumMg),
  };
}

/** Sums of a day's meals (null fibre, alcohol or sodium counts as none). */
export function sumNutrients(
  meals: readonly MealNutrients[],
  drinks: readonly { sodiumMg: number | null }[] = [],
) {
  const total = {
    energyKcal: 0,
    proteinG: 0,
    carbohydrateG: 0,
    fatG: 0,
    fibreG: 0,
    alcoholG: 0,
    sodiumMg: null as number | null,
  };
  for (const m of meals) {
    total.energyKcal += m.energyKcal;
    total.proteinG += m.proteinG;
    total.carbohydrateG += m.carbohydrateG;
    total.fatG += m.fatG;
    total.fibreG += m.fibreG ?? 0;
    total.alcoholG += m.alcoholG ?? 0;
    // Unknown stays unknown: a total only from meals that carry a figure, null when none does.
    total.sodiumMg = addSodium(total.sodiumMg, m.sodiumMg);
  }
  // Drinks that carry sodium (a recovery drink) count toward the day's, as in dayActuals.
  for (const d of drinks) total.sodiumMg = addSodium(total.sodiumMg, d.sodiumMg);
  return total;
}
