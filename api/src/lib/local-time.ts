import { clockIn, dateWindowProblem, LIMITS, todayIn, zonedInstant } from '@driftmark/shared';

/** The calendar date (YYYY-MM-DD) and clock time (HH:MM) of an instant in an IANA time zone. */
export function localDateTime(now: Date, timeZone: string): { date: string; time: string } {
  return { date: todayIn(timeZone, now), time: clockIn(timeZone, now) };
}

/**
 * The instant a local date and clock time name in a time zone: the shared `zonedInstant` (first of a
 * repeated hour, a skipped one pushed forward), as a Date.
 */
export function localInstant(date: string, time: string, timeZone: string): Date {
  return new Date(zonedInstant(date, time, timeZone));
}

export const FUTURE_DATE_MESSAGE = 'That date is still in the future';
export const FUTURE_TIME_MESSAGE = 'That time is still in the future';

/**
 * Why an entry for `date` (and `time`, when it has one) cannot be logged yet, by field, or null.
 * "Today" is the athlete's own: a date after today is refused, and on today a clock time more
 * than LIMITS.futureSlackMinutes past now (phone clocks drift).
 */
export function futureEntryProblem(
  entry: { date: string; time?: string | null },
  timeZone: string,
  now: Date,
): { date: string } | { time: string } | null {
  const today = localDateTime(now, timeZone).date;
  if (entry.date > today) return { date: FUTURE_DATE_MESSAGE };
  // Not further back than the history window (shared dateWindow).
  const tooOld = dateWindowProblem(entry.date, today, 'past');
  if (tooOld) return { date: tooOld };
  if (entry.time) {
    const at = localInstant(entry.date, entry.time, timeZone);
    if (at.getTime() > now.getTime() + LIMITS.futureSlackMinutes * 60_000)
      return { time: FUTURE_TIME_MESSAGE };
  }
  return null;
}
