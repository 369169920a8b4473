import type { AthleteProfile, CountdownMismatch, RosterFigures, RosterRow } from '@driftmark/shared';
import { daysToEvent } from '../lib/dates.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';

/** `countdownMismatch` comes from the athlete's latest plan version (see `athleteProfileView`). */
export function presentAthleteProfile(
  a: AthleteWithPeople,
  countdownMismatch: CountdownMismatch | null,
): AthleteProfile {
  return {
    id: a.id,
    userId: a.userId,
    name: a.user.name,
    email: a.user.email,
    status: a.status,
    coach: { id: a.coach.id, name: a.coach.name },
    sex: a.sex,
    birthDate: a.birthDate,
    heightCm: a.heightCm,
    intakeWeightKg: a.intakeWeightKg,
    usualWaterMl: a.usualWaterMl,
    usualEnergyKcal: a.usualEnergyKcal,
    goal: a.goal,
    eventType: a.eventType,
    eventName: a.eventName,
    eventDate: a.eventDate,
    eventTime: a.eventTime,
    eventTimeZone: a.eventTimeZone,
    division: a.division,
    weighInLimitKg: a.weighInLimitKg,
    timeZone: a.user.timeZone,
    units: { weight: a.user.weightUnit, volume: a.user.volumeUnit },
    photoConsent: a.photoConsent,
    intakeCompletedAt: a.intakeCompletedAt ? a.intakeCompletedAt.toISOString() : null,
    countdownMismatch,
  };
}

/** `daysToEvent` counts from today in the athlete's own time zone. */
export function presentRosterRow(a: AthleteWithPeople, figures: RosterFigures, now: Date): RosterRow {
  return {
    athleteId: a.id,
    name: a.user.name,
    email: a.user.email,
    status: a.status,
    goal: a.goal,
    eventType: a.eventType,
    eventName: a.eventName,
    eventDate: a.eventDate,
    daysToEvent: daysToEvent(a.eventDate, a.user.timeZone, now),
    division: a.division,
    coach: { id: a.coach.id, name: a.coach.name },
    figures,
  };
}

/** Soonest event first, athletes without an event last, then by name. */
export function compareRosterRows(x: RosterRow, y: RosterRow): number {
  if (x.daysToEvent !== y.daysToEvent) {
    if (x.daysToEvent === null) return 1;
    if (y.daysToEvent === null) return -1;
    return x.daysToEvent - y.daysToEvent;
  }
  return (
    x.name.localeCompare(y.name, 'en', { sensitivity: 'base' }) || x.athleteId.localeCompare(y.athleteId)
  );
}
