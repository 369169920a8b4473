import { describe, expect, it } from 'vitest';
import { currentDueDate, dueDateOn, weekOf } from './weekly-dates.js';

describe('weekly check-in dates', () => {
  it('is today on the check-in weekday and the latest one before otherwise', () => {
    // 2026-12-01 is a Tuesday.
    expect(dueDateOn('2026-12-01', 'tue')).toBe('2026-12-01');
    expect(dueDateOn('2026-12-01', 'mon')).toBe('2026-11-30');
    expect(dueDateOn('2026-12-01', 'wed')).toBe('2026-11-25');
    expect(dueDateOn('2026-12-06', 'mon')).toBe('2026-11-30');
  });

  it("counts in the athlete's own time zone", () => {
    // Tuesday 2026-12-01 11:30 UTC (UTC+13 in Auckland's summer): already Wednesday in Auckland, still Tuesday in Honolulu.
    const now = new Date('2026-12-01T11:30:00Z');
    expect(currentDueDate(now, 'Pacific/Auckland', 'wed')).toBe('2026-12-02');
    expect(currentDueDate(now, 'Pacific/Honolulu', 'wed')).toBe('2026-11-25');
    expect(currentDueDate(now, 'UTC', 'tue')).toBe('2026-12-01');
  });

  it('covers the 7 days before the due date', () => {
    expect(weekOf('2026-12-01')).toEqual({ weekStart: '2026-11-24', weekEnd: '2026-11-30' });
  });
});
