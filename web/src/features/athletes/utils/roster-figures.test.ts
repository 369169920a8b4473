import { describe, expect, it } from 'vitest';
import { formatDaysAgo, formatSigned, MINUS, rateStanding } from './roster-figures';

describe('formatSigned', () => {
  it('always shows the sign, with a true minus sign', () => {
    expect(formatSigned(-0.84)).toBe(`${MINUS}0.8`);
    expect(formatSigned(0.3)).toBe('+0.3');
    expect(formatSigned(-1.25, 2)).toBe(`${MINUS}1.25`);
  });

  it('prints a value that rounds to zero without a sign', () => {
    expect(formatSigned(-0.04)).toBe('0.0');
    expect(formatSigned(0)).toBe('0.0');
  });
});

describe('rateStanding against the dieting band −1 … −0.5 %/week (Helms 2014)', () => {
  const band = { minPct: -1, maxPct: -0.5 };

  it('is on plan inside the band, edges included, judged at the one decimal shown', () => {
    expect(rateStanding(-0.8, band)).toBe('on_plan');
    expect(rateStanding(-1, band)).toBe('on_plan');
    expect(rateStanding(-0.5, band)).toBe('on_plan');
    expect(rateStanding(-0.46, band)).toBe('on_plan');
  });

  it('drifts when outside by up to half the band width (0.25 %/week here)', () => {
    expect(rateStanding(-1.2, band)).toBe('drifting');
    expect(rateStanding(-0.3, band)).toBe('drifting');
    expect(rateStanding(-0.25, band)).toBe('drifting');
  });

  it('is off plan further out, on either side', () => {
    expect(rateStanding(-1.4, band)).toBe('off_plan');
    expect(rateStanding(0, band)).toBe('off_plan');
    expect(rateStanding(0.4, band)).toBe('off_plan');
  });

  it('accepts a band given high to low', () => {
    expect(rateStanding(-0.8, { minPct: -0.5, maxPct: -1 })).toBe('on_plan');
  });
});

describe('formatDaysAgo', () => {
  it('counts calendar days back from the reader’s today', () => {
    expect(formatDaysAgo('2026-12-09', '2026-12-09')).toBe('Today');
    expect(formatDaysAgo('2026-12-08', '2026-12-09')).toBe('Yesterday');
    expect(formatDaysAgo('2026-11-29', '2026-12-09')).toBe('10 days ago');
  });

  it('reads a date after today (another time zone ahead) as today', () => {
    expect(formatDaysAgo('2026-12-10', '2026-12-09')).toBe('Today');
  });
});
