import { parseTypedNumber } from '@driftmark/shared';
import {
  atwaterKcal,
  itemGrams,
  nutrientsAsEaten,
  sumNutrients,
  type FoodView,
  type MealNutrients,
} from '@driftmark/shared';

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

/** A food of the meal form as typed: the food (per 100 g, its portions), the amount and its unit. */
export interface TypedItem {
  food: Pick<FoodView, 'per100g' | 'portions'>;
  amount: string;
  /** 'g' or one of the food's portion units. */
  unit: string;
}

/**
 * Live figures of a meal of foods as the athlete types it, by the shared rule the server stores
 * (`itemGrams`, `nutrientsAsEaten`, `sumNutrients` in shared/src/meal-items.ts): each item's
 * figures (null while its amount is not a usable number) and the meal's total (null until at
 * least one item has one).
 */
export function mealItemsPreview(items: readonly TypedItem[]): {
  items: Array<(MealNutrients & { grams: number }) | null>;
  total: MealNutrients | null;
} {
  const each = items.map(({ food, amount, unit }) => {
    const n = readGrams(amount);
    if (n === null || n === undefined || n === 0) return null;
    const grams = itemGrams(
      unit === 'g' ? { quantityG: n } : { portions: n, portionUnit: unit },
      food.portions,
    );
    if (grams === null) return null;
    const per100g = { ...food.per100g, alcoholG: null };
    return { ...nutrientsAsEaten(per100g, grams), grams };
  });
  const known = each.filter((x): x is MealNutrients & { grams: number } => x !== null);
  return { items: each, total: known.length > 0 ? sumNutrients(known) : null };
}
