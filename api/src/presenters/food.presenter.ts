import { atwaterKcal, type FoodView } from '@driftmark/shared';
import type { EverydayFood } from '../adapters/everyday-foods.js';
import type { ReferenceFood } from '../adapters/reference-foods.js';
import type { Food } from '../entities/food.entity.js';

const NO_USES = { mine: 0, team: 0 };

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
    preparation: preparationOf(f.name),
    portions: [],
    uses: NO_USES,
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
    preparation: preparationOf(f.name),
    portions: [],
    uses: NO_USES,
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

/** Raw or cooked as a food's name says it ("Egg, poultry, whole, boiled"); null when it says neither. */
export function preparationOf(name: string): 'raw' | 'cooked' | null {
  const words = name.toLowerCase().split(/[^a-z]+/);
  if (words.includes('raw') || words.includes('uncooked') || words.includes('dry')) return 'raw';
  const cooked = ['cooked', 'boiled', 'roasted', 'baked', 'fried', 'grilled', 'steamed', 'omlet', 'omelette'];
  return words.some((w) => cooked.includes(w)) ? 'cooked' : null;
}

export function presentEverydayFood(f: EverydayFood): FoodView {
  return {
    id: f.id,
    name: f.name,
    source: 'everyday',
    preparation: f.preparation,
    portions: [...f.portions],
    uses: NO_USES,
    per100g: {
      energyKcal: f.per100g.energyKcal,
      listedEnergyKcal: null,
      proteinG: f.per100g.proteinG,
      carbohydrateG: f.per100g.carbohydrateG,
      fatG: f.per100g.fatG,
      fibreG: f.per100g.fibreG,
      sodiumMg: f.per100g.sodiumMg,
    },
  };
}
