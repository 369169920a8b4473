import { describe, expect, it } from 'vitest';
import { macroEnergyPreview, mealItemsPreview } from './energy';

describe('macroEnergyPreview (Atwater: P 4, C 4, F 9, alcohol 7 kcal/g)', () => {
  it('computes energy as the grams are typed', () => {
    expect(macroEnergyPreview({ proteinG: '30', carbohydrateG: '50', fatG: '10' })).toBe(410);
    expect(macroEnergyPreview({ proteinG: '30', carbohydrateG: '50', fatG: '10', alcoholG: '14' })).toBe(508);
    // Empty boxes count as zero while the others are typed; a decimal comma is read.
    expect(macroEnergyPreview({ proteinG: '25,5', carbohydrateG: '', fatG: '' })).toBe(102);
  });

  it('shows nothing until something usable is typed', () => {
    expect(macroEnergyPreview({ proteinG: '', carbohydrateG: '', fatG: '' })).toBeNull();
    expect(macroEnergyPreview({ proteinG: 'lots', carbohydrateG: '10', fatG: '' })).toBeNull();
    expect(macroEnergyPreview({ proteinG: '-5', carbohydrateG: '10', fatG: '' })).toBeNull();
  });
});

describe('mealItemsPreview (the shared nutrients-as-eaten rule)', () => {
  const rice = {
    portions: [{ unit: 'cup', label: 'cup', grams: 158 }],
    per100g: {
      energyKcal: 356,
      listedEnergyKcal: null,
      proteinG: 7.9,
      carbohydrateG: 78.2,
      fatG: 0.5,
      fibreG: 2.8,
      sodiumMg: null,
    },
  };
  // 180 g P, 270 g C, 66.6667 g F → 2400 kcal (REFERENCES.md §1 check 1; Atwater general factors,
  // FAO 2003 FNP 77), as 100 g of a food holding that much per 100 g, eaten as two items.
  const check1 = {
    portions: [{ unit: 'scoop', label: 'scoop', grams: 25 }],
    per100g: {
      energyKcal: 2400,
      listedEnergyKcal: null,
      proteinG: 180,
      carbohydrateG: 270,
      fatG: 200 / 3,
      fibreG: null,
      sodiumMg: 400,
    },
  };

  it('scales the per-100 g values by the grams eaten, or portions × the portion weight', () => {
    const p = mealItemsPreview([{ food: rice, amount: '150', unit: 'g' }]);
    expect(p.items[0]?.energyKcal).toBeCloseTo(534, 10);
    expect(p.items[0]?.proteinG).toBeCloseTo(11.85, 10);
    expect(p.items[0]?.sodiumMg).toBeNull();
    const cup = mealItemsPreview([{ food: rice, amount: '1', unit: 'cup' }]);
    expect(cup.items[0]?.grams).toBe(158);
    expect(cup.items[0]?.energyKcal).toBeCloseTo(356 * 1.58, 10);
  });

  it('adds the items: 50 g + 2 scoops of 25 g = 100 g of check 1 → 2400 kcal', () => {
    const p = mealItemsPreview([
      { food: check1, amount: '50', unit: 'g' },
      { food: check1, amount: '2', unit: 'scoop' },
    ]);
    expect(p.total?.energyKcal).toBeCloseTo(2400, 9);
    expect(p.total?.fatG).toBeCloseTo(66.6667, 4);
    expect(p.total?.sodiumMg).toBeCloseTo(400, 9);
  });

  it('waits for a usable amount and a portion the food has', () => {
    for (const amount of ['', '0', 'a bowl']) {
      expect(mealItemsPreview([{ food: rice, amount, unit: 'g' }])).toEqual({ items: [null], total: null });
    }
    expect(mealItemsPreview([{ food: rice, amount: '1', unit: 'slice' }]).total).toBeNull();
  });
});
