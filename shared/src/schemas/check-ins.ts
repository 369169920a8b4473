import { z } from 'zod';
import { LIMITS } from '../limits.js';
import { SYMPTOMS } from '../symptoms.js';
import { VOLUME_UNITS, WEIGHT_UNITS, volumeToMl, weightToKg } from '../units.js';
import { clockTime, isoDate, text, uuid } from './common.js';

/** Noise the athlete can tag a morning weigh-in with. */
export const WEIGH_IN_TAGS = [
  'salty_meal',
  'high_carb_meal',
  'travel',
  'poor_sleep',
  'bowel_change',
  'cycle_phase',
] as const;
export type WeighInTag = (typeof WEIGH_IN_TAGS)[number];
export const WEIGH_IN_TAG_LABELS: Record<WeighInTag, string> = {
  salty_meal: 'Salty meal yesterday',
  high_carb_meal: 'High-carbohydrate meal yesterday',
  travel: 'Travel',
  poor_sleep: 'Poor sleep',
  bowel_change: 'Bowel change',
  cycle_phase: 'Cycle phase',
};
export const CYCLE_PHASES = ['menstrual', 'follicular', 'ovulation', 'luteal'] as const;

export const FLUID_KINDS = ['water', 'coffee_tea', 'other'] as const;
export const FLUID_KIND_LABELS: Record<(typeof FLUID_KINDS)[number], string> = {
  water: 'Water',
  coffee_tea: 'Coffee or tea',
  other: 'Other',
};

export const RATING_KEYS = ['energy', 'hunger', 'mood', 'sleepQuality', 'digestion', 'stress'] as const;
export type RatingKey = (typeof RATING_KEYS)[number];
export const RATING_LABELS: Record<RatingKey, string> = {
  energy: 'Energy',
  hunger: 'Hunger',
  mood: 'Mood',
  sleepQuality: 'Sleep quality',
  digestion: 'Digestion',
  stress: 'Stress',
};

const range = (min: number, max: number, what: string, unit = '') =>
  z
    .number({ error: `${what} is required` })
    .finite(`${what} must be a number`)
    .min(min, `${what} must be at least ${min}${unit}`)
    .max(max, `${what} must be at most ${max}${unit}`);

/** Every created entry carries a client-generated id: a retry with the same id returns the first result. */
const clientId = uuid;

/** PUT /api/athletes/:athleteId/days/:date/weigh-in (one per day; a repeat replaces it). */
export const weighInRequest = z
  .object({
    /** Weight as typed, in `unit`. */
    weight: z.number({ error: 'Weight is required' }).finite('Weight must be a number'),
    /** The unit the weight was typed in; stored in kg, the typed value kept for an exact echo. */
    unit: z.enum(WEIGHT_UNITS, { error: 'Choose kg or lb' }),
    /** Clock time of the weigh-in, HH:MM in the athlete's time zone. */
    time: clockTime,
    /** After waking and voiding, before food and drink. */
    protocolConfirmed: z.literal(true, {
      error: 'Confirm the weigh-in was after waking and voiding, before food and drink',
    }),
    /** Known sources of noise. */
    tags: z.array(z.enum(WEIGH_IN_TAGS)).max(WEIGH_IN_TAGS.length).default([]),
    /** Only when the athlete tracks their cycle. */
    cyclePhase: z.enum(CYCLE_PHASES).nullable().optional(),
  })
  .superRefine(
    (v, ctx) => {
      if (typeof v.weight !== 'number' || !Number.isFinite(v.weight)) return;
      const kg = weightToKg(v.weight, v.unit === 'lb' ? 'lb' : 'kg');
      const { min, max } = LIMITS.weightKg;
      if (!(kg >= min && kg <= max)) {
        const lo = v.unit === 'kg' ? `${min} kg` : `${(min / 0.45359237).toFixed(1)} lb`;
        const hi = v.unit === 'kg' ? `${max} kg` : `${(max / 0.45359237).toFixed(1)} lb`;
        ctx.addIssue({ code: 'custom', path: ['weight'], message: `Weight must be between ${lo} and ${hi}` });
      }
    },
    // Check the range even while another field (say the protocol tick) is still missing.
    { when: () => true },
  );
