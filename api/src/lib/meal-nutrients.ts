import { atwaterKcal, type MealNutrients } from '@driftmark/shared';

export type { MealNutrients, Per100g } from '@driftmark/shared';

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
