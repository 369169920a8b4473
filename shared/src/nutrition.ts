/**
 * Atwater general factors, kcal per gram: protein 4, carbohydrate 4, fat 9, alcohol 7.
 * FAO (2003) Food and Nutrition Paper 77; Merrill & Watt (1955, rev. 1973) USDA Handbook 74.
 * Fibre is not counted: carbohydrate here means available carbohydrate.
 */
export const ATWATER_KCAL_PER_G = { protein: 4, carbohydrate: 4, fat: 9, alcohol: 7 } as const;
/** 1 kcal = 4.184 kJ (USDA Handbook 74 preface; IUNS). */
export const KJ_PER_KCAL = 4.184;

export interface Macros {
  proteinG: number;
  carbohydrateG: number;
  fatG: number;
  alcoholG?: number | null;
}

/** Energy in kcal from grams with the Atwater general factors. */
export function atwaterKcal(m: Macros): number {
  return (
    ATWATER_KCAL_PER_G.protein * m.proteinG +
    ATWATER_KCAL_PER_G.carbohydrate * m.carbohydrateG +
    ATWATER_KCAL_PER_G.fat * m.fatG +
    ATWATER_KCAL_PER_G.alcohol * (m.alcoholG ?? 0)
  );
}

export const kcalToKj = (kcal: number): number => kcal * KJ_PER_KCAL;
export const kjToKcal = (kj: number): number => kj / KJ_PER_KCAL;
