import type {
  DateOverride,
  DayType,
  PlanBaseline,
  PlanContent,
  DayTargets,
  ResolvedTargets,
  Weekday,
} from '../schemas/plans.js';

/** Weekday of a YYYY-MM-DD calendar date (no time zone involved). */
export function weekdayOf(date: string): Weekday {
  void date;
  throw new Error('not implemented');
}

/** "E-3", "E-0", "E+1". */
export function countdownDayLabel(offset: number): string {
  void offset;
  throw new Error('not implemented');
}

/** Which part of a content sets `date`'s targets: a dated day wins over the weekday pattern. */
export type DayEntry = { kind: 'date'; override: DateOverride } | { kind: 'pattern'; dayType: DayType };
export function dayEntryFor(content: PlanContent, date: string): DayEntry {
  void content;
  void date;
  throw new Error('not implemented');
}

/**
 * The version in force on `date` (the athlete's date): the greatest `effectiveFrom` ≤ date; among
 * versions with the same `effectiveFrom`, the highest `number`. Null before the first.
 */
export function versionInForce<V extends { effectiveFrom: string; number: number }>(
  versions: readonly V[],
  date: string,
): V | null {
  void versions;
  void date;
  throw new Error('not implemented');
}

/** Concrete numbers for one day's targets, resolved against the baseline; `basis` explains relative ones. */
export function resolveTargets(targets: DayTargets, baseline: PlanBaseline): ResolvedTargets {
  void targets;
  void baseline;
  throw new Error('not implemented');
}

/** An empty day (no targets). */
export function emptyDayTargets(): DayTargets {
  throw new Error('not implemented');
}

/** A starting content: one "Training day" and one "Rest day" type, Mon–Sat training, Sun rest, no targets, default tolerances. */
export function starterPlanContent(): PlanContent {
  throw new Error('not implemented');
}
