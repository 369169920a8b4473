import { describe, expect, it } from 'vitest';
import {
  cmToIn,
  flOzToMl,
  inToCm,
  kgToLb,
  lbToKg,
  mlToFlOz,
  volumeFromMl,
  volumeToMl,
  weightFromKg,
  weightToKg,
} from './units.js';

// Check values: REFERENCES.md section 9 — 1959 international yard and pound agreement;
// NIST SP 811 App. B (secondary source: third-party reproductions).
describe('exact unit factors', () => {
  it('converts pounds to kilograms with 0.45359237 kg/lb', () => {
    expect(lbToKg(180)).toBeCloseTo(81.6466266, 7);
    expect(kgToLb(1)).toBeCloseTo(2.204622622, 9);
  });

  it('converts US fluid ounces with 29.5735295625 mL/fl oz', () => {
    expect(flOzToMl(16.9)).toBeCloseTo(499.7926, 4);
    expect(mlToFlOz(1000)).toBeCloseTo(33.814023, 6);
  });

  it('converts inches with 2.54 cm/in', () => {
    expect(inToCm(70)).toBeCloseTo(177.8, 10);
    expect(cmToIn(177.8)).toBeCloseTo(70, 10);
  });
});

describe('round trips at the edges', () => {
  it('a value typed in lb comes back in lb unchanged', () => {
    for (const lb of [97.3, 150, 181.4, 203.7, 264.55]) {
      expect(weightFromKg(weightToKg(lb, 'lb'), 'lb')).toBeCloseTo(lb, 10);
    }
  });

  it('a value typed in fl oz comes back in fl oz unchanged', () => {
    for (const floz of [8, 12.5, 16.9, 33.8]) {
      expect(volumeFromMl(volumeToMl(floz, 'floz'), 'floz')).toBeCloseTo(floz, 10);
    }
  });

  it('SI units pass through untouched', () => {
    expect(weightToKg(81.2, 'kg')).toBe(81.2);
    expect(volumeToMl(250, 'ml')).toBe(250);
  });
});
