import {
  SYMPTOM_LABELS,
  URGENT_SYMPTOMS,
  URGENT_SYMPTOM_MESSAGE,
  fluidEntryRequest,
  mealEntryRequest,
  supplementEntryRequest,
  symptomReportRequest,
  volumeToMl,
  type FluidEntryRequest,
  type MealEntryRequest,
  type SupplementEntryRequest,
  type Symptom,
  type SymptomReportRequest,
  fluidView,
  mealView,
  supplementView,
  symptomView,
} from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { ClientDayEntry } from '../entities/day-record.entity.js';
import { FluidEntry } from '../entities/fluid-entry.entity.js';
import { MealEntry } from '../entities/meal-entry.entity.js';
import { SupplementEntry } from '../entities/supplement-entry.entity.js';
import { SymptomReport } from '../entities/symptom-report.entity.js';
import { validationFailed } from '../errors.js';
import { presentFluid, presentMeal, presentSupplement, presentSymptom } from '../presenters/day.presenter.js';
import { foodMealNutrients, macroMealNutrients, type Per100g } from '../lib/meal-nutrients.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { AthleteFlagRepository } from '../repositories/athlete-flag.repository.js';
import { resolveFood } from './food.service.js';
import { notifySafetyFlag } from './notify.service.js';

export interface EntryContext {
  manager: EntityManager;
  athlete: AthleteWithPeople;
  /** The stored entry when this is an edit. */
  previous: ClientDayEntry | null;
}

/** The columns a kind owns (the service adds athlete, date, time, instant and client id). */
type OwnColumns<E> = Partial<Omit<E, keyof ClientDayEntry | 'athlete'>>;

/** What differs between fluid, meal, supplement and symptom entries; routes and service are shared. */
export interface EntryKind<E extends ClientDayEntry, I extends { clientId: string; time: string }> {
  /** Path segment: /days/:date/<path> to create, /<path>/:entryId to edit or delete. */
  path: 'fluids' | 'meals' | 'supplements' | 'symptoms';
  /** Plural for the per-day limit message ("fluid entries"). */
  plural: string;
  entity: new () => E;
  /** The shared request schema (also re-checks an edit after merging it over the stored entry). */
  schema: z.ZodType<I>;
  /** Stored columns for a validated input: SI quantities, energy, flags. */
  columns(input: I, ctx: EntryContext): Promise<OwnColumns<E>>;
  /** The stored entry in request form, so an edit may send only what changed. */
  asInput(entry: E): Record<string, unknown>;
  /** Runs in the same transaction after a create or an edit. */
  afterSave?(entry: E, ctx: EntryContext): Promise<void>;
  /** Extra response fields beside `data`. */
  meta?(entry: E): Record<string, string> | undefined;
  /** The entry as the day view lists it: what a write answers with. */
  present(entry: E): unknown;
  /** The shape `present` gives (shared), for the API description. */
  view: z.ZodType;
}

export const fluidKind: EntryKind<FluidEntry, FluidEntryRequest> = {
  path: 'fluids',
  plural: 'fluid entries',
  present: presentFluid,
  view: fluidView,
  entity: FluidEntry,
  schema: fluidEntryRequest,
  columns: async (input) => ({
    volumeMl: volumeToMl(input.volume, input.unit),
    enteredValue: input.volume,
    enteredUnit: input.unit,
    kind: input.kind,
    sodiumMg: input.sodiumMg ?? null,
  }),
  asInput: (e) => ({
    time: e.localTime,
    volume: e.enteredValue,
    unit: e.enteredUnit,
    kind: e.kind,
    sodiumMg: e.sodiumMg,
  }),
};

/**
 * Per-100 g values of the food a meal names. An edit that keeps the food reuses what the entry
 * stored (so a later change to a team food never rewrites an old meal, nor does its deletion
 * block editing the time).
 */
