import { describe, expect, it } from 'vitest';
import { addDays, dayDiff, eachDay } from './dates';
import { firstPlanDate, isTrendRange, rangeDates } from './range';

describe('dates', () => {
  it('moves across month and year ends and counts days', () => {
    expect(addDays('2026-12-31', 1)).toBe('2027-01-01');
    expect(addDays('2028-03-01', -1)).toBe('2028-02-29');
    expect(dayDiff('2026-01-01', '2026-03-01')).toBe(59);
    expect(eachDay('2026-01-30', '2026-02-02')).toEqual([
      '2026-01-30',
      '2026-01-31',
      '2026-02-01',
      '2026-02-02',
    ]);
    expect(eachDay('2026-02-02', '2026-02-01')).toEqual([]);
  });
});

describe('rangeDates', () => {
  const today = '2026-06-30';
  it('covers 14 and 42 days ending today', () => {
    expect(rangeDates('2w', today)).toEqual({ from: '2026-06-17', to: today });
    expect(dayDiff(rangeDates('6w', today).from, today) + 1).toBe(42);
  });
  it('starts the season at the first plan version or 16 weeks back, whichever is earlier', () => {
    expect(dayDiff(rangeDates('season', today).from, today) + 1).toBe(112);
    expect(rangeDates('season', today, '2026-06-01').from).toBe(rangeDates('season', today).from);
    expect(rangeDates('season', today, '2026-01-05').from).toBe('2026-01-05');
  });
  it('caps the season at 400 days', () => {
    const { from } = rangeDates('season', today, '2020-01-01');
    expect(dayDiff(from, today) + 1).toBe(400);
  });
  it('recognises range keys', () => {
    expect(isTrendRange('6w')).toBe(true);
    expect(isTrendRange('3w')).toBe(false);
    expect(isTrendRange(null)).toBe(false);
  });
});

describe('firstPlanDate', () => {
  it('finds the earliest version start', () => {
    expect(firstPlanDate([{ effectiveFrom: '2026-03-02' }, { effectiveFrom: '2026-01-05' }])).toBe(
      '2026-01-05',
    );
    expect(firstPlanDate([])).toBeNull();
    expect(firstPlanDate(undefined)).toBeNull();
  });
});