export type WeighInRequest = z.infer<typeof weighInRequest>;

/** POST /api/athletes/:athleteId/days/:date/fluids ; PATCH …/fluids/:entryId takes the same fields less clientId. */
export const fluidEntryRequest = z
  .object({
    /** Client-generated id (idempotency). */
    clientId,
    /** Clock time drunk, HH:MM. */
    time: clockTime,
    /** Volume as typed, in `unit`. */
    volume: z.number({ error: 'Volume is required' }).finite('Volume must be a number'),
    /** ml or floz. */
    unit: z.enum(VOLUME_UNITS, { error: 'Choose mL or fl oz' }),
    /** water, coffee_tea or other. */
    kind: z.enum(FLUID_KINDS, { error: 'Choose a kind' }),
    /** Sodium the drink carried, mg (optional; a recovery drink logs it). */
    sodiumMg: range(LIMITS.fluidSodiumMg.min, LIMITS.fluidSodiumMg.max, 'Sodium', ' mg')
      .nullable()
      .optional(),
  })
  .superRefine((v, ctx) => {
    const ml = volumeToMl(v.volume, v.unit);
    const { min, max } = LIMITS.fluidEntryMl;
    if (!(ml >= min && ml <= max)) {
      const hi = v.unit === 'ml' ? `${max} mL` : `${(max / 29.5735295625).toFixed(0)} fl oz`;
      ctx.addIssue({
        code: 'custom',
        path: ['volume'],
        message: ml <= 0 ? 'Volume must be more than zero' : `One entry can hold at most ${hi}`,
      });
    }
  });
export type FluidEntryRequest = z.infer<typeof fluidEntryRequest>;

const macroFields = {
  /** Grams of protein. */
  proteinG: range(LIMITS.mealProteinG.min, LIMITS.mealProteinG.max, 'Protein', ' g'),
  /** Grams of available carbohydrate. */
  carbohydrateG: range(LIMITS.mealCarbohydrateG.min, LIMITS.mealCarbohydrateG.max, 'Carbohydrate', ' g'),
  /** Grams of fat. */
  fatG: range(LIMITS.mealFatG.min, LIMITS.mealFatG.max, 'Fat', ' g'),
  /** Grams of fibre (optional; no energy counted). */
  fibreG: range(LIMITS.mealFibreG.min, LIMITS.mealFibreG.max, 'Fibre', ' g').nullable().optional(),
  /** Grams of alcohol (optional; 7 kcal/g). */
  alcoholG: range(LIMITS.mealAlcoholG.min, LIMITS.mealAlcoholG.max, 'Alcohol', ' g').nullable().optional(),
  /** Sodium, mg (optional; from the label). */
  sodiumMg: range(LIMITS.mealSodiumMg.min, LIMITS.mealSodiumMg.max, 'Sodium', ' mg').nullable().optional(),
};

/**
 * A food from the food list: a team food (uuid), a reference food (`ifct:<code>`) or one of our
 * everyday foods (`dm:<slug>`).
 */
export const foodRef = z
  .string({ error: 'Choose a food' })
  .regex(
    /^(ifct:[A-Z]\d{3}|dm:[a-z0-9][a-z0-9-]{0,59}|[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})$/i,
    'Choose a food from the list',
  );

