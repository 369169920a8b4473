import {
  atwaterKcal,
  labelEnergyCheck,
  type FoodView,
  type LabelCheckView,
  type Per100g,
} from '@driftmark/shared';
import type { EverydayFood } from '../adapters/everyday-foods.js';
import type { ReferenceFood } from '../adapters/reference-foods.js';
import type { Food } from '../entities/food.entity.js';

const NO_USES = { mine: 0, team: 0 };

/**
 * A team or personal food's figures per 100 g, energy from its macros with the Atwater general
 * factors (what a meal item eats and what search shows).
 */
export function teamFoodPer100g(f: Food): Per100g {
  return {
    energyKcal: atwaterKcal(f),
    proteinG: f.proteinG,
    carbohydrateG: f.carbohydrateG,
    fatG: f.fatG,
    fibreG: f.fibreG,
    alcoholG: f.alcoholG,
    sodiumMg: f.sodiumMg,
  };
}

/** Figures per 100 g as a food view shows them, with the source's own energy when worth showing. */
function per100gView(p: Per100g, listedEnergyKcal: number | null): FoodView['per100g'] {
  return {
    energyKcal: p.energyKcal,
    listedEnergyKcal,
    proteinG: p.proteinG,
    carbohydrateG: p.carbohydrateG,
    fatG: p.fatG,
    fibreG: p.fibreG,
    sodiumMg: p.sodiumMg ?? null,
  };
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
    // The printed energy stays in view where the label disagrees with its own macros.
    per100g: per100gView(teamFoodPer100g(f), labelCheckOf(f)?.warning ? f.labelEnergyKcal : null),
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
    per100g: per100gView(f.per100g, f.listedEnergyKcal),
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
    per100g: per100gView(f.per100g, null),
  };
}
