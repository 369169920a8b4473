import { describe, expect, it } from 'vitest';
import {
  circumferenceFatPercent,
  estimateBodyFat,
  fatAndLeanMass,
  fatPercentFromDensity,
  skinfoldDensity,
  skinfoldSites,
  type BodyMeasurementInput,
} from './body-composition.js';

// Check values: REFERENCES.md section 3 ("Checks (age 30)"), computed there with python3 from the
// equations as printed by secondary sources (basis S): Jackson & Pollock 1978, Br J Nutr 40:497;
// Jackson, Pollock & Ward 1980, Med Sci Sports Exerc 12:175; Siri 1961; Brozek et al. 1963.
const SKINFOLD_CASES = [
  // [label, sex, method, sum mm, Db, Siri %, Brozek %]
  ['Jackson & Pollock 1978, men 3-site, S = 50', 'male', 'skinfold_3', 50, 1.064323, 15.0844, 15.1809],
  ['Jackson & Pollock 1978, men 7-site, S = 100', 'male', 'skinfold_7', 100, 1.0653532, 14.6346, 14.7657],
  [
    'Jackson, Pollock & Ward 1980, women 3-site, S = 60',
    'female',
    'skinfold_3',
    60,
    1.0440221,
    24.1279,
    23.5302,
  ],
  [
    'Jackson, Pollock & Ward 1980, women 7-site, S = 120',
    'female',
    'skinfold_7',
    120,
    1.0448504,
    23.752,
    23.1832,
  ],
] as const;

describe('skinfold density and % fat (REFERENCES.md §3 worked cases, age 30)', () => {
  it.each(SKINFOLD_CASES)('%s', (_label, sex, method, sum, db, siri, brozek) => {
    const density = skinfoldDensity(sex, method, sum, 30);
    expect(density).toBeCloseTo(db, 7);
    // Siri 1961: 495/Db − 450; Brozek et al. 1963: 457/Db − 414.2.
    expect(fatPercentFromDensity(density, 'siri')).toBeCloseTo(siri, 4);
    expect(fatPercentFromDensity(density, 'brozek')).toBeCloseTo(brozek, 4);
  });

  it('sums the sites of each protocol (men: chest, abdomen, thigh; women: triceps, suprailiac, thigh)', () => {
    expect(skinfoldSites('male', 'skinfold_3')).toEqual(['chest', 'abdomen', 'thigh']);
    expect(skinfoldSites('female', 'skinfold_3')).toEqual(['triceps', 'suprailiac', 'thigh']);
    expect(skinfoldSites('female', 'skinfold_7')).toHaveLength(7);
  });
});

// Hodgdon & Beckett 1984 (NHRC 84-11/84-29), inch form from Hodgdon & Friedl 1999 (NHRC TD 99-2B);
// check values REFERENCES.md §3 "Navy" (secondary source), inch form pinned; lengths typed in cm.
describe('circumference method, US Navy inch form', () => {
  const cm = (inches: number) => inches * 2.54;

  it('man: waist 34 in, neck 15 in, height 70 in → 17.5131 % fat', () => {
    const pct = circumferenceFatPercent('male', {
      waistCm: cm(34),
      neckCm: cm(15),
      hipCm: null,
      heightCm: cm(70),
    });
    expect(pct).toBeCloseTo(17.5131, 4);
  });

  it('woman: waist 30, hip 38, neck 13, height 65 in → 28.5563 % fat', () => {
    const pct = circumferenceFatPercent('female', {
      waistCm: cm(30),
      hipCm: cm(38),
      neckCm: cm(13),
      heightCm: cm(65),
    });
    expect(pct).toBeCloseTo(28.5563, 4);
  });

  it('gives nothing when the waist does not exceed the neck (no logarithm)', () => {
    expect(
      circumferenceFatPercent('male', { waistCm: 38, neckCm: 40, hipCm: null, heightCm: 180 }),
    ).toBeNull();
  });
});

describe('fat and lean mass', () => {
  it('80 kg at 15.0844 % fat → FM 12.0675 kg, FFM 67.9325 kg (REFERENCES.md §3)', () => {
    const { fatKg, leanKg } = fatAndLeanMass(80, 15.0844);
    expect(fatKg).toBeCloseTo(12.0675, 4);
    expect(leanKg).toBeCloseTo(67.9325, 4);
  });
});

describe('estimateBodyFat', () => {
  const base: BodyMeasurementInput = {
    method: 'skinfold_3',
    densityEquation: 'siri',
    skinfoldsMm: {},
    neckCm: null,
    waistCm: null,
    hipCm: null,
    heightCm: null,
  };

  it('a man, 3 sites summing 50 mm at 30 → the Jackson & Pollock case, Siri 15.0844 %', () => {
    const r = estimateBodyFat(
      { ...base, skinfoldsMm: { chest: 12, abdomen: 22, thigh: 16, triceps: 99 } },
      { sex: 'male', ageYears: 30 },
    );
    if (!('estimate' in r)) throw new Error('expected an estimate');
    expect(r.estimate.sumMm).toBe(50);
    expect(r.estimate.fatPercent).toBeCloseTo(15.0844, 4);
    expect(r.estimate.equation).toBe('Jackson & Pollock 3-site, Siri');
  });

  it("names the sites a woman's 3-site measurement lacks", () => {
    const r = estimateBodyFat(
      { ...base, skinfoldsMm: { chest: 12, thigh: 20 } },
      { sex: 'female', ageYears: 30 },
    );
    expect(r).toEqual({
      missing: {
        'skinfoldsMm.triceps': 'Required for this method',
        'skinfoldsMm.suprailiac': 'Required for this method',
      },
    });
  });

  it("a woman's circumference measurement needs the hip", () => {
    const r = estimateBodyFat(
      { ...base, method: 'circumference', neckCm: 33, waistCm: 76, heightCm: 165 },
      { sex: 'female', ageYears: 30 },
    );
    expect(r).toEqual({ missing: { hipCm: 'Required for the circumference method' } });
  });
});
