import { describe, expect, it } from 'vitest';
import { foodPortionPreview, macroEnergyPreview } from './energy';

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

describe('foodPortionPreview', () => {
  const rice = {
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

  it('scales the per-100 g values by the grams eaten', () => {
    const p = foodPortionPreview(rice, '150');
    expect(p?.energyKcal).toBeCloseTo(534, 10);
    expect(p?.proteinG).toBeCloseTo(11.85, 10);
    expect(p?.carbohydrateG).toBeCloseTo(117.3, 10);
    expect(p?.fatG).toBeCloseTo(0.75, 10);
    expect(p?.sodiumMg).toBeNull();
    expect(foodPortionPreview({ per100g: { ...rice.per100g, sodiumMg: 400 } }, '150')?.sodiumMg).toBeCloseTo(
      600,
      10,
    );
  });

  it('waits for a usable quantity', () => {
    expect(foodPortionPreview(rice, '')).toBeNull();
    expect(foodPortionPreview(rice, '0')).toBeNull();
    expect(foodPortionPreview(rice, 'a bowl')).toBeNull();
  });
});
