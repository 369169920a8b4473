import {
  SYMPTOM_LABELS,
  URGENT_SYMPTOMS,
  URGENT_SYMPTOM_MESSAGE,
  fluidEntryRequest,
  itemGrams,
  LIMITS,
  mealEntryRequest,
  nutrientsAsEaten,
  per100gFromEaten,
  sumNutrients,
  type FoodPortion,
  type MealItemRequest,
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
import { macroMealNutrients, type Per100g } from '../lib/meal-nutrients.js';
import { MealItemRepository, type NewMealItem } from '../repositories/meal-item.repository.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { AthleteFlagRepository } from '../repositories/athlete-flag.repository.js';
import { resolveFoods, type ResolvedFood } from './food.service.js';
import { notifySafetyFlag } from './notify.service.js';

export interface EntryContext {
  manager: EntityManager;
  athlete: AthleteWithPeople;
  /** The stored entry when this is an edit (loaded with `load` when the kind has one). */
  previous: ClientDayEntry | null;
  /** A meal's items as worked out by `columns`, written by `afterSave`. */
  mealItems?: NewMealItem[];
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
  /** Whether a create needs a transaction (default: whenever the kind has `afterSave`). */
  transactional?(input: I): boolean;
  /** Reads what the entries hold beyond their row (a meal's items), in a bounded number of statements. */
  load?(entries: E[], manager: EntityManager): Promise<void>;
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
 * The items of a meal of foods as eaten, with the meal's sums. A food the meal already held
 * keeps the per-100 g figures and portion weights it stored (so a later change to a team food never
 * rewrites an old meal, nor does its deletion block editing the time); other foods are looked up
 * in one go. An unknown food or portion answers 400 naming the item's field.
 */
export async function mealItemsAsEaten(
  items: readonly MealItemRequest[],
  ctx: Pick<EntryContext, 'manager' | 'athlete' | 'previous'>,
): Promise<NewMealItem[]> {
  const stored = new Map<string, { id: string; name: string; per100g: Per100g; portions: FoodPortion[] }>();
  for (const item of (ctx.previous as MealEntry | null)?.items ?? []) {
    const key = item.foodId.toLowerCase();
    const known = stored.get(key) ?? {
      id: item.foodId,
      name: item.foodName,
      per100g: per100gFromEaten(item, item.quantityG),
      portions: [],
    };
    if (item.portionUnit && item.portionG !== null && item.portionLabel !== null) {
      known.portions.push({ unit: item.portionUnit, label: item.portionLabel, grams: item.portionG });
    }
    stored.set(key, known);
  }
  // A stored food is reused unless the item asks for a portion the meal never used: then the food
  // is looked up afresh for its portion weights.
  const usesStored = (i: MealItemRequest) => {
    const known = stored.get(i.foodId.toLowerCase());
    return known !== undefined && (!i.portionUnit || known.portions.some((p) => p.unit === i.portionUnit));
  };
  const toLookUp = items.filter((i) => !usesStored(i)).map((i) => i.foodId);
  const looked =
    toLookUp.length > 0
      ? await resolveFoods(ctx.manager, ctx.athlete, toLookUp)
      : new Map<string, ResolvedFood>();
  const problems: Record<string, string> = {};
  const rows: NewMealItem[] = [];
  items.forEach((item, i) => {
    const key = item.foodId.toLowerCase();
    const food = usesStored(item) ? stored.get(key) : looked.get(key);
    if (!food) {
      problems[`items.${i}.foodId`] = 'Choose a food from the list';
      return;
    }
    const grams = itemGrams(item, food.portions);
    if (grams === null) {
      problems[`items.${i}.portionUnit`] = 'Choose a portion this food has';
      return;
    }
    if (grams < LIMITS.foodQuantityG.min || grams > LIMITS.foodQuantityG.max) {
      problems[`items.${i}.portions`] =
        `That is ${Math.round(grams)} g: one food can be ${LIMITS.foodQuantityG.min} to ${LIMITS.foodQuantityG.max} g`;
      return;
    }
    const portion =
      typeof item.quantityG === 'number' ? null : food.portions.find((p) => p.unit === item.portionUnit)!;
    rows.push({
      foodId: food.id,
      foodName: food.name,
      quantityG: grams,
      portionCount: portion ? (item.portions ?? null) : null,
      portionUnit: portion?.unit ?? null,
      portionLabel: portion?.label ?? null,
      portionG: portion?.grams ?? null,
      ...nutrientsAsEaten(food.per100g, grams),
    });
  });
  if (Object.keys(problems).length > 0) throw validationFailed(problems);
  return rows;
}

/** A meal's sums from its items: fibre and alcohol stay unknown when no item carries them. */
function mealTotalsOf(items: readonly NewMealItem[]) {
  const total = sumNutrients(items);
  return {
    ...total,
    fibreG: items.some((i) => i.fibreG !== null) ? total.fibreG : null,
    alcoholG: items.some((i) => i.alcoholG !== null) ? total.alcoholG : null,
  };
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
      ctx.mealItems = [];
      return { name: input.name, source: 'macros', ...macroMealNutrients(input) };
    }
    const items = await mealItemsAsEaten(input.items, ctx);
    ctx.mealItems = items;
    return { name: input.name, source: 'foods', ...mealTotalsOf(items) };
  },
  // A meal of typed macros is one insert; a meal of foods writes its items too.
  transactional: (input) => input.source === 'foods',
  load: async (meals, manager) => {
    const byMeal = await new MealItemRepository(manager).listForMeals(
      meals.filter((m) => m.source === 'foods').map((m) => m.id),
    );
    for (const meal of meals) meal.items = byMeal.get(meal.id) ?? [];
  },
  afterSave: async (entry, ctx) => {
    const hadItems = ((ctx.previous as MealEntry | null)?.items?.length ?? 0) > 0;
    const items = ctx.mealItems ?? [];
    entry.items =
      items.length > 0 || hadItems
        ? await new MealItemRepository(ctx.manager).replaceForMeal(entry.id, entry.athleteId, items, hadItems)
        : [];
  },
  asInput: (e) =>
    e.source === 'foods'
      ? {
          time: e.localTime,
          name: e.name,
          source: 'foods',
          items: (e.items ?? []).map((i) =>
            i.portionUnit !== null && i.portionCount !== null
              ? { foodId: i.foodId, portions: i.portionCount, portionUnit: i.portionUnit }
              : { foodId: i.foodId, quantityG: i.quantityG },
          ),
        }
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
