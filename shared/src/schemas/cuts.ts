import { z } from 'zod';
import { LIMITS } from '../limits.js';
import { CUT_PATHS, WEIGH_IN_TIMINGS } from '../rules/weight-cut.js';
import { clockTime, isoDate, text } from './common.js';
import { limitGapView } from './trends.js';

const kg = (what: string) =>
  z
    .number({ error: `${what} is required` })
    .finite()
    .min(LIMITS.weightKg.min, `${what} must be at least ${LIMITS.weightKg.min} kg`)
    .max(LIMITS.weightKg.max, `${what} must be at most ${LIMITS.weightKg.max} kg`);

export const WEIGH_IN_TIMING_LABELS: Record<(typeof WEIGH_IN_TIMINGS)[number], string> = {
  day_before: 'Day before',
  same_day: 'Same day',
};
export const CUT_PATH_LABELS: Record<(typeof CUT_PATHS)[number], string> = {
  linear: 'Equal kg each week',
  rate: 'Equal % each week',
};

/** PUT /api/athletes/:athleteId/weigh-in: the weigh-in's record (the event must be a weigh-in). */
export const weighInEventRequest = z
  .object({
    /** The class limit, kg. */
    weighInLimitKg: kg('Weigh-in limit'),
    /** Weigh-in the day before the competition, or the same day. */
    weighInTiming: z.enum(WEIGH_IN_TIMINGS, { error: 'Choose day before or same day' }),
    /** Weigh-in clock time, HH:MM on the venue's clock (the event date is the weigh-in date). */
    weighInTime: clockTime,
    /** Competition clock time, HH:MM on the venue's clock. */
    competitionTime: clockTime,
    /** The athlete's usual weight outside a cut, kg. */
    usualWeightKg: kg('Usual weight').nullable(),
    /** The next class's limit below, kg; null when there is none. */
    classBelowKg: kg('Class below').nullable(),
    /** The next class's limit above, kg; null when there is none. */
    classAboveKg: kg('Class above').nullable(),
  })
  .superRefine(
    (v, ctx) => {
      const limit = v.weighInLimitKg;
      if (typeof limit !== 'number') return;
      if (typeof v.classBelowKg === 'number' && v.classBelowKg >= limit)
        ctx.addIssue({ code: 'custom', path: ['classBelowKg'], message: 'Must be below the limit' });
      if (typeof v.classAboveKg === 'number' && v.classAboveKg <= limit)
        ctx.addIssue({ code: 'custom', path: ['classAboveKg'], message: 'Must be above the limit' });
      if (
        v.weighInTiming === 'same_day' &&
        typeof v.weighInTime === 'string' &&
        typeof v.competitionTime === 'string' &&
        v.competitionTime <= v.weighInTime
      )
        ctx.addIssue({
          code: 'custom',
          path: ['competitionTime'],
          message: 'On the same day the competition must start after the weigh-in',
        });
    },
    { when: () => true },
  );
export type WeighInEventRequest = z.infer<typeof weighInEventRequest>;

/** POST /api/athletes/:athleteId/cut-plans: a cut plan the coach built with the athlete. */
export const createCutPlanRequest = z.object({
  /** First day of the chronic part (the athlete's date). */
  startDate: isoDate,
  /** Weight on the start day, kg. */
  startKg: kg('Start weight'),
  /** Weight planned when the acute days begin, kg. */
  preAcuteKg: kg('Weight before the last days'),
  /** Days of acute loss before the weigh-in (gut content, sodium, water). */
  acuteDays: z
    .number({ error: 'Days are required' })
    .int('Whole days')
    .min(LIMITS.cutAcuteDays.min, `At least ${LIMITS.cutAcuteDays.min}`)
    .max(LIMITS.cutAcuteDays.max, `At most ${LIMITS.cutAcuteDays.max}`),
  /** How the chronic part runs: equal kg or equal % each week. */
  path: z.enum(CUT_PATHS, { error: 'Choose how the weight comes down' }),
  /** What the acute part consists of, in words. */
  notes: text('Notes', LIMITS.cutNotes).nullable(),
  /** Warning keys the coach has read with the athlete and accepts; each current one must be listed. */
  acknowledgedKeys: z.array(text('Warning key', LIMITS.warningKey)).max(20).default([]),
  /**
   * A practice run: the date of the practice weigh-in (before the real one), which the plan aims at
   * instead of the event's; null for the cut for the event itself.
   */
  practiceWeighInDate: isoDate.nullable().default(null),
});
export type CreateCutPlanRequest = z.infer<typeof createCutPlanRequest>;

