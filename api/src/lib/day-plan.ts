import {
  countdownDayLabel,
  dayEntryFor,
  resolveTargets,
  versionInForce,
  type EVENT_TYPES,
  type PlanBaseline,
  type PlanContent,
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

/** What the plan says about one date, resolved. */
export interface PlannedDay {
  versionNumber: number;
  targets: ResolvedTargets;
  tolerances: Tolerances;
  countdown: CountdownMark | null;
}

/**
 * The plan for `date`: the version in force that day (versionInForce), its day entry (a dated day
 * wins over the weekday pattern) resolved against that version's own baseline snapshot, so a later
 * version or weigh-in never changes a past day. Null before the first version.
 */
export function plannedDay(versions: readonly PlanVersionLike[], date: string): PlannedDay | null {
  const version = versionInForce(versions, date);
  if (!version) return null;
  const { content } = version;
  const entry = dayEntryFor(content, date);
  const offset = entry.kind === 'date' ? entry.override.countdownOffset : null;
  return {
    versionNumber: version.number,
    targets: resolveTargets(
      entry.kind === 'date' ? entry.override.targets : entry.dayType.targets,
      version.baseline,
    ),
    tolerances: content.tolerances,
    countdown:
      offset !== null && content.countdown
        ? {
            offset,
            dayLabel: countdownDayLabel(offset),
            eventDate: content.countdown.eventDate,
            eventType: content.countdown.eventType,
          }
        : null,
  };
}
