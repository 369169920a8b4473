import { z } from 'zod';
import { barcodeProblem } from '../barcode.js';
import { labelPer100g, servingGrams } from '../food-label.js';
import { LIMITS } from '../limits.js';
import { kjToKcal } from '../nutrition.js';
import { text } from './common.js';
import { foodView } from './days.js';

const range = (limits: { min: number; max: number }, what: string, unit = '') =>
  z
    .number({ error: `${what} is required` })
    .finite(`${what} must be a number`)
    .min(limits.min, `${what} must be at least ${limits.min}${unit}`)
    .max(limits.max, `${what} must be at most ${limits.max}${unit}`);

/**
 * Grams of protein, carbohydrate, fat, fibre and alcohol in 100 g may pass 100 by label rounding,
 * not further (common practice, no source).
 */
const MAX_MACRO_GRAMS_PER_100G = 105;

/** The label's figures whatever its basis; the server stores them per 100 g. */
const labelObject = z.object({
  /** Name shown in search. */
  name: text('Name', LIMITS.foodName),
  /** Which column of the label was copied: per 100 g (or 100 mL) or per serving. */
  basis: z.enum(['per100g', 'perServing'], { error: 'Choose per 100 g or per serving' }),
  /** The serving as printed (only with `perServing`). */
  servingSize: range(LIMITS.labelServing, 'Serving size').nullable().optional(),
  /** Grams or millilitres (only with `perServing`). */
  servingUnit: z.enum(['g', 'ml'], { error: 'Choose g or mL' }).nullable().optional(),
  /** g/mL for a serving in mL; 1 when not given. */
  densityGPerMl: range(LIMITS.labelDensity, 'Density', ' g/mL').nullable().optional(),
  /** Energy as printed. */
  energy: range(LIMITS.labelEnergy, 'Energy'),
  /** The unit of `energy` on the label. */
  energyUnit: z.enum(['kcal', 'kJ'], { error: 'Choose kcal or kJ' }),
  /** Grams as printed. */
  proteinG: range(LIMITS.labelMacroG, 'Protein', ' g'),
  carbohydrateG: range(LIMITS.labelMacroG, 'Carbohydrate', ' g'),
  fatG: range(LIMITS.labelMacroG, 'Fat', ' g'),
  fibreG: range(LIMITS.labelMacroG, 'Fibre', ' g').nullable().optional(),
  alcoholG: range(LIMITS.labelMacroG, 'Alcohol', ' g').nullable().optional(),
  /** Milligrams as printed. */
  sodiumMg: range(LIMITS.labelSodiumMg, 'Sodium', ' mg').nullable().optional(),
});

/** A label request's figures per 100 g, energy in kcal (what the server stores and checks). */
export function labelRequestPer100g(input: z.infer<typeof labelObject>) {
  const serving =
    input.basis === 'perServing' && input.servingSize && input.servingUnit
      ? servingGrams(input.servingSize, input.servingUnit, input.densityGPerMl)
      : null;
  const energyKcal = input.energyUnit === 'kJ' ? kjToKcal(input.energy) : input.energy;
  return labelPer100g({ ...input, energyKcal }, serving);
}

/**
 * POST /api/foods/label (staff: a team food) and POST /api/athletes/:athleteId/foods (the athlete:
 * a personal food): a nutrition label as printed, per 100 g or per serving.
 */
export const labelFoodRequest = labelObject.superRefine((input, ctx) => {
  if (input.basis === 'perServing') {
    if (input.servingSize === null || input.servingSize === undefined) {
      ctx.addIssue({ code: 'custom', path: ['servingSize'], message: 'Serving size is required' });
      return;
    }
    if (!input.servingUnit) {
      ctx.addIssue({ code: 'custom', path: ['servingUnit'], message: 'Choose g or mL' });
      return;
    }
  }
  const p = labelRequestPer100g(input);
  const grams = p.proteinG + p.carbohydrateG + p.fatG + (p.fibreG ?? 0) + (p.alcoholG ?? 0);
  if (grams > MAX_MACRO_GRAMS_PER_100G) {
    ctx.addIssue({
      code: 'custom',
      path: [input.basis === 'perServing' ? 'servingSize' : 'carbohydrateG'],
      message:
        input.basis === 'perServing'
          ? 'The macros weigh more than the serving: check the serving size'
          : 'Protein, carbohydrate, fat, fibre and alcohol add up to more than 100 g',
    });
  }
});
export type LabelFoodRequest = z.infer<typeof labelFoodRequest>;

/** POST /api/athletes/:athleteId/foods/barcode: a packaged food's barcode, scanned or typed. */
export const barcodeLookupRequest = z.object({
  /** EAN-13 or UPC-A digits, check digit included. */
  barcode: z
    .string({ error: 'Barcode is required' })
    .trim()
    .max(32, 'A barcode has 13 digits (EAN-13) or 12 (UPC-A)')
    .superRefine((code, ctx) => {
      const problem = barcodeProblem(code);
      if (problem) ctx.addIssue({ code: 'custom', message: problem });
    }),
});
export type BarcodeLookupRequest = z.infer<typeof barcodeLookupRequest>;

/** The label's printed energy against its macros, as the server judged it. */
export const labelCheckView = z.object({
  /** Printed energy per 100 g, kcal. */
  printedKcal: z.number(),
  /** Atwater general factors on the label's macros (fibre 2 kcal/g when given), per 100 g. */
  atwaterKcal: z.number(),
  /** (printed − Atwater) / Atwater × 100; null when the macros give no energy. */
  differencePct: z.number().nullable(),
  /** The warning to show beside the form, or null when the label agrees with itself. */
  warning: z.string().nullable(),
});
export type LabelCheckView = z.infer<typeof labelCheckView>;

/** Answer of the label and barcode routes: the food as stored (per 100 g) and the label check. */
export const labelFoodResult = z.object({
  food: foodView,
  labelCheck: labelCheckView,
  /** Barcode route only: false when the athlete already had this product as a personal food. */
  created: z.boolean(),
});
export type LabelFoodResult = z.infer<typeof labelFoodResult>;