/** PUT /api/team/cut-settings: the team's acute-share threshold. */
export const cutSettingsRequest = z.object({
  /** Acute share above which a cut plan carries a strong warning, % of body mass (default 5). */
  acuteSharePct: z
    .number({ error: 'Threshold is required' })
    .finite()
    .min(LIMITS.acuteSharePct.min, `At least ${LIMITS.acuteSharePct.min} %`)
    .max(LIMITS.acuteSharePct.max, `At most ${LIMITS.acuteSharePct.max} %`),
});
export type CutSettingsRequest = z.infer<typeof cutSettingsRequest>;

/** GET and PUT /api/team/cut-settings: the team's threshold with the default and the sources. */
export const cutSettingsView = z.object({
  /** The team's threshold in force, % of body mass. */
  acuteSharePct: z.number(),
  /** The default when the team has set none, % (Barley et al. 2018). */
  defaultPct: z.number(),
  /** Where the default comes from. */
  source: z.string(),
  /** Above this the plan needs a second acknowledgement, % (common practice, no source). */
  severePct: z.number(),
  /** What the severe line means, in words. */
  severeMeaning: z.string(),
  /** Where the severe line comes from. */
  severeSource: z.string(),
});
export type CutSettingsView = z.infer<typeof cutSettingsView>;

const severity = z.enum(['none', 'warning', 'strong', 'severe']);

/** A cut-plan warning as the server words it. */
export const cutWarningView = z.object({
  /** `acute_share` | `acute_share_severe` | `chronic_rate`. */
  key: z.string(),
  /** warning; strong (acknowledge once); severe (the second acknowledgement, with the stop signs). */
  severity: z.enum(['warning', 'strong', 'severe']),
  message: z.string(),
  source: z.string(),
  /** The signs to stop and seek care (severe only), else null. */
  stopSigns: z.string().nullable(),
  /** Whether the plan must carry an acknowledgement of it. */
  needsAcknowledgement: z.boolean(),
});
export type CutWarningView = z.infer<typeof cutWarningView>;

/** The weigh-in's record with its recovery window. */
export const weighInEventView = z.object({
  date: z.string(),
  limitKg: z.number(),
  timing: z.enum(WEIGH_IN_TIMINGS).nullable(),
  weighInTime: z.string().nullable(),
  competitionDate: z.string().nullable(),
  competitionTime: z.string().nullable(),
  timeZone: z.string().nullable(),
  /** Hours from weigh-in to competition; null until both clock times and the zone are known. */
  recoveryWindowHours: z.number().nullable(),
  usualWeightKg: z.number().nullable(),
  classBelowKg: z.number().nullable(),
  classAboveKg: z.number().nullable(),
});
export type WeighInEventView = z.infer<typeof weighInEventView>;

export const cutPlanView = z.object({
  id: z.string(),
  /** A practice run: `weighInDate` is its practice weigh-in. */
  rehearsal: z.boolean(),
  /** The weigh-in the plan aims at (the event's, or the practice one). */
  weighInDate: z.string(),
  startDate: z.string(),
  startKg: z.number(),
  preAcuteKg: z.number(),
  preAcuteDate: z.string(),
  acuteDays: z.number().int(),
  path: z.enum(CUT_PATHS),
  notes: z.string().nullable(),
  createdAt: z.string(),
  createdBy: z.object({ id: z.string(), name: z.string() }),
  acknowledgements: z.array(
    z.object({ key: z.string(), message: z.string(), acknowledgedAt: z.string(), by: z.string() }),
  ),
});
export type CutPlanView = z.infer<typeof cutPlanView>;

/** The plan's figures for the athlete's today, computed by the server. */
export const cutFiguresView = z.object({
  today: z.string(),
  /** Weight needed today to stay on the plan, kg; and where in the plan today falls. */
  todayKg: z.number(),
  stage: z.enum(['before', 'chronic', 'acute', 'after']),
  chronic: z
    .object({ kgPerWeek: z.number(), pctPerWeek: z.number(), severity: severity.exclude(['severe']) })
    .nullable(),
  acute: z.object({ kg: z.number(), pct: z.number(), severity: z.enum(['none', 'strong', 'severe']) }),
  thresholdPct: z.number(),
  warnings: z.array(cutWarningView),
  /** Above 7 %: the athlete sees the stop-and-seek-care signs. */
  stopSigns: z.string().nullable(),
});
export type CutFiguresView = z.infer<typeof cutFiguresView>;

/**
 * One item of the recovery checklist. Its client id is the server's, fixed for the athlete, the
 * weigh-in date and the item, so a double tap (or a second device) returns the first entry
 * instead of logging twice; the item is done while an entry with that client id exists.
 */
export const recoveryItemView = z.object({
  /** The client id to log this item's entry with. */
  clientId: z.string(),
  /** The entry logged for it (delete it by id to untick); null while not ticked. */
  logged: z.object({ entryId: z.string(), date: z.string(), time: z.string() }).nullable(),
});
export type RecoveryItemView = z.infer<typeof recoveryItemView>;

