import { describe, expect, it } from 'vitest';
import {
  LABEL_ENERGY_TOLERANCE_PCT,
  labelAtwaterKcal,
  labelEnergyCheck,
  labelPer100g,
  servingGrams,
} from './food-label.js';

describe('label energy (Atwater general factors)', () => {
  // REFERENCES §1 Check 2: 150 g P + 250 g C + 70 g F + 10 g alcohol → 2300 kcal (FAO 2003 FNP 77).
  it('gives 2300 kcal for the reference sheet check 2', () => {
    expect(labelAtwaterKcal({ proteinG: 150, carbohydrateG: 250, fatG: 70, alcoholG: 10 })).toBe(2300);
  });

  // Fibre at 2 kcal/g (FAO 2003 FNP 77, from memory): 10 g fibre adds 20 kcal.
  it('counts fibre at 2 kcal/g when the label gives it', () => {
    expect(labelAtwaterKcal({ proteinG: 150, carbohydrateG: 250, fatG: 70, alcoholG: 10, fibreG: 10 })).toBe(
      2320,
    );
  });

  // 25 g protein → 100 kcal; the warning starts beyond 10 % (common practice, no source).
  it('warns only beyond the tolerance, either way', () => {
    const at = (energyKcal: number) =>
      labelEnergyCheck({ energyKcal, proteinG: 25, carbohydrateG: 0, fatG: 0 });
    expect(LABEL_ENERGY_TOLERANCE_PCT).toBe(10);
    expect(at(110)).toMatchObject({ atwaterKcal: 100, differencePct: 10, warn: false });
    expect(at(90).warn).toBe(false);
    expect(at(111)).toMatchObject({ differencePct: 11, warn: true });
    expect(at(89).warn).toBe(true);
  });

  it('leaves rounding on near-zero foods alone and warns on energy the macros cannot give', () => {
    expect(labelEnergyCheck({ energyKcal: 1, proteinG: 0, carbohydrateG: 0, fatG: 0 }).warn).toBe(false);
    expect(labelEnergyCheck({ energyKcal: 1, proteinG: 0, carbohydrateG: 0.1, fatG: 0 }).warn).toBe(false);
    expect(labelEnergyCheck({ energyKcal: 40, proteinG: 0, carbohydrateG: 0, fatG: 0 })).toMatchObject({
      differencePct: null,
      warn: true,
    });
  });
});

describe('label per serving → per 100 g', () => {
  // Worked by hand: a 30 g serving with 117 kcal, 3.9 g P, 18 g C, 2.1 g F, 3 g fibre, 0.12 g
  // sodium = 120 mg → per 100 g 390 kcal, 13 g P, 60 g C, 7 g F, 10 g fibre, 400 mg sodium.
  it('scales every figure by 100 / serving grams', () => {
    const per100 = labelPer100g(
      { energyKcal: 117, proteinG: 3.9, carbohydrateG: 18, fatG: 2.1, fibreG: 3, sodiumMg: 120 },
      30,
    );
    expect(per100.energyKcal).toBeCloseTo(390, 9);
    expect(per100.proteinG).toBeCloseTo(13, 9);
    expect(per100.carbohydrateG).toBeCloseTo(60, 9);
    expect(per100.fatG).toBeCloseTo(7, 9);
    expect(per100.fibreG).toBeCloseTo(10, 9);
    expect(per100.sodiumMg).toBeCloseTo(400, 9);
    expect(per100.alcoholG).toBeNull();
  });

  it('reads millilitres at 1 g/mL unless a density is given', () => {
    expect(servingGrams(250, 'ml')).toBe(250);
    expect(servingGrams(250, 'ml', 1.03)).toBeCloseTo(257.5, 9);
    expect(servingGrams(40, 'g', 1.03)).toBe(40);
  });
});
