import { cmToIn } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { rangeInUnit, rangeMessageInUnit } from './number-reader';

describe('rangeInUnit', () => {
  it('rounds an SI range inward in the reader’s unit, so both ends stay allowed', () => {
    // 120–230 cm / 2.54 (NIST SP 811 App. B, exact) = 47.244–90.551 in.
    expect(rangeInUnit({ min: 120, max: 230 }, cmToIn)).toEqual({ min: 47.3, max: 90.5 });
    // Exact ends stay as they are: 25.4 cm = 10 in.
    expect(rangeInUnit({ min: 25.4, max: 254 }, cmToIn)).toEqual({ min: 10, max: 100 });
  });
});

describe('rangeMessageInUnit', () => {
  const box = { subject: 'Hip', limits: { min: 50, max: 200 }, fromSi: cmToIn, unit: 'in' };
  it('rewords too_small and too_big, and leaves other messages', () => {
    // 50 cm = 19.685 in → 19.7; 200 cm = 78.740 in → 78.7.
    expect(rangeMessageInUnit({ type: 'too_small', message: 'x' }, box)).toBe('Hip must be at least 19.7 in');
    expect(rangeMessageInUnit({ type: 'too_big', message: 'x' }, box)).toBe('Hip must be at most 78.7 in');
    expect(rangeMessageInUnit({ type: 'invalid_type', message: 'Hip must be a number' }, box)).toBe(
      'Hip must be a number',
    );
  });
});
