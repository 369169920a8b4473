import { WEEKDAYS, weekdayOf, type Weekday } from '@driftmark/shared';
import { daysBetween, shiftDate } from './dates.js';
import { localDateTime } from './local-time.js';

/** Days in a check-in week. */
export const WEEK_DAYS = 7;

/** The latest `weekday` on or before `today` (YYYY-MM-DD): the due date of the check-in open then. */
export function dueDateOn(today: string, weekday: Weekday): string {
  const back = (WEEKDAYS.indexOf(weekdayOf(today)) - WEEKDAYS.indexOf(weekday) + WEEK_DAYS) % WEEK_DAYS;
  return shiftDate(today, -back);
}

/** The due date now for an athlete in `timeZone` (their own today, not the server's). */
export function currentDueDate(now: Date, timeZone: string, weekday: Weekday): string {
  return dueDateOn(localDateTime(now, timeZone).date, weekday);
}

/** The week a check-in due on `dueDate` covers: the 7 days before it. */
export function weekOf(dueDate: string): { weekStart: string; weekEnd: string } {
  return { weekStart: shiftDate(dueDate, -WEEK_DAYS), weekEnd: shiftDate(dueDate, -1) };
}

/**
 * Whether a check-in due on `dueDate` is expected of an athlete who completed the intake at
 * `intakeCompletedAt`: only when they joined before the due date (their own calendar date). Nothing
 * is due before joining, and a check-in due on the day they joined covers a week before it.
 */
export function checkInExpected(dueDate: string, intakeCompletedAt: Date | null, timeZone: string): boolean {
  if (intakeCompletedAt === null) return false;
  return localDateTime(intakeCompletedAt, timeZone).date < dueDate;
}

/** The first due date checkInExpected accepts: the first `weekday` after the day the intake was completed. */
export function firstExpectedDueDate(intakeCompletedAt: Date, timeZone: string, weekday: Weekday): string {
  // The latest `weekday` on or before joined + 7 is the first one after the day of joining.
  return dueDateOn(shiftDate(localDateTime(intakeCompletedAt, timeZone).date, WEEK_DAYS), weekday);
}

/**
 * The span of a Monday-start week (`weekStart`, as analysis.ts' weeklyAdherence keys it) that lies
 * inside the range from..to, and whether it is partial (fewer than 7 of its days in the range).
 */
export function weekSpanInRange(
  weekStart: string,
  from: string,
  to: string,
): { from: string; to: string; days: number; partial: boolean } {
  const weekEnd = shiftDate(weekStart, WEEK_DAYS - 1);
  const spanFrom = weekStart < from ? from : weekStart;
  const spanTo = weekEnd > to ? to : weekEnd;
  const days = daysBetween(spanFrom, spanTo) + 1;
  return { from: spanFrom, to: spanTo, days, partial: days < WEEK_DAYS };
}
