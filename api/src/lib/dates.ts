import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';

/** Today's calendar date (YYYY-MM-DD) in an IANA time zone. */
export function todayIn(timeZone: string, now: Date = new Date()): string {
  return format(new TZDate(now.getTime(), timeZone), 'yyyy-MM-dd');
}

const DAY_MS = 86_400_000;

/** Whole calendar days from `from` to `to` (both YYYY-MM-DD); negative when `to` is earlier. */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / DAY_MS);
}

/** Days from today in the athlete's own time zone to the event date; null without an event date. */
export function daysToEvent(
  eventDate: string | null,
  athleteTimeZone: string,
  now: Date = new Date(),
): number | null {
  if (!eventDate) return null;
  return daysBetween(todayIn(athleteTimeZone, now), eventDate);
}

/** The calendar date `days` after `date` (both YYYY-MM-DD; negative goes back). */
export function shiftDate(date: string, days: number): string {
  return new Date(Date.parse(`${date}T00:00:00Z`) + days * DAY_MS).toISOString().slice(0, 10);
}

export const addMinutes = (date: Date, minutes: number): Date => new Date(date.getTime() + minutes * 60_000);
export const addDays = (date: Date, days: number): Date => new Date(date.getTime() + days * DAY_MS);
