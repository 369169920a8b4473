import { WEEKDAYS, weekdayOf, type Weekday } from '@driftmark/shared';
import { shiftDate } from './dates.js';
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
