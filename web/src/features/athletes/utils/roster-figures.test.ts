import { describe, expect, it } from 'vitest';
import { formatDaysAgo, formatSigned, MINUS } from './roster-figures';

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
