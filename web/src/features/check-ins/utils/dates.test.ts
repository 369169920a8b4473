import { describe, expect, it } from 'vitest';
import { addDays, clockIn, historyPageRange, isIsoDate } from './dates';

describe('calendar dates', () => {
  it('moves by whole days across month, year and daylight-saving boundaries', () => {
    expect(addDays('2026-12-31', 1)).toBe('2027-01-01');
    expect(addDays('2027-03-01', -1)).toBe('2027-02-28');
    expect(addDays('2027-03-27', 2)).toBe('2027-03-29');
  });

  it('accepts only real dates', () => {
    expect(isIsoDate('2026-12-01')).toBe(true);
    expect(isIsoDate('2026-02-30')).toBe(false);
    expect(isIsoDate('2026-1-01')).toBe(false);
    expect(isIsoDate(null)).toBe(false);
  });

  it('pages the history back in blocks, newest first', () => {
    expect(historyPageRange('2026-12-01', 0, 60)).toEqual({ from: '2026-10-03', to: '2026-12-01' });
    expect(historyPageRange('2026-12-01', 1, 60)).toEqual({ from: '2026-08-04', to: '2026-10-02' });
  });
});

describe('clockIn', () => {
  it('reads the clock in the athlete time zone, around midnight (UTC+13 and UTC−10)', () => {
    const instant = new Date('2026-12-01T11:05:00Z');
    expect(clockIn('Pacific/Tongatapu', instant)).toBe('00:05'); // UTC+13, already 2 December
    expect(clockIn('Pacific/Honolulu', instant)).toBe('01:05'); // UTC−10
    expect(clockIn('UTC', new Date('2026-12-01T23:59:00Z'))).toBe('23:59');
  });
});
