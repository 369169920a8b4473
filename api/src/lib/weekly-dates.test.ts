import { describe, expect, it } from 'vitest';
import {
  checkInExpected,
  currentDueDate,
  dueDateOn,
  firstExpectedDueDate,
  weekOf,
  weekSpanInRange,
} from './weekly-dates.js';

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

  it('expects nothing before joining: only a due date after the day the intake was completed', () => {
    // Joined Tuesday 2026-12-01 at 09:00 in Madrid (08:00 UTC); check-in day Monday.
    const joined = new Date('2026-12-01T08:00:00Z');
    expect(checkInExpected('2026-11-30', joined, 'Europe/Madrid')).toBe(false);
    // A check-in due on the day of joining covers the week before it: not expected either.
    expect(checkInExpected('2026-12-01', joined, 'Europe/Madrid')).toBe(false);
    expect(checkInExpected('2026-12-07', joined, 'Europe/Madrid')).toBe(true);
    expect(checkInExpected('2026-12-07', null, 'Europe/Madrid')).toBe(false);
    // 2026-12-01 08:00 UTC is still 22:00 on 30 Nov in Honolulu: joined before a due date of the 1st.
    expect(checkInExpected('2026-12-01', joined, 'Pacific/Honolulu')).toBe(true);
    expect(firstExpectedDueDate(joined, 'Europe/Madrid', 'mon')).toBe('2026-12-07');
    expect(firstExpectedDueDate(joined, 'Europe/Madrid', 'tue')).toBe('2026-12-08');
    expect(firstExpectedDueDate(joined, 'Europe/Madrid', 'wed')).toBe('2026-12-02');
  });

  it("labels a trend range's weeks with their real span: a range starting on a Wednesday has a partial first week", () => {
    // 2026-11-30 is a Monday; the range 2026-12-02 (Wed) … 2026-12-16 (Wed).
    expect(weekSpanInRange('2026-11-30', '2026-12-02', '2026-12-16')).toEqual({
      from: '2026-12-02',
      to: '2026-12-06',
      days: 5,
      partial: true,
    });
    expect(weekSpanInRange('2026-12-07', '2026-12-02', '2026-12-16')).toEqual({
      from: '2026-12-07',
      to: '2026-12-13',
      days: 7,
      partial: false,
    });
    expect(weekSpanInRange('2026-12-14', '2026-12-02', '2026-12-16')).toMatchObject({
      to: '2026-12-16',
      days: 3,
      partial: true,
    });
  });
});
