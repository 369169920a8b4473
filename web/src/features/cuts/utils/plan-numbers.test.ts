import { describe, expect, it } from 'vitest';
import { readWeightKg } from './plan-numbers';

// 1 lb = 0.45359237 kg exactly (International Yard and Pound Agreement, 1959; NIST SP 811 B.8).
describe('cut-plan weight boxes', () => {
  it('reads lb as kg, and kg as typed', () => {
    // 147.7 × 0.45359237 = 66.99559…; 146.4 × 0.45359237 = 66.40592…
    expect(readWeightKg('lb')('147.7')).toBeCloseTo(66.9955931, 6);
    expect(readWeightKg('lb')('146,4')).toBeCloseTo(66.405923, 6);
    expect(readWeightKg('kg')('67.0')).toBe(67);
  });

  it('leaves an empty or non-number box as NaN for the schema to refuse', () => {
    expect(readWeightKg('lb')('')).toBeNaN();
    expect(readWeightKg('lb')('abc')).toBeNaN();
  });
});
