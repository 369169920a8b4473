import { toTypedText } from '@driftmark/shared';
import {
  RATING_KEYS,
  WEIGH_IN_TAGS,
  SYMPTOMS,
  type CYCLE_PHASES,
  type DayView,
  type FLUID_KINDS,
  type RatingKey,
  type Symptom,
  type VolumeUnit,
  type WeighInTag,
  type WeightUnit,
} from '@driftmark/shared';
import { numberReader } from '../../../lib/number-reader';
import { volumeInputText, weightInputText } from './units';

/*
 * Each check-in form as the athlete types it (numbers as text, in their own units) and its
 * conversion to the request body the shared schema validates. Field names match the request's,
 * so schema and server messages land on the box they are about.
 */

/** Stands in for the submission's client id while the schema checks the rest of a create body. */
export const CLIENT_ID_PLACEHOLDER = '00000000-0000-4000-8000-000000000000';

export interface Conversion<F extends string> {
  request: Record<string, unknown>;
  /** Boxes whose text is not a number. */
  numberErrors: Partial<Record<F, string>>;
}

function optionalText(text: string | null | undefined): string | null {
  const t = (text ?? '').trim();
  return t === '' ? null : t;
}

function checkedList<T extends string>(value: unknown, allowed: readonly T[]): T[] {
  // react-hook-form gives an array for a group of checkboxes; guard against a lone boolean.
  if (!Array.isArray(value)) return [];
  return allowed.filter((item) => value.includes(item));
}

/* ---------- Weigh-in ---------- */

export type CyclePhase = (typeof CYCLE_PHASES)[number];

export interface WeighInFormValues {
  weight: string;
  unit: WeightUnit;
  time: string;
  protocolConfirmed: boolean;
  tags: WeighInTag[];
  cyclePhase: CyclePhase | '';
}

export function toWeighInRequest(v: WeighInFormValues): Conversion<keyof WeighInFormValues> {
  const read = numberReader<keyof WeighInFormValues>();
  const tags = checkedList(v.tags, WEIGH_IN_TAGS);
  return {
    request: {
      weight: read.required('weight', v.weight),
      unit: v.unit,
      time: v.time,
      protocolConfirmed: v.protocolConfirmed === true ? true : undefined,
      tags,
      cyclePhase: tags.includes('cycle_phase') && v.cyclePhase ? v.cyclePhase : null,
    },
    numberErrors: read.errors,
  };
}

export function weighInFormValues(
  view: DayView['weighIn'],
  unit: WeightUnit,
  now: string,
): WeighInFormValues {
  if (!view) return { weight: '', unit, time: now, protocolConfirmed: false, tags: [], cyclePhase: '' };
  // Editing shows the weigh-in in the unit it was typed in, exactly as typed.
  const shownUnit = view.entered.unit;
  return {
    weight: weightInputText(view.weightKg, view.entered, shownUnit),
    unit: shownUnit,
    time: view.time,
    protocolConfirmed: true,
    tags: [...view.tags],
    cyclePhase: view.cyclePhase ?? '',
  };
}

/* ---------- Fluids ---------- */

export type FluidKind = (typeof FLUID_KINDS)[number];

export interface FluidFormValues {
  volume: string;
  unit: VolumeUnit;
  kind: FluidKind;
  time: string;
}

export function toFluidRequest(v: FluidFormValues): Conversion<keyof FluidFormValues> {
  const read = numberReader<keyof FluidFormValues>();
  return {
    request: {
      clientId: CLIENT_ID_PLACEHOLDER,
      time: v.time,
      volume: read.required('volume', v.volume),
      unit: v.unit,
      kind: v.kind,
    },
    numberErrors: read.errors,
  };
}

