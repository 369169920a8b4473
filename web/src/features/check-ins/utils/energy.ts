import { parseTypedNumber } from '@driftmark/shared';
import { atwaterKcal, type FoodView } from '@driftmark/shared';

export interface MacroTexts {
  proteinG: string;
  carbohydrateG: string;
  fatG: string;
  alcoholG?: string;
}

function readGrams(text: string | undefined): number | null | undefined {
  const n = parseTypedNumber(text);
  if (n === undefined) return undefined;
  if (!Number.isFinite(n) || n < 0) return null;
  return n;
}

/**
 * Live energy of a meal typed as grams (Atwater general factors, the same function the server
 * uses). Empty boxes count as 0 g; null while nothing is typed or a box is not a usable number.
 */
export function macroEnergyPreview(m: MacroTexts): number | null {
  const values = [m.proteinG, m.carbohydrateG, m.fatG, m.alcoholG ?? ''].map(readGrams);
  if (values.some((v) => v === null)) return null;
  if (values.every((v) => v === undefined)) return null;
  const [proteinG = 0, carbohydrateG = 0, fatG = 0, alcoholG = 0] = values as Array<number | undefined>;
  return atwaterKcal({ proteinG, carbohydrateG, fatG, alcoholG });
}

export interface FoodPortion {
  energyKcal: number;
  proteinG: number;
  carbohydrateG: number;
  fatG: number;
  /** Null when the food list has no sodium figure for the food. */
  sodiumMg: number | null;
}

/**
 * Live energy and macros of a quantity of a food from the list: its per-100 g values × grams / 100
 * (the energy the server gives the food — Atwater from its macros — as it stores it). Null until a
 * usable quantity is typed.
 */
export function foodPortionPreview(
  food: Pick<FoodView, 'per100g'>,
  quantityText: string,
): FoodPortion | null {
  const q = readGrams(quantityText);
  if (q === null || q === undefined || q === 0) return null;
  const f = q / 100;
  return {
    energyKcal: food.per100g.energyKcal * f,
    proteinG: food.per100g.proteinG * f,
    carbohydrateG: food.per100g.carbohydrateG * f,
    fatG: food.per100g.fatG * f,
    sodiumMg: food.per100g.sodiumMg === null ? null : food.per100g.sodiumMg * f,
  };
}