/** The recovery targets for the window after the weigh-in (rules/weight-cut.ts recoveryTargets). */
export const recoveryView = z.object({
  /** kg lost at the scale: the weight before the last days (the plan's, else the usual) minus the limit. */
  kgLost: z.number(),
  /** Which weight the loss is counted from. */
  basis: z.enum(['plan', 'usual']),
  windowHours: z.number(),
  fluidL: z.number(),
  carbohydrateG: z.object({ min: z.number(), max: z.number() }),
  /** The timed checklist, on the athlete's clock. */
  slots: z.array(
    z.object({
      date: z.string(),
      time: z.string(),
      fluidL: z.number(),
      carbohydrateG: z.object({ min: z.number(), max: z.number() }),
      /** Ticking it logs a fluid entry of `volumeMl` with `sodiumMg` through POST …/days/:date/fluids with `clientId`. */
      fluid: recoveryItemView.extend({ volumeMl: z.number(), sodiumMg: z.number() }),
      /** Ticking it logs a meal of `carbohydrateG` (macros) through POST …/days/:date/meals with `clientId`. */
      carbohydrate: recoveryItemView.extend({ carbohydrateG: z.number(), mealName: z.string() }),
    }),
  ),
  source: z.string(),
});
export type RecoveryView = z.infer<typeof recoveryView>;

/** PUT /api/athletes/:athleteId/cut-plans/:cutPlanId/note: what was done on one rehearsal day. */
export const rehearsalNoteRequest = z.object({
  /** The rehearsal day (the athlete's date), from the start of its acute part to the last regain morning. */
  date: isoDate,
  /** What was done that day, in the writer's words; null or empty removes the note. */
  note: text('Note', LIMITS.rehearsalNote).nullable(),
});
export type RehearsalNoteRequest = z.infer<typeof rehearsalNoteRequest>;

/** A practice run's record (rules/weight-cut.ts rehearsalFigures), computed by the server. */
export const rehearsalView = z.object({
  planId: z.string(),
  /** The practice weigh-in date. */
  weighInDate: z.string(),
  /** First day of the acute part (its morning weight is the starting point). */
  preAcuteDate: z.string(),
  limitKg: z.number(),
  /** What the plan set for the last days: kg and % of the pre-acute weight, the days, the steps. */
  planned: z.object({
    acuteKg: z.number(),
    acutePct: z.number(),
    acuteDays: z.number().int(),
    steps: z.string().nullable(),
  }),
  days: z.array(
    z.object({
      date: z.string(),
      stage: z.enum(['start', 'acute', 'weigh_in', 'after']),
      /** That morning's scale weight, kg. */
      kg: z.number().nullable(),
      /** Lost since the day before, kg and % of that weight. */
      lostKg: z.number().nullable(),
      lostPct: z.number().nullable(),
      /** What was done that day, written by the coach or the athlete. */
      note: z.object({ text: z.string(), by: z.string(), at: z.string() }).nullable(),
      /** Symptom reports that day. */
      symptoms: z.array(z.object({ time: z.string(), labels: z.array(z.string()), urgent: z.boolean() })),
    }),
  ),
  /** Start morning to the practice weigh-in; null without both weights. */
  achieved: z.object({ fromKg: z.number(), toKg: z.number(), kg: z.number(), pct: z.number() }).nullable(),
  /** The athlete's today is one of the rehearsal's days: it is under way, and Today shows it. */
  underWay: z.boolean(),
  /** Back on by each morning after: kg, % of the weigh-in weight, share of the loss. */
  regained: z.array(
    z.object({ date: z.string(), kg: z.number(), pct: z.number(), shareOfLossPct: z.number().nullable() }),
  ),
});
export type RehearsalView = z.infer<typeof rehearsalView>;

/** GET /api/athletes/:athleteId/cut */
export const cutView = z.object({
  athleteId: z.string(),
  /** Null when the athlete's event is not a weigh-in. */
  weighIn: weighInEventView.nullable(),
  /** Null without enough weigh-ins for a projection (7 in the last 14 days) or no weigh-in ahead. */
  gap: limitGapView.nullable(),
  plan: cutPlanView.nullable(),
  figures: cutFiguresView.nullable(),
  thresholdPct: z.number(),
  /** From the weigh-in day to the competition: the recovery checklist; null on other days. */
  recovery: recoveryView.nullable(),
  /** The latest practice run's record, shown beside the plan; null without one. */
  rehearsal: rehearsalView.nullable(),
  /** The evidence and the deferral every cut screen shows. */
  caution: z.string(),
});
export type CutView = z.infer<typeof cutView>;