async function mealFood(
  foodId: string,
  ctx: EntryContext,
): Promise<{ id: string; name: string; per100g: Per100g }> {
  const prev = ctx.previous as MealEntry | null;
  if (prev?.source === 'food' && prev.foodId?.toLowerCase() === foodId.toLowerCase() && prev.quantityG) {
    const f = 100 / prev.quantityG;
    return {
      id: prev.foodId,
      name: prev.foodName ?? '',
      per100g: {
        energyKcal: prev.energyKcal * f,
        proteinG: prev.proteinG * f,
        carbohydrateG: prev.carbohydrateG * f,
        fatG: prev.fatG * f,
        fibreG: prev.fibreG === null ? null : prev.fibreG * f,
        alcoholG: prev.alcoholG === null ? null : prev.alcoholG * f,
        sodiumMg: prev.sodiumMg === null ? null : prev.sodiumMg * f,
      },
    };
  }
  const food = await resolveFood(ctx.manager, ctx.athlete, foodId);
  if (!food) throw validationFailed({ foodId: 'Choose a food from the list' });
  return food;
}

export const mealKind: EntryKind<MealEntry, MealEntryRequest> = {
  path: 'meals',
  plural: 'meals',
  present: presentMeal,
  view: mealView,
  entity: MealEntry,
  schema: mealEntryRequest,
  columns: async (input, ctx) => {
    if (input.source === 'macros') {
      return {
        name: input.name,
        source: 'macros',
        foodId: null,
        foodName: null,
        quantityG: null,
        ...macroMealNutrients(input),
      };
    }
    const food = await mealFood(input.foodId, ctx);
    return {
      name: input.name,
      source: 'food',
      foodId: food.id,
      foodName: food.name,
      quantityG: input.quantityG,
      ...foodMealNutrients(food.per100g, input.quantityG),
    };
  },
  asInput: (e) =>
    e.source === 'food'
      ? { time: e.localTime, name: e.name, source: 'food', foodId: e.foodId, quantityG: e.quantityG }
      : {
          time: e.localTime,
          name: e.name,
          source: 'macros',
          proteinG: e.proteinG,
          carbohydrateG: e.carbohydrateG,
          fatG: e.fatG,
          fibreG: e.fibreG,
          alcoholG: e.alcoholG,
          sodiumMg: e.sodiumMg,
        },
};

export const supplementKind: EntryKind<SupplementEntry, SupplementEntryRequest> = {
  path: 'supplements',
  plural: 'supplement entries',
  present: presentSupplement,
  view: supplementView,
  entity: SupplementEntry,
  schema: supplementEntryRequest,
  columns: async (input) => ({
    name: input.name,
    dose: input.dose ?? null,
    doseUnit: input.doseUnit || null,
    scheduleItemId: input.scheduleItemId ?? null,
  }),
  asInput: (e) => ({
    time: e.localTime,
    name: e.name,
    dose: e.dose,
    doseUnit: e.doseUnit,
    scheduleItemId: e.scheduleItemId,
  }),
};

const isUrgent = (s: Symptom) => (URGENT_SYMPTOMS as readonly Symptom[]).includes(s);

export const symptomKind: EntryKind<SymptomReport, SymptomReportRequest> = {
  path: 'symptoms',
  plural: 'symptom reports',
  present: presentSymptom,
  view: symptomView,
  entity: SymptomReport,
  schema: symptomReportRequest,
  columns: async (input) => {
    const symptoms = [...new Set(input.symptoms)];
    return { symptoms, note: input.note || null, urgent: symptoms.some(isUrgent) };
  },
  asInput: (e) => ({ time: e.localTime, symptoms: e.symptoms, note: e.note }),
  /** An urgent report raises one flag for the coach (an edit that makes it urgent, too). */
  afterSave: async (entry, ctx) => {
    if (!entry.urgent) return;
    const flags = new AthleteFlagRepository(ctx.manager);
    if (await flags.existsForSymptomReport(entry.id)) return;
    const urgent = entry.symptoms.filter(isUrgent);
    const flag = await flags.create({
      athleteId: entry.athleteId,
      localDate: entry.localDate,
      kind: 'symptom',
      message: `Urgent symptoms reported at ${entry.localTime}: ${urgent.map((s) => SYMPTOM_LABELS[s]).join(', ')}`,
      detail: { symptoms: entry.symptoms, time: entry.localTime },
      symptomReportId: entry.id,
    });
    // Same transaction as the flag: the e-mail to the coach commits (or rolls back) with it.
    await notifySafetyFlag(ctx.manager, ctx.athlete, flag);
  },
  meta: (entry) => (entry.urgent ? { urgentMessage: URGENT_SYMPTOM_MESSAGE } : undefined),
};
