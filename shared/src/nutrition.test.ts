import { describe, expect, it } from 'vitest';
import { atwaterKcal, kcalToKj, kjToKcal } from './nutrition.js';

// Check values: REFERENCES.md section 1 (Atwater general factors; FAO 2003 FNP 77 — secondary source).
describe('Atwater energy', () => {
  it('150 g protein + 250 g carbohydrate + 70 g fat + 10 g alcohol = 2300 kcal', () => {
    expect(atwaterKcal({ proteinG: 150, carbohydrateG: 250, fatG: 70, alcoholG: 10 })).toBe(2300);
  });

  it('2300 kcal = 9623.2 kJ and 1000 kJ = 239.0057 kcal (1 kcal = 4.184 kJ, Handbook 74)', () => {
    expect(kcalToKj(2300)).toBeCloseTo(9623.2, 6);
    expect(kjToKcal(1000)).toBeCloseTo(239.0057, 4);
  });
});
