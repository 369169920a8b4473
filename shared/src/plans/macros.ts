import { ATWATER_KCAL_PER_G } from '../nutrition.js';

export type MacroName = 'protein' | 'carbohydrate' | 'fat';

/**
 * Grams of a macro that supply `pct` % of `energyKcal`: g = E·pct/100/f (Atwater factor f).
 * FAO 2003 FNP 77; Merrill & Watt 1955/1973.
 */
export function gramsFromShare(energyKcal: number, pct: number, macro: MacroName): number {
  void energyKcal;
  void pct;
  void macro;
  void ATWATER_KCAL_PER_G;
  throw new Error('not implemented');
}

/** Share of `energyKcal` (%) that `grams` of a macro supply: 100·g·f/E. */
export function shareFromGrams(grams: number, macro: MacroName, energyKcal: number): number {
  void grams;
  void macro;
  void energyKcal;
  throw new Error('not implemented');
}
