import { addDays as addCalendarDays, daysBetween, todayIn } from '@driftmark/shared';

// The calendar itself lives in shared/src/calendar.ts; the server's modules import it from here.
// `shiftDate` is the server's name for its addDays (this module's addDays moves an instant).
export { addCalendarDays as shiftDate, daysBetween, todayIn };

const DAY_MS = 86_400_000;

/** Days from today in the athlete's own time zone to the event date; null without an event date. */
export function daysToEvent(
  eventDate: string | null,
  athleteTimeZone: string,
  now: Date = new Date(),
): number | null {
  if (!eventDate) return null;
  return daysBetween(todayIn(athleteTimeZone, now), eventDate);
}

export const addMinutes = (date: Date, minutes: number): Date => new Date(date.getTime() + minutes * 60_000);
export const addDays = (date: Date, days: number): Date => new Date(date.getTime() + days * DAY_MS);
