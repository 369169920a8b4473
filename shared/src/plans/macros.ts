import { ATWATER_KCAL_PER_G } from '../nutrition.js';

export type MacroName = 'protein' | 'carbohydrate' | 'fat';

/**
 * Grams of a macro that supply `pct` % of `energyKcal`: g = E·pct/100/f (Atwater factor f).
 * FAO 2003 FNP 77; Merrill & Watt 1955/1973.
 */
export function gramsFromShare(energyKcal: number, pct: number, macro: MacroName): number {
  return (energyKcal * pct) / 100 / ATWATER_KCAL_PER_G[macro];
}

/** Share of `energyKcal` (%) that `grams` of a macro supply: 100·g·f/E. */
export function shareFromGrams(grams: number, macro: MacroName, energyKcal: number): number {
  if (energyKcal <= 0) return 0;
  return (100 * grams * ATWATER_KCAL_PER_G[macro]) / energyKcal;
}
