import { describe, expect, it } from 'vitest';
import { itemGrams, nutrientsAsEaten, per100gFromEaten, sumNutrients } from './meal-items.js';
import { atwaterKcal } from './nutrition.js';

// REFERENCES.md §1 check 2: 150 g P + 250 g C + 70 g F + 10 g alcohol → 2300 kcal (Atwater general
// factors; FAO 2003 FNP 77; Merrill & Watt, USDA Handbook 74). A food holding a fifth of that per
// 100 g, eaten as 500 g, must give the same figures.
const fifth = { proteinG: 30, carbohydrateG: 50, fatG: 14, alcoholG: 2, fibreG: null, sodiumMg: 80 };
const per100g = { ...fifth, energyKcal: atwaterKcal(fifth) };

describe('nutrients as eaten', () => {
  it('scales every per-100 g value by grams / 100: 500 g of the food is check 2 (2300 kcal)', () => {
    const eaten = nutrientsAsEaten(per100g, 500);
    expect(eaten).toEqual({
      proteinG: 150,
      carbohydrateG: 250,
      fatG: 70,
      fibreG: null,
      alcoholG: 10,
      energyKcal: 2300,
      sodiumMg: 400,
    });
  });

  it('adds items: 200 g + 3 portions of 100 g make the same meal', () => {
    const portions = [{ unit: 'scoop', label: 'scoop', grams: 100 }];
    const grams = [
      itemGrams({ quantityG: 200 }, portions),
      itemGrams({ portions: 3, portionUnit: 'scoop' }, portions),
    ];
    expect(grams).toEqual([200, 300]);
    const total = sumNutrients(grams.map((g) => nutrientsAsEaten(per100g, g!)));
    expect(total.energyKcal).toBeCloseTo(2300, 9);
    expect(total.sodiumMg).toBeCloseTo(400, 9);
  });

  it('has no grams for a portion the food does not carry, or an item with neither', () => {
    expect(itemGrams({ portions: 1, portionUnit: 'slice' }, [])).toBeNull();
    expect(itemGrams({}, [])).toBeNull();
  });

  it('works back to per 100 g from what was eaten (an edit reuses the stored figures)', () => {
    const back = per100gFromEaten(nutrientsAsEaten(per100g, 37), 37);
    expect(back.energyKcal).toBeCloseTo(per100g.energyKcal, 9);
    expect(back.proteinG).toBeCloseTo(30, 9);
    expect(back.fibreG).toBeNull();
  });
});