/** One food of a meal: grams eaten, or a number of the food's portions. */
export const mealItemRequest = z
  .object({
    /** The food's id from GET /api/foods. */
    foodId: foodRef,
    /** Grams eaten (leave out when giving portions). */
    quantityG: range(LIMITS.foodQuantityG.min, LIMITS.foodQuantityG.max, 'Quantity', ' g')
      .nullable()
      .optional(),
    /** How many portions ("2" slices); with `portionUnit`, instead of grams. */
    portions: range(LIMITS.portionCount.min, LIMITS.portionCount.max, 'Portions').nullable().optional(),
    /** One of the food's portion units from GET /api/foods ("slice", "scoop", "cup", "large"). */
    portionUnit: z
      .string({ error: 'Choose a portion' })
      .regex(/^[a-z][a-z0-9-]{0,31}$/, 'Choose a portion from the list')
      .nullable()
      .optional(),
  })
  .superRefine((v, ctx) => {
    const grams = typeof v.quantityG === 'number';
    const portions = typeof v.portions === 'number';
    if (grams && portions) {
      ctx.addIssue({ code: 'custom', path: ['portions'], message: 'Give grams or portions, not both' });
    } else if (!grams && !portions) {
      ctx.addIssue({ code: 'custom', path: ['quantityG'], message: 'Give grams or a number of portions' });
    } else if (portions && !v.portionUnit) {
      ctx.addIssue({ code: 'custom', path: ['portionUnit'], message: 'Choose a portion' });
    }
  });
export type MealItemRequest = z.infer<typeof mealItemRequest>;

const mealBase = {
  /** Client-generated id (idempotency). */
  clientId,
  /** Clock time eaten, HH:MM. */
  time: clockTime,
  /** What the athlete calls the meal ("Breakfast", "Post-training"). */
  name: text('Name', LIMITS.mealName),
};

/** The foods of a meal, 1 to 20. */
export const mealItems = z
  .array(mealItemRequest, { error: 'Add the foods of the meal' })
  .min(LIMITS.mealItems.min, 'Add at least one food')
  .max(LIMITS.mealItems.max, `At most ${LIMITS.mealItems.max} foods in one meal`);

/** POST /api/athletes/:athleteId/days/:date/meals: grams of macros, or foods from the list. */
export const mealEntryRequest = z.discriminatedUnion('source', [
  z.object({ ...mealBase, source: z.literal('macros'), ...macroFields }),
  z.object({
    ...mealBase,
    source: z.literal('foods'),
    /** The foods eaten, each with grams or portions; the server works out the nutrients as eaten. */
    items: mealItems,
  }),
]);
export type MealEntryRequest = z.infer<typeof mealEntryRequest>;

/** POST /api/athletes/:athleteId/days/:date/supplements: a supplement taken. */
export const supplementEntryRequest = z.object({
  /** Client-generated id (idempotency). */
  clientId,
  /** Clock time taken, HH:MM. */
  time: clockTime,
  /** Item name ("Creatine monohydrate"). */
  name: text('Name', LIMITS.supplementName),
  /** Dose amount (optional). */
  dose: range(LIMITS.supplementDose.min, LIMITS.supplementDose.max, 'Dose').nullable().optional(),
  /** Dose unit ("g", "mg", "capsule"). */
  doseUnit: text('Dose unit', LIMITS.supplementUnit).nullable().optional(),
  /** The schedule item this ticks, once plans exist. */
  scheduleItemId: uuid.nullable().optional(),
});
export type SupplementEntryRequest = z.infer<typeof supplementEntryRequest>;