export function fluidFormValues(
  entry: DayView['fluids'][number] | null,
  unit: VolumeUnit,
  now: string,
): FluidFormValues {
  if (!entry) return { volume: '', unit, kind: 'water', time: now };
  return {
    volume: volumeInputText(entry.volumeMl, entry.entered, entry.entered.unit),
    unit: entry.entered.unit,
    kind: entry.kind,
    time: entry.time,
  };
}

/* ---------- Meals ---------- */

/** One food of the meal as typed: an amount in grams ('g') or in one of the food's portions. */
export interface MealItemFormValues {
  foodId: string;
  amount: string;
  /** 'g', or a portion unit the food carries ("slice", "cup", "large"). */
  unit: string;
}

export interface MealFormValues {
  name: string;
  time: string;
  source: 'macros' | 'foods';
  proteinG: string;
  carbohydrateG: string;
  fatG: string;
  fibreG: string;
  alcoholG: string;
  /** mg; macros only (a food from the list brings its own). */
  sodiumMg: string;
  items: MealItemFormValues[];
}

/** Where an item's amount box shows its message: the request field it fills. */
export function itemAmountField(i: number, unit: string): string {
  return unit === 'g' ? `items.${i}.quantityG` : `items.${i}.portions`;
}

export function toMealRequest(v: MealFormValues): Conversion<keyof MealFormValues> {
  const read = numberReader<string>();
  const base = { clientId: CLIENT_ID_PLACEHOLDER, time: v.time, name: v.name };
  if (v.source === 'foods') {
    return {
      request: {
        ...base,
        source: 'foods',
        items: v.items.map((item, i) =>
          item.unit === 'g'
            ? { foodId: item.foodId, quantityG: read.required(itemAmountField(i, 'g'), item.amount) }
            : {
                foodId: item.foodId,
                portions: read.required(itemAmountField(i, item.unit), item.amount),
                portionUnit: item.unit,
              },
        ),
      },
      numberErrors: read.errors as Conversion<keyof MealFormValues>['numberErrors'],
    };
  }
  return {
    request: {
      ...base,
      source: 'macros',
      proteinG: read.required('proteinG', v.proteinG),
      carbohydrateG: read.required('carbohydrateG', v.carbohydrateG),
      fatG: read.required('fatG', v.fatG),
      fibreG: read.optional('fibreG', v.fibreG),
      alcoholG: read.optional('alcoholG', v.alcoholG),
      sodiumMg: read.optional('sodiumMg', v.sodiumMg),
    },
    numberErrors: read.errors as Conversion<keyof MealFormValues>['numberErrors'],
  };
}

export function mealFormValues(entry: DayView['meals'][number] | null, now: string): MealFormValues {
  const empty: MealFormValues = {
    name: '',
    time: now,
    source: 'foods',
    proteinG: '',
    carbohydrateG: '',
    fatG: '',
    fibreG: '',
    alcoholG: '',
    sodiumMg: '',
    items: [],
  };
  if (!entry) return empty;
  if (entry.source === 'foods') {
    return {
      ...empty,
      name: entry.name,
      time: entry.time,
      items: entry.items.map((item) =>
        item.portion
          ? { foodId: item.foodId, amount: toTypedText(item.portion.count, 2), unit: item.portion.unit }
          : { foodId: item.foodId, amount: toTypedText(item.quantityG, 1), unit: 'g' },
      ),
    };
  }
  return {
    ...empty,
    name: entry.name,
    time: entry.time,
    source: 'macros',
    proteinG: toTypedText(entry.proteinG, 1),
    carbohydrateG: toTypedText(entry.carbohydrateG, 1),
    fatG: toTypedText(entry.fatG, 1),
    fibreG: toTypedText(entry.fibreG, 1),
    alcoholG: toTypedText(entry.alcoholG, 1),
    sodiumMg: toTypedText(entry.sodiumMg, 0),
  };
}

/* ---------- Supplements ---------- */

export interface SupplementFormValues {
  name: string;
  dose: string;
  doseUnit: string;
  time: string;
}

