import { atwaterKcal, type FoodView } from '@driftmark/shared';
import type { ReferenceFood } from '../adapters/reference-foods.js';
import type { Food } from '../entities/food.entity.js';

/** A team food's energy per 100 g, from its macros with the Atwater general factors. */
export function teamFoodEnergyKcal(
  f: Pick<Food, 'proteinG' | 'carbohydrateG' | 'fatG' | 'alcoholG'>,
): number {
  return atwaterKcal(f);
}

export function presentTeamFood(f: Food): FoodView {
  return {
    id: f.id,
    name: f.name,
    source: 'team',
    per100g: {
      energyKcal: teamFoodEnergyKcal(f),
      listedEnergyKcal: null,
      proteinG: f.proteinG,
      carbohydrateG: f.carbohydrateG,
      fatG: f.fatG,
      fibreG: f.fibreG,
      sodiumMg: f.sodiumMg,
    },
  };
}

export function presentReferenceFood(f: ReferenceFood): FoodView {
  return {
    id: f.id,
    name: f.name,
    source: 'reference',
    per100g: {
      energyKcal: f.per100g.energyKcal,
      listedEnergyKcal: f.listedEnergyKcal,
      proteinG: f.per100g.proteinG,
      carbohydrateG: f.per100g.carbohydrateG,
      fatG: f.per100g.fatG,
      fibreG: f.per100g.fibreG,
      sodiumMg: f.per100g.sodiumMg,
    },
  };
}
