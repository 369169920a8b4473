import { DEFAULT_TOLERANCES } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { fitAnswer, fitQuantities, type FitFood } from './meal-plan-fit.js';

// Invented foods with round figures so every case below is worked out by hand. Energy per 100 g
// is Atwater's general factors (4/4/9 kcal per g; FAO 2003, Food and Nutrition Paper 77).
const PROTEIN_POWDER = { energyKcal: 320, proteinG: 80, carbohydrateG: 0, fatG: 0, sodiumMg: null };
const RICE_FLOUR = { energyKcal: 320, proteinG: 0, carbohydrateG: 80, fatG: 0, sodiumMg: null };
const OIL = { energyKcal: 900, proteinG: 0, carbohydrateG: 0, fatG: 100, sodiumMg: null };

const food = (mealId: string, foodId: string, per100g: FitFood['per100g'], extra: Partial<FitFood> = {}) => ({
  mealId,
  foodId,
  per100g,
  ...extra,
});
const M1 = '00000000-0000-4000-8000-000000000001';
const M2 = '00000000-0000-4000-8000-000000000002';

describe('fitQuantities (HiGHS)', () => {
  it('finds the exact fit worked out by hand', async () => {
    // Protein 80 g → 100 g of powder (80 g/100 g); carbohydrate 160 g → 200 g of flour; fat 20 g
    // → 20 g of oil. Energy: 100 g × 3.2 + 200 g × 3.2 + 20 g × 9 = 320 + 640 + 180 = 1,140 kcal.
    // Every quantity is a multiple of the 5 g step, so the fit is exact.
    const foods = [
      food(M1, 'ifct:A001', PROTEIN_POWDER),
      food(M1, 'ifct:A002', RICE_FLOUR),
      food(M2, 'ifct:A003', OIL),
    ];
    const fit = await fitQuantities(
      foods,
      { energyKcal: 1140, proteinG: 80, carbohydrateG: 160, fatG: 20 },
      DEFAULT_TOLERANCES,
    );
    expect(fit.grams).toEqual([100, 200, 20]);
    expect(fit.fits).toBe(true);
    expect(fit.unmet).toEqual([]);
    expect(fit.verdicts.map((v) => [v.metric, v.diff, v.state])).toEqual([
      ['energy', 0, 'on_plan'],
      ['protein', 0, 'on_plan'],
      ['carbohydrate', 0, 'on_plan'],
      ['fat', 0, 'on_plan'],
    ]);
    const answer = fitAnswer(foods, fit);
    expect(answer.meals).toEqual([
      {
        id: M1,
        foods: [
          { foodId: 'ifct:A001', quantityG: 100 },
          { foodId: 'ifct:A002', quantityG: 200 },
        ],
      },
      { id: M2, foods: [{ foodId: 'ifct:A003', quantityG: 20 }] },
    ]);
    expect(answer.totals.energyKcal).toBeCloseTo(1140, 9);
  });

  it('keeps to whole units: eggs of 50 g in steps of one egg', async () => {
    // An invented egg at 13 g protein / 100 g: 3 eggs (150 g) carry 19.5 g, 2 eggs 13 g, 4 eggs
    // 26 g. Against 20 g protein ± 10 g every count from 1 to 4 is within, and 3 is the closest.
    const egg = { energyKcal: 143, proteinG: 13, carbohydrateG: 1, fatG: 10, sodiumMg: 140 };
    const fit = await fitQuantities(
      [food(M1, 'ifct:A004', egg, { stepG: 50, maxG: 300 })],
      { energyKcal: null, proteinG: 20, carbohydrateG: null, fatG: null },
      DEFAULT_TOLERANCES,
    );
    expect(fit.grams).toEqual([150]);
    expect(fit.fits).toBe(true);
  });

  it('says which target cannot be met, and by how much, when no fit exists', async () => {
    // Flour alone, 0–400 g: protein stays 0 g against 150 g, 150 g short, 140 g beyond the ±10 g
    // tolerance, whatever the quantity. Energy 1,280 kcal is met by the full 400 g (400 × 3.2).
    const fit = await fitQuantities(
      [food(M1, 'ifct:A002', RICE_FLOUR)],
      { energyKcal: 1280, proteinG: 150, carbohydrateG: null, fatG: null },
      DEFAULT_TOLERANCES,
    );
    expect(fit.grams).toEqual([400]);
    expect(fit.fits).toBe(false);
    expect(fit.verdicts.map((v) => [v.metric, v.diff, v.state])).toEqual([
      ['energy', 0, 'on_plan'],
      ['protein', -150, 'off_plan'],
    ]);
    expect(fit.unmet).toEqual([
      'Protein cannot be met with these foods and bounds: at best 150 g short of 150 g, 140 g beyond the tolerance of ±10 g',
    ]);
  });

  it('stops at a food’s upper bound and reports the energy left short', async () => {
    // Oil capped at 50 g: 450 kcal against 2,000 kcal ± 5 % (± 100 kcal): 1,550 kcal short,
    // 1,450 kcal beyond the tolerance.
    const fit = await fitQuantities(
      [food(M1, 'ifct:A003', OIL, { maxG: 50 })],
      { energyKcal: 2000, proteinG: null, carbohydrateG: null, fatG: null },
      DEFAULT_TOLERANCES,
    );
    expect(fit.grams).toEqual([50]);
    expect(fit.unmet).toEqual([
      'Energy cannot be met with these foods and bounds: at best 1550 kcal short of 2000 kcal, 1450 kcal beyond the tolerance of ±100 kcal',
    ]);
  });
});
