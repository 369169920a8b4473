import { z } from 'zod';
import {
  BODY_COMPOSITION_METHODS,
  DENSITY_EQUATIONS,
  SKINFOLD_SITES,
  type SkinfoldSite,
} from '../body-composition.js';
import { LIMITS } from '../limits.js';
import { isoDate, text, uuid } from './common.js';

const length = (limits: { min: number; max: number }, what: string, unit: string) =>
  z
    .number({ error: `${what} must be a number` })
    .finite()
    .min(limits.min, `${what} must be at least ${limits.min} ${unit}`)
    .max(limits.max, `${what} must be at most ${limits.max} ${unit}`);

const skinfold = length(LIMITS.skinfoldMm, 'Skinfold', 'mm');

/**
 * POST /api/athletes/:athleteId/body-measurements: one measurement session. Which sites or lengths
 * a method needs depends on the athlete's sex, so the server checks that (estimateBodyFat) and
 * names each missing field.
 */
export const createBodyMeasurementRequest = z.object({
  /** The athlete's local date the measurement was taken on, YYYY-MM-DD (not after today). */
  date: isoDate,
  /** Skinfolds (3 or 7 Jackson–Pollock sites) or circumferences (US Navy). */
  method: z.enum(BODY_COMPOSITION_METHODS, { error: 'Choose a method' }),
  /** Density → % fat conversion for skinfolds; circumferences give % fat directly. */
  densityEquation: z.enum(DENSITY_EQUATIONS, { error: 'Choose Siri or Brozek' }).default('siri'),
  /** Skinfold thicknesses by site, mm; only the method's sites count. */
  skinfoldsMm: z
    .object(
      Object.fromEntries(SKINFOLD_SITES.map((s) => [s, skinfold.optional()])) as Record<
        SkinfoldSite,
        z.ZodOptional<typeof skinfold>
      >,
    )
    .strict()
    .default({}),
  /** Neck circumference, cm (circumference method). */
  neckCm: length(LIMITS.neckCm, 'Neck', 'cm').optional(),
  /** Waist circumference at the navel, cm (circumference method). */
  waistCm: length(LIMITS.waistCm, 'Waist', 'cm').optional(),
  /** Hip circumference, cm (circumference method, women). */
  hipCm: length(LIMITS.hipCm, 'Hip', 'cm').optional(),
  /** Standing height, cm (circumference method). */
  heightCm: length(LIMITS.heightCm, 'Height', 'cm').optional(),
  /** Who took the measurement ("Coach Sam", "self"). */
  measuredBy: text('Measured by', LIMITS.measuredBy),
});
export type CreateBodyMeasurementRequest = z.input<typeof createBodyMeasurementRequest>;

/** One measurement with the server's estimate; masses from that day's trend weight. */
export const bodyMeasurementView = z.object({
  id: uuid,
  date: z.string(),
  method: z.enum(BODY_COMPOSITION_METHODS),
  densityEquation: z.enum(DENSITY_EQUATIONS),
  skinfoldsMm: z.partialRecord(z.enum(SKINFOLD_SITES), z.number()),
  neckCm: z.number().nullable(),
  waistCm: z.number().nullable(),
  hipCm: z.number().nullable(),
  heightCm: z.number().nullable(),
  measuredBy: z.string(),
  /** The user who entered it. */
  enteredBy: z.object({ id: uuid, name: z.string() }),
  /** The estimate; null when the athlete's sex or birth date is not known. */
  estimate: z
    .object({
      sumMm: z.number().nullable(),
      densityGPerMl: z.number().nullable(),
      fatPercent: z.number(),
      /** Which equations gave it ("Jackson & Pollock 3-site, Siri"). */
      equation: z.string(),
    })
    .nullable(),
  /** The server's trend weight on the measurement's date (carried from the last weigh-in), kg. */
  trendWeightKg: z.number().nullable(),
  /** Fat mass and lean (fat-free) mass from that trend weight, kg; null without either. */
  fatMassKg: z.number().nullable(),
  leanMassKg: z.number().nullable(),
});
export type BodyMeasurementView = z.infer<typeof bodyMeasurementView>;

/** GET /api/athletes/:athleteId/body-composition. */
export const bodyCompositionView = z.object({
  athleteId: uuid,
  /** Oldest first. */
  measurements: z.array(bodyMeasurementView),
  /** The newest measurement with a lean mass: what g/kg-of-lean-mass targets resolve against. */
  latestLeanMass: z.object({ kg: z.number(), date: z.string(), measurementId: uuid }).nullable(),
  /** The method-error caution the screens show beside every estimate. */
  caution: z.string(),
});
export type BodyCompositionView = z.infer<typeof bodyCompositionView>;
