import { describe, expect, it } from 'vitest';
import {
  addDays,
  clockIn,
  daysBetween,
  eachDay,
  inFinalWeek,
  isIsoDate,
  todayIn,
  weekdayNumber,
} from './calendar.js';

// Reference: the proleptic Gregorian calendar (ISO 8601) and the IANA tz database as the runtime
// ships it; each expected value below can be read off any calendar.
describe('calendar dates', () => {
  it('moves across month ends, leap days and New Year', () => {
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29'); // 2028 is a leap year
    expect(addDays('2027-02-28', 1)).toBe('2027-03-01');
    expect(addDays('2026-12-31', 1)).toBe('2027-01-01');
    expect(addDays('2027-01-01', -1)).toBe('2026-12-31');
    expect(addDays('2026-03-29', 1)).toBe('2026-03-30'); // Europe's spring change changes nothing here
  });

  it('counts whole days either way', () => {
    expect(daysBetween('2026-12-25', '2027-01-01')).toBe(7);
    expect(daysBetween('2027-01-01', '2026-12-25')).toBe(-7);
    expect(daysBetween('2026-01-01', '2027-01-01')).toBe(365);
    expect(daysBetween('2028-01-01', '2029-01-01')).toBe(366);
    expect(eachDay('2026-12-30', '2027-01-02')).toEqual([
      '2026-12-30',
      '2026-12-31',
      '2027-01-01',
      '2027-01-02',
    ]);
    expect(eachDay('2027-01-02', '2027-01-01')).toEqual([]);
  });

  it('knows real dates and weekdays', () => {
    expect(isIsoDate('2028-02-29')).toBe(true);
    expect(isIsoDate('2027-02-29')).toBe(false);
    expect(isIsoDate('2026-13-01')).toBe(false);
    expect(isIsoDate('26-01-01')).toBe(false);
    expect(isIsoDate('0000-01-01')).toBe(false);
    expect(isIsoDate('0999-12-31')).toBe(false);
    expect(isIsoDate('1000-01-01')).toBe(true);
    expect(weekdayNumber('2026-12-03')).toBe(4); // a Thursday
    expect(weekdayNumber('2027-01-03')).toBe(0); // a Sunday
  });

  it('reads today and the clock in a zone, across a daylight-saving change', () => {
    const at = new Date('2026-10-25T00:30:00Z'); // Madrid's autumn change is at 01:00 UTC
    expect(todayIn('Pacific/Auckland', at)).toBe('2026-10-25'); // 13:30 NZDT
    expect(todayIn('Pacific/Honolulu', at)).toBe('2026-10-24'); // 14:30 HST
    expect(clockIn('Europe/Madrid', at)).toBe('02:30'); // still CEST (UTC+2)
    expect(clockIn('Europe/Madrid', new Date('2026-10-25T01:30:00Z'))).toBe('02:30'); // now CET (UTC+1)
  });
});

describe('inFinalWeek', () => {
  // E-7 … E-0 (common practice, no source).
  it.each([
    [null, false],
    [8, false],
    [7, true],
    [0, true],
    [-1, false],
  ])('%s days to the event → %s', (days, expected) => {
    expect(inFinalWeek(days)).toBe(expected);
  });
});
