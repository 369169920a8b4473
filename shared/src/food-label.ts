/**
 * A nutrition label read into a food stored per 100 g, and the check of its printed energy against
 * the energy its own macros give. Zod-free; the server applies it and the web shows its answer.
 */
import { atwaterKcal } from './nutrition.js';

/**
 * Dietary fibre, kcal per gram, counted on a label's energy when the label gives fibre: FAO (2003)
 * Food and Nutrition Paper 77 (8 kJ, 2 kcal per g; from memory, the factor table was not read); the
 * same factor as EU Regulation 1169/2011 Annex XIV (from memory).
 */
export const FIBRE_KCAL_PER_G = 2;

/**
 * Printed energy more than this share away from the macros' Atwater energy answers a warning to
 * check the label (common practice, no source: labels round each figure, and the general factors
 * differ from the specific ones by a few per cent, see REFERENCES §10).
 */
export const LABEL_ENERGY_TOLERANCE_PCT = 10;

/**
 * A difference of at most this many kcal is rounding, never a warning: a zero-energy drink prints
 * 0 or 1 kcal whatever its traces give (common practice, no source).
 */
export const LABEL_ENERGY_FLOOR_KCAL = 4;

/** Without a density, a millilitre weighs a gram (as the brief for label foods says: water). */
export const DEFAULT_DENSITY_G_PER_ML = 1;

export interface LabelNutrients {
  /** Energy as printed, kcal. */
  energyKcal: number;
  proteinG: number;
  carbohydrateG: number;
  fatG: number;
  fibreG?: number | null;
  alcoholG?: number | null;
  sodiumMg?: number | null;
}

/** Grams in one serving: grams as printed, or millilitres × density (g/mL, default 1). */
export function servingGrams(size: number, unit: 'g' | 'ml', densityGPerMl?: number | null): number {
  return unit === 'g' ? size : size * (densityGPerMl ?? DEFAULT_DENSITY_G_PER_ML);
}

/** The label's figures per 100 g: per-serving figures × 100 / serving grams; null = already per 100 g. */
export function labelPer100g(n: LabelNutrients, servingG: number | null): Required<LabelNutrients> {
  const f = servingG === null ? 1 : 100 / servingG;
  const scale = (v: number | null | undefined) => (v === null || v === undefined ? null : v * f);
  return {
    energyKcal: n.energyKcal * f,
    proteinG: n.proteinG * f,
    carbohydrateG: n.carbohydrateG * f,
    fatG: n.fatG * f,
    fibreG: scale(n.fibreG),
    alcoholG: scale(n.alcoholG),
    sodiumMg: scale(n.sodiumMg),
  } as Required<LabelNutrients>;
}

/** Energy from a label's macros: Atwater general factors, plus fibre at 2 kcal/g when given. */
export function labelAtwaterKcal(n: Omit<LabelNutrients, 'energyKcal'>): number {
  return atwaterKcal(n) + FIBRE_KCAL_PER_G * (n.fibreG ?? 0);
}

export interface LabelEnergyCheck {
  /** Energy as printed, kcal (per the label's own basis). */
  printedKcal: number;
  /** 4/4/9 (+ alcohol 7, fibre 2) on the label's macros, kcal. */
  atwaterKcal: number;
  /** (printed − Atwater) / Atwater × 100; null when the macros give no energy. */
  differencePct: number | null;
  /** Beyond LABEL_ENERGY_TOLERANCE_PCT (and above the rounding floor): check the label. */
  warn: boolean;
}

/** The printed energy against the macros' Atwater energy (FAO 2003 FNP 77 general factors). */
export function labelEnergyCheck(n: LabelNutrients): LabelEnergyCheck {
  const computed = labelAtwaterKcal(n);
  const diff = n.energyKcal - computed;
  const differencePct = computed > 0 ? (100 * diff) / computed : null;
  const rounding = Math.abs(diff) <= LABEL_ENERGY_FLOOR_KCAL;
  const warn = !rounding && (differencePct === null || Math.abs(differencePct) > LABEL_ENERGY_TOLERANCE_PCT);
  return { printedKcal: n.energyKcal, atwaterKcal: computed, differencePct, warn };
}
