import { z } from 'zod';
import { LIMITS } from '../limits.js';
import { VOLUME_UNITS, WEIGHT_UNITS } from '../units.js';
import { EVENT_TYPES } from '../vocabulary.js';
import { clockTime, isoDate, text, timeZone } from './common.js';
import { rosterFigures } from './trends.js';

export const SEXES = ['female', 'male'] as const;
export const GOALS = ['lose', 'maintain', 'gain'] as const;
export const ATHLETE_STATUSES = ['intake_pending', 'active', 'ended'] as const;

export const GOAL_LABELS: Record<(typeof GOALS)[number], string> = {
  lose: 'Lose fat',
  maintain: 'Hold steady',
  gain: 'Gain / regain',
};

const inRange = (min: number, max: number, what: string, unit: string) =>
  z
    .number({ error: `${what} is required` })
    .finite()
    .min(min, `${what} must be at least ${min} ${unit}`)
    .max(max, `${what} must be at most ${max} ${unit}`);

/** Whole years between a birth date and a reference date (both YYYY-MM-DD). */
export function ageOn(birthDate: string, onDate: string): number {
  const [by, bm, bd] = birthDate.split('-').map(Number) as [number, number, number];
  const [oy, om, od] = onDate.split('-').map(Number) as [number, number, number];
  return oy - by - (om < bm || (om === bm && od < bd) ? 1 : 0);
}

/** The intake's fields, before the cross-field rules (intakeRequestOn). */
const intakeFields = z.object({
  /** Sex, for energy and body-composition equations. */
  sex: z.enum(SEXES, { error: 'Choose one' }),
  /** Birth date, YYYY-MM-DD. */
  birthDate: isoDate,
  /** Standing height, cm. */
  heightCm: inRange(LIMITS.heightCm.min, LIMITS.heightCm.max, 'Height', 'cm'),
  /** Body weight today, kg: the plan's weight until the first weigh-in. */
  currentWeightKg: inRange(LIMITS.weightKg.min, LIMITS.weightKg.max, 'Current weight', 'kg'),
  /** Usual daily fluid intake, mL. */
  usualWaterMl: inRange(LIMITS.usualWaterMl.min, LIMITS.usualWaterMl.max, 'Usual water', 'mL'),
  /** Usual daily energy intake, kcal. */
  usualEnergyKcal: inRange(LIMITS.usualEnergyKcal.min, LIMITS.usualEnergyKcal.max, 'Usual energy', 'kcal'),
  /** Direction of the body-weight goal. */
  goal: z.enum(GOALS, { error: 'Choose a goal' }),
  /** The dated event being prepared for. */
  eventType: z.enum(EVENT_TYPES, { error: 'Choose an event type' }),
  /** The event's name (e.g. "Regional classic"); optional. */
  eventName: text('Event name', LIMITS.eventName).optional(),
  /** Event date in the event's time zone; required unless there is no event. */
  eventDate: isoDate.optional(),
  /** Event clock time (or weigh-in time), HH:MM in the event's time zone. */
  eventTime: clockTime.optional(),
  /** The event's own time zone. */
  eventTimeZone: timeZone.optional(),
  /** Division (shows) or weight class (weigh-ins). */
  division: text('Division', LIMITS.division).optional(),
  /** Weigh-in limit for the class, kg. */
  weighInLimitKg: inRange(LIMITS.weightKg.min, LIMITS.weightKg.max, 'Weigh-in limit', 'kg').optional(),
  /** The athlete's own time zone: decides which date a log belongs to. */
  timeZone,
  /** Units the athlete reads and types in. */
  weightUnit: z.enum(WEIGHT_UNITS, { error: 'Choose kg or lb' }),
  volumeUnit: z.enum(VOLUME_UNITS, { error: 'Choose mL or fl oz' }),
  /** Agreement to store condition photos. */
  photoConsent: z.boolean({ error: 'Choose yes or no' }),
  /** Must be true: not medical advice, medical clearance held. */
  safetyAcknowledged: z.literal(true, { error: 'Please read and tick this to continue' }),
});

/**
 * PUT /api/athletes/:athleteId/intake: the athlete's intake form, all quantities in SI, checked as
 * of `today` (YYYY-MM-DD: the server's clock on the server, the device's date in the form), which
 * the age limits are counted to.
 */
