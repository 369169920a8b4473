import { atwaterKcal, labelEnergyCheck, type FoodView, type LabelCheckView } from '@driftmark/shared';
import type { EverydayFood } from '../adapters/everyday-foods.js';
import type { ReferenceFood } from '../adapters/reference-foods.js';
import type { Food } from '../entities/food.entity.js';

const NO_USES = { mine: 0, team: 0 };

/** A team or personal food's energy per 100 g, from its macros with the Atwater general factors. */
export function teamFoodEnergyKcal(
  f: Pick<Food, 'proteinG' | 'carbohydrateG' | 'fatG' | 'alcoholG'>,
): number {
  return atwaterKcal(f);
}

/** The label's printed energy against its macros (shared/src/food-label.ts), per 100 g. */
export function labelCheckOf(f: Food): LabelCheckView | null {
  if (f.labelEnergyKcal === null) return null;
  const check = labelEnergyCheck({ ...f, energyKcal: f.labelEnergyKcal });
  const printed = Math.round(check.printedKcal);
  const computed = Math.round(check.atwaterKcal);
  let warning: string | null = null;
  if (check.warn) {
    warning =
      check.differencePct === null
        ? `The label prints ${printed} kcal per 100 g, but its protein, carbohydrate and fat give none: check the figures you copied.`
        : `The label prints ${printed} kcal per 100 g, ${Math.abs(Math.round(check.differencePct))} % ${
            check.differencePct > 0 ? 'more' : 'less'
          } than the ${computed} kcal its macros give (4 kcal/g protein and carbohydrate, 9 fat, 7 alcohol, 2 fibre): check the figures you copied.`;
  }
  return {
    printedKcal: check.printedKcal,
    atwaterKcal: check.atwaterKcal,
    differencePct: check.differencePct,
    warning,
  };
}

export function presentTeamFood(f: Food): FoodView {
  return {
    id: f.id,
    name: f.name,
    source: f.athleteId ? 'personal' : 'team',
    barcode: f.barcode,
    preparation: preparationOf(f.name),
    portions: [],
    uses: NO_USES,
    per100g: {
      energyKcal: teamFoodEnergyKcal(f),
      // The printed energy stays in view where the label disagrees with its own macros.
      listedEnergyKcal: labelCheckOf(f)?.warning ? f.labelEnergyKcal : null,
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
    barcode: null,
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
    barcode: null,
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
