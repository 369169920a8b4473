import {
  countdownDayLabel,
  dayEntryFor,
  resolveTargets,
  versionInForce,
  type EVENT_TYPES,
  type PlanBaseline,
  type PlanContent,
  type DayEntry,
  type ResolvedTargets,
  type Tolerances,
} from '@driftmark/shared';

/** The parts of a plan version the per-day computations read. */
export interface PlanVersionLike {
  id: string;
  number: number;
  effectiveFrom: string;
  content: PlanContent;
  baseline: PlanBaseline;
}

/** A countdown day: its offset from the event day and the label ("E-3"). */
export interface CountdownMark {
  offset: number;
  dayLabel: string;
  eventDate: string;
  eventType: (typeof EVENT_TYPES)[number];
}

/** Where the event happens on the clock, for supplement times set before it. */
export interface EventPlace {
  /** HH:MM in the event's zone; null while the coach has not set it. */
  eventTime: string | null;
  /** The event's IANA zone; the athlete's own when none is stored. */
  eventTimeZone: string | null;
  athleteTimeZone: string;
}

/** What one plan version says about one date, resolved. */
export interface VersionDay {
  /** The day entry: a dated day (countdown days included) or the weekday pattern's day type. */
  entry: DayEntry;
  targets: ResolvedTargets;
  tolerances: Tolerances;
  /** The countdown day it is, with the dated day's own label; null outside a countdown. */
  countdown: (CountdownMark & { label: string | null }) | null;
}

/**
 * What `version` says about `date`: its day entry (a dated day wins over the weekday pattern)
 * resolved against the version's own baseline snapshot, so a later version or weigh-in never
 * changes a past day. Supplement times set before the event count back from the event this
 * countdown day belongs to, on the event's clock (`place`; without it they stay unresolved).
 * The day view, the trend, the roster and the weekly check-in all read a day through this.
 */
export function versionDay(version: PlanVersionLike, date: string, place?: EventPlace): VersionDay {
  const { content } = version;
  const entry = dayEntryFor(content, date);
  const targets = entry.kind === 'date' ? entry.override.targets : entry.dayType.targets;
  const offset = entry.kind === 'date' ? entry.override.countdownOffset : null;
  const eventDate = offset !== null ? (content.countdown?.eventDate ?? null) : null;
  const event =
    eventDate && place?.eventTime
      ? {
          date: eventDate,
          time: place.eventTime.slice(0, 5),
          timeZone: place.eventTimeZone ?? place.athleteTimeZone,
        }
      : null;
  return {
    entry,
    targets: resolveTargets(
      targets,
      version.baseline,
      place ? { event, athleteTimeZone: place.athleteTimeZone } : undefined,
    ),
    tolerances: content.tolerances,
    countdown:
      offset !== null && entry.kind === 'date' && content.countdown
        ? {
            offset,
            dayLabel: countdownDayLabel(offset),
            eventDate: content.countdown.eventDate,
            eventType: content.countdown.eventType,
            label: entry.override.label,
          }
        : null,
  };
}

/** What the plan says about one date, resolved, with the number of the version in force. */
export interface PlannedDay extends VersionDay {
  versionNumber: number;
}

/**
 * The plan for `date`: the version in force that day (versionInForce) read through versionDay.
 * Null before the first version.
 */
export function plannedDay(
  versions: readonly PlanVersionLike[],
  date: string,
  place?: EventPlace,
): PlannedDay | null {
  const version = versionInForce(versions, date);
  if (!version) return null;
  return { versionNumber: version.number, ...versionDay(version, date, place) };
}

/**
 * plannedDay for many dates of one athlete (a chart's range, a roster's week): each version's day
 * entry (a day type of the weekday pattern, or one dated day) is resolved once and shared by every
 * date it sets, so a 3-year chart resolves a handful of day types instead of 1,100 days, explanation
 * texts (`basis`) included. The answer for each date is the one plannedDay gives for it alone.
 */
export function dayPlanner(
  versions: readonly PlanVersionLike[],
  place?: EventPlace,
): (date: string) => PlannedDay | null {
  const resolved = new Map<string, PlannedDay>();
  return (date) => {
    const version = versionInForce(versions, date);
    if (!version) return null;
    const entry = dayEntryFor(version.content, date);
    const key = `${version.id}\u0000${entry.kind === 'date' ? `date:${date}` : `type:${entry.dayType.key}`}`;
    let day = resolved.get(key);
    if (!day) {
      day = { versionNumber: version.number, ...versionDay(version, date, place) };
      resolved.set(key, day);
    }
    return day;
  };
}