export const intakeRequestOn = (today: string) =>
  intakeFields.superRefine(
    (v, ctx) => {
      if (v.eventType !== 'none') {
        if (!v.eventDate)
          ctx.addIssue({ code: 'custom', path: ['eventDate'], message: 'Event date is required' });
        if (!v.eventTimeZone)
          ctx.addIssue({ code: 'custom', path: ['eventTimeZone'], message: 'Event time zone is required' });
      }
      if (v.eventType === 'weigh_in' && v.weighInLimitKg === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['weighInLimitKg'],
          message: 'Weigh-in limit is required for a weigh-in',
        });
      }
      if (typeof v.birthDate === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(v.birthDate)) {
        const age = ageOn(v.birthDate, today);
        if (age < LIMITS.ageYears.min || age > LIMITS.ageYears.max) {
          ctx.addIssue({
            code: 'custom',
            path: ['birthDate'],
            message: `Age must be between ${LIMITS.ageYears.min} and ${LIMITS.ageYears.max}`,
          });
        }
      }
    },
    // Run the cross-field rules even while other fields are still invalid, so a form shows every
    // problem in one round (zod otherwise skips object refinements after any field error).
    { when: () => true },
  );
export type IntakeRequest = z.infer<ReturnType<typeof intakeRequestOn>>;

/** An athlete's profile as the API returns it. */
/** The plan's countdown counts back from another day than the event (until the coach resolves it). */
export const countdownMismatchView = z.object({
  /** The event day the latest plan version's countdown counts back from. */
  countdownEventDate: z.string(),
  /** The athlete's event date. */
  eventDate: z.string(),
});
export type CountdownMismatch = z.infer<typeof countdownMismatchView>;

export const athleteProfile = z.object({
  id: z.uuid(),
  userId: z.uuid(),
  name: z.string(),
  email: z.string(),
  status: z.enum(ATHLETE_STATUSES),
  coach: z.object({ id: z.uuid(), name: z.string() }),
  sex: z.enum(SEXES).nullable(),
  birthDate: z.string().nullable(),
  heightCm: z.number().nullable(),
  /** The weight given at intake, kg (the plan's weight until the first weigh-in). */
  intakeWeightKg: z.number().nullable(),
  usualWaterMl: z.number().nullable(),
  usualEnergyKcal: z.number().nullable(),
  goal: z.enum(GOALS).nullable(),
  eventType: z.enum(EVENT_TYPES).nullable(),
  eventName: z.string().nullable(),
  eventDate: z.string().nullable(),
  eventTime: z.string().nullable(),
  eventTimeZone: z.string().nullable(),
  division: z.string().nullable(),
  weighInLimitKg: z.number().nullable(),
  timeZone: z.string(),
  /** The units the athlete types in (values are always stored in SI). */
  units: z.object({ weight: z.enum(WEIGHT_UNITS), volume: z.enum(VOLUME_UNITS) }),
  photoConsent: z.boolean(),
  intakeCompletedAt: z.string().nullable(),
  /** Set while the plan's countdown aims at another day than `eventDate`; computed by the server. */
  countdownMismatch: countdownMismatchView.nullable(),
});
export type AthleteProfile = z.infer<typeof athleteProfile>;

/** GET /api/roster: one row per athlete the signed-in coach may see. */
export const rosterRow = z.object({
  athleteId: z.uuid(),
  name: z.string(),
  email: z.string(),
  status: z.enum(ATHLETE_STATUSES),
  goal: z.enum(GOALS).nullable(),
  eventType: z.enum(EVENT_TYPES).nullable(),
  eventName: z.string().nullable(),
  eventDate: z.string().nullable(),
  /** Whole days from today (athlete's time zone) to the event date; null without an event. */
  daysToEvent: z.number().int().nullable(),
  division: z.string().nullable(),
  coach: z.object({ id: z.uuid(), name: z.string() }),
  /** Computed figures (trend, rate, adherence, flags): see rosterFigures in trends.ts. */
  figures: rosterFigures,
});
export type RosterRow = z.infer<typeof rosterRow>;

/** POST /api/athletes/:athleteId/shares: share an athlete with an assistant coach. */
export const shareAthleteRequest = z.object({
  /** The assistant's user id. */
  userId: z.uuid({ error: 'Choose an assistant' }),
});
export type ShareAthleteRequest = z.infer<typeof shareAthleteRequest>;