export function toSupplementRequest(v: SupplementFormValues): Conversion<keyof SupplementFormValues> {
  const read = numberReader<keyof SupplementFormValues>();
  return {
    request: {
      clientId: CLIENT_ID_PLACEHOLDER,
      time: v.time,
      name: v.name,
      dose: read.optional('dose', v.dose),
      doseUnit: optionalText(v.doseUnit),
    },
    numberErrors: read.errors,
  };
}

export function supplementFormValues(
  entry: Pick<DayView['supplements'][number], 'name' | 'dose' | 'doseUnit' | 'time'> | null,
  now: string,
): SupplementFormValues {
  if (!entry) return { name: '', dose: '', doseUnit: '', time: now };
  return {
    name: entry.name,
    dose: toTypedText(entry.dose, 3),
    doseUnit: entry.doseUnit ?? '',
    time: entry.time,
  };
}

/* ---------- Evening ---------- */

export interface EveningFormValues {
  steps: string;
  sleepHours: string;
  cardioMinutes: string;
  trainingDone: '' | 'yes' | 'no';
  trainingNote: string;
  ratings: Record<RatingKey, string>;
  note: string;
}

export function toEveningRequest(v: EveningFormValues): Conversion<keyof EveningFormValues> {
  const read = numberReader<keyof EveningFormValues>();
  const ratings: Partial<Record<RatingKey, number | null>> = {};
  for (const key of RATING_KEYS) {
    const text = v.ratings?.[key] ?? '';
    ratings[key] = text === '' ? null : Number(text);
  }
  return {
    request: {
      steps: read.optional('steps', v.steps),
      sleepHours: read.optional('sleepHours', v.sleepHours),
      cardioMinutes: read.optional('cardioMinutes', v.cardioMinutes),
      trainingDone: v.trainingDone === '' ? null : v.trainingDone === 'yes',
      trainingNote: optionalText(v.trainingNote),
      ratings,
      note: optionalText(v.note),
    },
    numberErrors: read.errors,
  };
}

export function eveningFormValues(view: DayView['evening']): EveningFormValues {
  const ratings = Object.fromEntries(
    RATING_KEYS.map((k) => {
      const r = view?.ratings[k];
      return [k, typeof r === 'number' ? String(r) : ''];
    }),
  ) as Record<RatingKey, string>;
  return {
    steps: toTypedText(view?.steps, 0),
    sleepHours: toTypedText(view?.sleepHours, 2),
    cardioMinutes: toTypedText(view?.cardioMinutes, 0),
    trainingDone: view?.trainingDone === true ? 'yes' : view?.trainingDone === false ? 'no' : '',
    trainingNote: view?.trainingNote ?? '',
    ratings,
    note: view?.note ?? '',
  };
}

/* ---------- Symptoms ---------- */

export interface SymptomFormValues {
  symptoms: Symptom[];
  time: string;
  note: string;
}

export function toSymptomRequest(v: SymptomFormValues): Conversion<keyof SymptomFormValues> {
  return {
    request: {
      clientId: CLIENT_ID_PLACEHOLDER,
      time: v.time,
      symptoms: checkedList(v.symptoms, SYMPTOMS),
      note: optionalText(v.note),
    },
    numberErrors: {},
  };
}

export function symptomFormValues(entry: DayView['symptoms'][number] | null, now: string): SymptomFormValues {
  if (!entry) return { symptoms: [], time: now, note: '' };
  return { symptoms: [...entry.symptoms], time: entry.time, note: entry.note ?? '' };
}

/** A type without its client id, member by member for a union (a meal is macros or a food). */
export type WithoutClientId<T> = T extends unknown ? Omit<T, 'clientId'> : never;

/** The body of a PATCH: the create body without its client id. */
export function withoutClientId<T extends { clientId?: unknown }>(body: T): WithoutClientId<T> {
  const { clientId: _clientId, ...rest } = body;
  return rest as WithoutClientId<T>;
}