/** PUT /api/athletes/:athleteId/days/:date/evening: one per day, any subset. */
export const eveningRequest = z.object({
  /** Steps for the day. */
  steps: range(LIMITS.steps.min, LIMITS.steps.max, 'Steps')
    .int('Steps must be a whole number')
    .nullable()
    .optional(),
  /** Hours slept last night. */
  sleepHours: range(LIMITS.sleepHours.min, LIMITS.sleepHours.max, 'Sleep', ' h').nullable().optional(),
  /** Minutes of cardio. */
  cardioMinutes: range(LIMITS.cardioMinutes.min, LIMITS.cardioMinutes.max, 'Cardio', ' min')
    .nullable()
    .optional(),
  /** Whether the planned training was done. */
  trainingDone: z.boolean().nullable().optional(),
  /** A word on the training ("legs", "rest"). */
  trainingNote: text('Training note', LIMITS.trainingNote).nullable().optional(),
  /** Ratings 1–5. */
  ratings: z
    .object(
      Object.fromEntries(
        RATING_KEYS.map((k) => [
          k,
          z
            .number()
            .int('Use a whole number from 1 to 5')
            .min(LIMITS.rating.min, 'Use 1 to 5')
            .max(LIMITS.rating.max, 'Use 1 to 5')
            .nullable()
            .optional(),
        ]),
      ) as Record<RatingKey, z.ZodOptional<z.ZodNullable<z.ZodNumber>>>,
    )
    .default({}),
  /** Free note for the coach. */
  note: text('Note', LIMITS.note).nullable().optional(),
});
export type EveningRequest = z.infer<typeof eveningRequest>;

/** POST /api/athletes/:athleteId/days/:date/symptoms */
export const symptomReportRequest = z.object({
  /** Client-generated id (idempotency). */
  clientId,
  /** Clock time noticed, HH:MM. */
  time: clockTime,
  /** One or more symptoms. */
  symptoms: z
    .array(z.enum(SYMPTOMS, { error: 'Unknown symptom' }))
    .min(1, 'Choose at least one symptom')
    .max(SYMPTOMS.length),
  /** Anything else the coach should know. */
  note: text('Note', LIMITS.note).nullable().optional(),
});
export type SymptomReportRequest = z.infer<typeof symptomReportRequest>;

/** POST /api/foods (staff): a team food, nutrients per 100 g. */
export const createFoodRequest = z.object({
  /** Name shown in search. */
  name: text('Name', LIMITS.foodName),
  /** Grams per 100 g. */
  proteinG: range(LIMITS.per100gMacroG.min, LIMITS.per100gMacroG.max, 'Protein', ' g'),
  carbohydrateG: range(LIMITS.per100gMacroG.min, LIMITS.per100gMacroG.max, 'Carbohydrate', ' g'),
  fatG: range(LIMITS.per100gMacroG.min, LIMITS.per100gMacroG.max, 'Fat', ' g'),
  fibreG: range(LIMITS.per100gMacroG.min, LIMITS.per100gMacroG.max, 'Fibre', ' g').nullable().optional(),
  alcoholG: range(LIMITS.per100gMacroG.min, LIMITS.per100gMacroG.max, 'Alcohol', ' g').nullable().optional(),
  /** Milligrams of sodium per 100 g. */
  sodiumMg: range(LIMITS.per100gSodiumMg.min, LIMITS.per100gSodiumMg.max, 'Sodium', ' mg')
    .nullable()
    .optional(),
});
export type CreateFoodRequest = z.infer<typeof createFoodRequest>;

/** Query of GET /api/athletes/:athleteId/days (history) */
export const dayRangeQuery = z.object({ from: isoDate, to: isoDate });

/** Photo upload fields (multipart, beside the files). */
export const photoUploadFields = z.object({
  /** The day the photos belong to (athlete's local date). */
  date: isoDate,
  /** A pose from the team's list (GET /api/team/poses). */
  pose: text('Pose', LIMITS.poseName, 'Choose a pose'),
});

/** PUT /api/team/poses (owner or coach): the team's pose list beyond the three relaxed poses. */
export const posesRequest = z.object({
  poses: z
    .array(text('Pose', LIMITS.poseName))
    .max(LIMITS.posesPerTeam, `At most ${LIMITS.posesPerTeam} poses`),
});
/** Poses every team has. */
export const RELAXED_POSES = ['Front relaxed', 'Side relaxed', 'Back relaxed'] as const;
export type PhotoUploadFields = z.infer<typeof photoUploadFields>;
export type PosesRequest = z.infer<typeof posesRequest>;
