/**
 * Nutrients as eaten: the one rule for a food eaten by weight or by portion, and for a meal's
 * totals. The server stores what it gives; the meal form shows the same figures live.
 * Zod-free, so the web's lazily loaded meal form can use it without the schemas.
 */

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

/** Grams as eaten and the energy they carry. */
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

/** A food's household measure: "1 slice" weighs `grams`. */
export interface FoodPortion {
  /** Stable key sent back with the item ("slice", "scoop", "cup", "large"). */
  unit: string;
  /** Shown in the form ("slice", "scoop (30 g)", "large egg"). */
  label: string;
  /** Edible grams in one portion. */
  grams: number;
}

/**
 * The grams an item stands for: typed grams, or portions × the portion's weight. Null when the
 * item names neither, or a portion the food does not carry.
 */
export function itemGrams(
  item: { quantityG?: number | null; portions?: number | null; portionUnit?: string | null },
  portions: readonly FoodPortion[],
): number | null {
  if (typeof item.quantityG === 'number') return item.quantityG;
  if (typeof item.portions !== 'number' || !item.portionUnit) return null;
  const portion = portions.find((p) => p.unit === item.portionUnit);
  return portion ? item.portions * portion.grams : null;
}

/** A food eaten by weight: every per-100 g value × grams / 100, energy included. */
export function nutrientsAsEaten(per100g: Per100g, grams: number): MealNutrients {
  const f = grams / 100;
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

/**
 * What was eaten back to per 100 g (an edit that keeps a food reuses the figures the meal stored,
 * so a later change to a team food never rewrites an old meal).
 */
export function per100gFromEaten(eaten: MealNutrients, grams: number): Per100g {
  return nutrientsAsEaten(eaten, 10000 / grams);
}

/**
 * Sums of meals or of a meal's items. Fibre and alcohol count a missing figure as none; sodium
 * stays unknown (null) only when no part carries a figure. A day's sums pass its drinks too: a
 * drink that carries sodium (a recovery drink) counts toward the day's.
 */
export function sumNutrients(
  parts: readonly MealNutrients[],
  drinks: readonly { sodiumMg: number | null }[] = [],
): MealNutrients & { fibreG: number; alcoholG: number } {
  const total = {
    energyKcal: 0,
    proteinG: 0,
    carbohydrateG: 0,
    fatG: 0,
    fibreG: 0,
    alcoholG: 0,
    sodiumMg: null as number | null,
  };
  for (const m of parts) {
    total.energyKcal += m.energyKcal;
    total.proteinG += m.proteinG;
    total.carbohydrateG += m.carbohydrateG;
    total.fatG += m.fatG;
    total.fibreG += m.fibreG ?? 0;
    total.alcoholG += m.alcoholG ?? 0;
    if (m.sodiumMg !== null) total.sodiumMg = (total.sodiumMg ?? 0) + m.sodiumMg;
  }
  for (const d of drinks) if (d.sodiumMg !== null) total.sodiumMg = (total.sodiumMg ?? 0) + d.sodiumMg;
  return total;
}
