import { formatDateTime } from './format';

/*
 * The one place a time of day gets its "whose clock" label. Entries are on the athlete's clock,
 * marks and replies on the viewer's, the plan history on the viewer's, and times set before the
 * event on the athlete's clock (placed by the server from the event's zone).
 */

/** Whose clock a time of day is read on, with that clock's IANA zone. */
export interface Clock {
  whose: 'athlete' | 'viewer' | 'event';
  timeZone: string;
}

/** The viewer's clock: the browser's zone (the signed-in user's own). */
export function viewerClock(): Clock {
  return { whose: 'viewer', timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC' };
}

/** The place of an IANA zone, for short labels: "Europe/Madrid" → "Madrid", "America/New_York" → "New York". */
export function zonePlace(timeZone: string): string {
  const last = timeZone.split('/').at(-1) ?? timeZone;
  return last.replaceAll('_', ' ');
}

const WHOSE: Record<Clock['whose'], string> = {
  athlete: "athlete's time",
  viewer: 'your time',
  event: "event's time",
};

/** "07:10 Madrid time": a clock time with its place, compact enough for a row. */
export function formatClock(time: string, clock: Clock): string {
  return `${time.slice(0, 5)} ${zonePlace(clock.timeZone)} time`;
}

/** "07:10 (athlete's time, Europe/Madrid)": where one time stands alone and needs the full words. */
export function formatClockLong(time: string, clock: Clock): string {
  return `${time.slice(0, 5)} (${WHOSE[clock.whose]}, ${clock.timeZone})`;
}

/** "2 Dec 2026, 09:14 Madrid time": an instant on a clock. */
export function formatInstant(iso: string, clock: Clock): string {
  return `${formatDateTime(iso, clock.timeZone)} ${zonePlace(clock.timeZone)} time`;
}

/**
 * A caption for a group of times on one clock: "Times on your clock (Europe/Madrid)" for the
 * athlete reading their own day, "Times on the athlete's clock (Europe/Madrid)" for staff.
 */
export function clockCaption(clock: Clock, readerIsAthlete = false): string {
  const whose =
    clock.whose === 'athlete' && readerIsAthlete
      ? 'your clock'
      : clock.whose === 'athlete'
        ? "the athlete's clock"
        : clock.whose === 'viewer'
          ? 'your clock'
          : "the event's clock";
  return `Times on ${whose} (${clock.timeZone})`;
}
