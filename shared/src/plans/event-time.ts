import { wallClock } from '../calendar.js';
import type { DayTargets, ResolvedTargets } from '../schemas/plans.js';

/*
 * Clock times relative to the event. The event's date and clock time are read in the event's own
 * time zone, the instant moved back by the item's minutes, and the result read on the athlete's
 * clock. Offsets and daylight-saving changes come from the IANA tz database as the runtime's Intl
 * carries it (Node and browsers alike), so shared/ needs no time-zone library.
 */

/** The event's wall clock: its date and time where it happens. */
export interface EventClock {
  /** YYYY-MM-DD in the event's calendar. */
  date: string;
  /** HH:MM in the event's time zone. */
  time: string;
  /** IANA time zone of the event ("Pacific/Auckland"). */
  timeZone: string;
}

const pad = (n: number) => String(n).padStart(2, '0');

/** The date (YYYY-MM-DD) and clock time (HH:MM) an instant reads in a time zone. */
export function zonedDateTime(ms: number, timeZone: string): { date: string; time: string } {
  const w = wallClock(ms, timeZone);
  return { date: `${w.year}-${pad(w.month)}-${pad(w.day)}`, time: `${pad(w.hour)}:${pad(w.minute)}` };
}

/** How far the zone's wall clock is ahead of UTC at an instant, ms. */
function offsetAt(ms: number, timeZone: string): number {
  const w = wallClock(ms, timeZone);
  const asUtc = Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second);
  return asUtc - (ms - (((ms % 1000) + 1000) % 1000));
}

/**
 * The instant (ms since the epoch) a wall-clock date and time name in a time zone. A time that
 * happens twice (the hour repeated when clocks go back) is the first of the two; a time skipped
 * when clocks go forward is read with the offset before the change, i.e. pushed forward by the gap
 * (02:30 on a spring-forward night in Madrid is 03:30). Both as RFC 5545 §3.3.5 reads local times
 * (and TC39 Temporal's "compatible" disambiguation).
 */
export function zonedInstant(date: string, time: string, timeZone: string): number {
  const [y, mo, d] = date.split('-').map(Number) as [number, number, number];
  const [h, mi] = time.split(':').map(Number) as [number, number];
  const wall = Date.UTC(y, mo - 1, d, h, mi);
  // The two offsets in force around the wall time (a day either side covers any change).
  const before = offsetAt(wall - 86_400_000, timeZone);
  const after = offsetAt(wall + 86_400_000, timeZone);
  const candidates = [...new Set([wall - before, wall - after])].sort((a, b) => a - b);
  const exact = candidates.filter((ms) => zonedDateTime(ms, timeZone).time === time.slice(0, 5));
  if (exact.length > 0) return exact[0]!;
  // Skipped by a spring-forward change: the offset before the change pushes it past the gap.
  return wall - before;
}

/**
 * Where "`minutesBefore` minutes before the event" falls on the athlete's clock: the event's
 * instant in its own zone, moved back, read in the athlete's zone.
 */
export function beforeEventOnAthleteClock(
  event: EventClock,
  minutesBefore: number,
  athleteTimeZone: string,
): { date: string; time: string } {
  const at = zonedInstant(event.date, event.time, event.timeZone) - minutesBefore * 60_000;
  return zonedDateTime(at, athleteTimeZone);
}

/**
 * The day's supplement times set before the event, one row per time, placed on the athlete's clock
 * when the event's clock is known (else `at` is null: the event has no clock time yet).
 */
export function eventTimedItems(
  supplements: DayTargets['supplements'],
  event: EventClock | null,
  athleteTimeZone: string | null,
): ResolvedTargets['eventTimed'] {
  return supplements.flatMap((s) =>
    (s.minutesBeforeEvent ?? []).map((minutesBefore) => ({
      itemId: s.id,
      item: s.item,
      dose: s.dose,
      unit: s.unit,
      minutesBefore,
      at: event && athleteTimeZone ? beforeEventOnAthleteClock(event, minutesBefore, athleteTimeZone) : null,
    })),
  );
}

/** "3 h before", "90 min before", "2 h 30 min before", "at the event". */
export function minutesBeforeLabel(minutes: number): string {
  if (minutes === 0) return 'at the event';
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  const parts = [h > 0 ? `${h} h` : null, m > 0 ? `${m} min` : null].filter(Boolean);
  return `${parts.join(' ')} before`;
}
