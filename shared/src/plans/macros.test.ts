import { describe, expect, it } from 'vitest';
import { atwaterKcal } from '../nutrition.js';
import { gramsFromShare, shareFromGrams } from './macros.js';

// Atwater general factors 4/4/9 kcal/g: FAO 2003 FNP 77; Merrill & Watt 1955 (rev. 1973), USDA
// Handbook 74 — secondary source (REFERENCES §1, basis S). Check values: REFERENCES §1 Check 1 and 2.
describe('gramsFromShare', () => {
  it('2400 kcal split 30/45/25 → 180 g protein, 270 g carbohydrate, 66.6667 g fat (Check 1)', () => {
    // FAO 2003 FNP 77; Merrill & Watt 1955
    expect(gramsFromShare(2400, 30, 'protein')).toBeCloseTo(180, 6);
    expect(gramsFromShare(2400, 45, 'carbohydrate')).toBeCloseTo(270, 6);
    expect(gramsFromShare(2400, 25, 'fat')).toBeCloseTo(66.6667, 4);
  });

  it('the grams of Check 1 give back 2400 kcal', () => {
    // FAO 2003 FNP 77; Merrill & Watt 1955
    const kcal = atwaterKcal({
      proteinG: gramsFromShare(2400, 30, 'protein'),
      carbohydrateG: gramsFromShare(2400, 45, 'carbohydrate'),
      fatG: gramsFromShare(2400, 25, 'fat'),
    });
    expect(kcal).toBeCloseTo(2400, 6);
  });
});

describe('shareFromGrams', () => {
  it('150 P / 250 C / 70 F (+10 g alcohol) of 2300 kcal → 26.0870 / 43.4783 / 27.3913 % (Check 2)', () => {
    // FAO 2003 FNP 77; Merrill & Watt 1955. The 10 g alcohol (3.0435 %) is part of the 2300 kcal.
    const kcal = atwaterKcal({ proteinG: 150, carbohydrateG: 250, fatG: 70, alcoholG: 10 });
    expect(kcal).toBe(2300);
    expect(shareFromGrams(150, 'protein', kcal)).toBeCloseTo(26.087, 4);
    expect(shareFromGrams(250, 'carbohydrate', kcal)).toBeCloseTo(43.4783, 4);
    expect(shareFromGrams(70, 'fat', kcal)).toBeCloseTo(27.3913, 4);
  });

  it('is the inverse of gramsFromShare (Check 1 back to 30/45/25)', () => {
    // FAO 2003 FNP 77; Merrill & Watt 1955
    expect(shareFromGrams(180, 'protein', 2400)).toBeCloseTo(30, 6);
    expect(shareFromGrams(270, 'carbohydrate', 2400)).toBeCloseTo(45, 6);
    expect(shareFromGrams(200 / 3, 'fat', 2400)).toBeCloseTo(25, 6);
  });

  it('a zero energy gives a zero share, not a division by zero', () => {
    expect(shareFromGrams(50, 'protein', 0)).toBe(0);
  });
});
