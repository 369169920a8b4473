import { parseTypedNumber, toTypedText } from '@driftmark/shared';
import type {
  DayTargets,
  GuardrailWarning,
  EnergyTarget,
  MacroTarget,
  PlanBaseline,
  ScheduleItem,
  WaterTarget,
} from '@driftmark/shared';
import { liveMeals, mealFormValues, toPlannedMeals, type MealFormValues } from './meal-plan-form';

/*
 * A DayTargets as the coach types it: each metric's kind chosen from a list and its figure as text,
 * so a half-typed number never becomes NaN inside the form. `toDayTargets` turns it into the
 * shape the shared schema checks; `liveDayTargets` reads whatever is usable for live figures.
 * Used by the plan editor and the template editor alike.
 */

export type EnergyKind = 'none' | EnergyTarget['kind'];
export type MacroKind = 'none' | MacroTarget['kind'];
export type WaterKind = 'none' | WaterTarget['kind'];
export const MACROS = ['protein', 'carbohydrate', 'fat'] as const;
export type Macro = (typeof MACROS)[number];

/** A guardrail warning placed on one day; `field` is relative to the day's targets ("sodiumMg"). */
export type DayWarning = Pick<GuardrailWarning, 'key' | 'severity' | 'message' | 'source'> & {
  field: string | null;
};

export interface SupplementFormValues {
  /** The schedule item's id (kept across edits; ticks on the athlete's side point at it). */
  itemId: string;
  item: string;
  dose: string;
  unit: string;
  /** Clock times "HH:MM", separated by commas or spaces. */
  times: string;
  /** Hours before the event's clock time ("3, 0.5"), countdown days only. */
  beforeEventHours: string;
}

export interface DayTargetsFormValues {
  energy: { kind: EnergyKind; value: string };
  protein: { kind: MacroKind; value: string };
  carbohydrate: { kind: MacroKind; value: string };
  fat: { kind: MacroKind; value: string };
  water: { kind: WaterKind; value: string };
  sodiumMg: string;
  fluidCutoff: { on: boolean; time: string; allowanceMl: string };
  foodCutoff: { on: boolean; time: string; allowanceKcal: string };
  /** "Only sips": at most maxMl, over the whole day (after empty) or after a clock time. */
  fluidCap: { on: boolean; maxMl: string; after: string };
  steps: string;
  cardioMinutes: string;
  supplements: SupplementFormValues[];
  note: string;
  /** The day's meal plan (absent in forms built before meal plans existed). */
  meals?: MealFormValues[];
}

export const NOT_A_NUMBER = 'Enter a number, e.g. 2400';

export function newSupplementRow(): SupplementFormValues {
  return { itemId: crypto.randomUUID(), item: '', dose: '', unit: '', times: '', beforeEventHours: '' };
}

export function emptyDayTargetsFormValues(): DayTargetsFormValues {
  return {
    energy: { kind: 'none', value: '' },
    protein: { kind: 'none', value: '' },
    carbohydrate: { kind: 'none', value: '' },
    fat: { kind: 'none', value: '' },
    water: { kind: 'none', value: '' },
    sodiumMg: '',
    fluidCutoff: { on: false, time: '', allowanceMl: '' },
    foodCutoff: { on: false, time: '', allowanceKcal: '' },
    fluidCap: { on: false, maxMl: '', after: '' },
    steps: '',
    cardioMinutes: '',
    supplements: [],
    note: '',
  };
}

function energyValue(t: EnergyTarget | null): DayTargetsFormValues['energy'] {
  if (!t) return { kind: 'none', value: '' };
  return t.kind === 'kcal'
    ? { kind: 'kcal', value: toTypedText(t.kcal, 0) }
    : { kind: 'usual_times', value: toTypedText(t.factor, 3) };
}

function macroValue(t: MacroTarget | null): DayTargetsFormValues['protein'] {
  if (!t) return { kind: 'none', value: '' };
  if (t.kind === 'g') return { kind: 'g', value: toTypedText(t.g, 1) };
  if (t.kind === 'pct') return { kind: 'pct', value: toTypedText(t.pct, 1) };
  if (t.kind === 'g_per_kg_lean') return { kind: 'g_per_kg_lean', value: toTypedText(t.perKg, 2) };
  return { kind: 'g_per_kg', value: toTypedText(t.perKg, 2) };
}

function waterValue(t: WaterTarget | null): DayTargetsFormValues['water'] {
  if (!t) return { kind: 'none', value: '' };
  if (t.kind === 'ml') return { kind: 'ml', value: toTypedText(t.ml, 0) };
  if (t.kind === 'usual_plus') return { kind: 'usual_plus', value: toTypedText(t.ml, 0) };
  return { kind: 'usual_times', value: toTypedText(t.factor, 3) };
}

/** A saved DayTargets put into the form. */
export function dayTargetsFormValues(t: DayTargets): DayTargetsFormValues {
  return {
    energy: energyValue(t.energy),
    protein: macroValue(t.protein),
    carbohydrate: macroValue(t.carbohydrate),
    fat: macroValue(t.fat),
    water: waterValue(t.water),
    sodiumMg: toTypedText(t.sodiumMg, 0),
    fluidCutoff: t.fluidCutoff
      ? { on: true, time: t.fluidCutoff.time, allowanceMl: toTypedText(t.fluidCutoff.allowanceMl, 0) }
      : { on: false, time: '', allowanceMl: '' },
    foodCutoff: t.foodCutoff
      ? { on: true, time: t.foodCutoff.time, allowanceKcal: toTypedText(t.foodCutoff.allowanceKcal, 0) }
      : { on: false, time: '', allowanceKcal: '' },
    fluidCap: t.fluidCap
      ? { on: true, maxMl: toTypedText(t.fluidCap.maxMl, 0), after: t.fluidCap.after ?? '' }
      : { on: false, maxMl: '', after: '' },
    steps: toTypedText(t.steps, 0),
    cardioMinutes: toTypedText(t.cardioMinutes, 0),
    supplements: t.supplements.map((s) => ({
      itemId: s.id,
      item: s.item,
      dose: toTypedText(s.dose, 3),
      unit: s.unit ?? '',
      times: s.times.join(', '),
      beforeEventHours: (s.minutesBeforeEvent ?? []).map((m) => toTypedText(m / 60, 2)).join(', '),
    })),
    note: t.note ?? '',
    ...(t.meals && t.meals.length > 0 ? { meals: t.meals.map(mealFormValues) } : {}),
  };
}

export function splitTimes(text: string): string[] {
  return text
    .split(/[\s,;]+/)
    .map((t) => t.trim())
    .filter(Boolean)
    .map((t) => (/^\d:\d{2}$/.test(t) ? `0${t}` : t));
}

export interface TargetsConversion {
  /** The request part for the schema (a number box that is not a number carries NaN). */
  targets: DayTargets;
  /** Form paths relative to the DayTargets ("energy.value") → "not a number". */
  numberErrors: Record<string, string>;
}

/** The form's values → the DayTargets the schema checks, with the boxes that hold no number. */
export function toDayTargets(v: DayTargetsFormValues): TargetsConversion {
  const numberErrors: Record<string, string> = {};
  const read = (path: string, text: string): number | undefined => {
    const n = parseTypedNumber(text);
    if (n !== undefined && Number.isNaN(n)) numberErrors[path] = NOT_A_NUMBER;
    return n;
  };
  const optional = (path: string, text: string): number | null => read(path, text) ?? null;
  // Missing figures stay undefined so the schema says "… must be a number" beside the box.
  const n = (path: string, text: string) => read(path, text) as number;

  const energy: EnergyTarget | null =
    v.energy.kind === 'kcal'
      ? { kind: 'kcal', kcal: n('energy.value', v.energy.value) }
      : v.energy.kind === 'usual_times'
        ? { kind: 'usual_times', factor: n('energy.value', v.energy.value) }
        : null;
  const macro = (m: Macro): MacroTarget | null => {
    const { kind, value } = v[m];
    const path = `${m}.value`;
    if (kind === 'g') return { kind: 'g', g: n(path, value) };
    if (kind === 'pct') return { kind: 'pct', pct: n(path, value) };
    if (kind === 'g_per_kg') return { kind: 'g_per_kg', perKg: n(path, value) };
    if (kind === 'g_per_kg_lean') return { kind: 'g_per_kg_lean', perKg: n(path, value) };
    return null;
  };
  const water: WaterTarget | null =
    v.water.kind === 'ml'
      ? { kind: 'ml', ml: n('water.value', v.water.value) }
      : v.water.kind === 'usual_plus'
        ? { kind: 'usual_plus', ml: n('water.value', v.water.value) }
        : v.water.kind === 'usual_times'
          ? { kind: 'usual_times', factor: n('water.value', v.water.value) }
          : null;
  const supplements: ScheduleItem[] = (v.supplements ?? []).map((s, i) => {
    const hours = (s.beforeEventHours ?? '')
      .split(/[\s;]+|,(?=\s)|,$/)
      .map((h) => h.trim())
      .filter(Boolean);
    const minutes = hours.map((h) => {
      const n = read(`supplements.${i}.minutesBeforeEvent`, h);
      return n === undefined ? Number.NaN : Math.round(n * 60);
    });
    return {
      id: s.itemId,
      item: s.item,
      dose: optional(`supplements.${i}.dose`, s.dose),
      unit: s.unit.trim() === '' ? null : s.unit.trim(),
      times: splitTimes(s.times),
      ...(minutes.length > 0 ? { minutesBeforeEvent: minutes } : {}),
    };
  });
  const note = v.note.trim();
  const meals = toPlannedMeals(v.meals ?? [], read);

  return {
    targets: {
      energy,
      protein: macro('protein'),
      carbohydrate: macro('carbohydrate'),
      fat: macro('fat'),
      water,
      sodiumMg: optional('sodiumMg', v.sodiumMg),
      fluidCutoff: v.fluidCutoff.on
        ? {
            time: v.fluidCutoff.time,
            allowanceMl: optional('fluidCutoff.allowanceMl', v.fluidCutoff.allowanceMl) ?? 0,
          }
        : null,
      foodCutoff: v.foodCutoff?.on
        ? {
            time: v.foodCutoff.time,
            allowanceKcal: optional('foodCutoff.allowanceKcal', v.foodCutoff.allowanceKcal) ?? 0,
          }
        : null,
      fluidCap: v.fluidCap?.on
        ? {
            maxMl: n('fluidCap.maxMl', v.fluidCap.maxMl),
            after: v.fluidCap.after.trim() === '' ? null : v.fluidCap.after.trim(),
          }
        : null,
      steps: optional('steps', v.steps),
      cardioMinutes: optional('cardioMinutes', v.cardioMinutes),
      supplements,
      note: note === '' ? null : note,
      ...(meals.length > 0 ? { meals } : {}),
    },
    numberErrors,
  };
}

const usable = (x: number | undefined | null): x is number => typeof x === 'number' && Number.isFinite(x);

/**
 * What the typed values say so far, for live figures and guardrails: a metric whose box is empty
 * or not a number counts as "no target", a cut-off without a valid time is left out.
 */
export function liveDayTargets(v: DayTargetsFormValues): DayTargets {
  const { targets } = toDayTargets(v);
  const e = targets.energy;
  const m = (t: MacroTarget | null): MacroTarget | null => {
    if (!t) return null;
    const x = t.kind === 'g' ? t.g : t.kind === 'pct' ? t.pct : t.perKg;
    return usable(x) ? t : null;
  };
  const w = targets.water;
  const cutoff = targets.fluidCutoff;
  const food = targets.foodCutoff;
  const cap = targets.fluidCap;
  const clock = (t: string | null | undefined) =>
    typeof t === 'string' && /^([01]\d|2[0-3]):[0-5]\d$/.test(t);
  return {
    ...targets,
    energy: e && usable(e.kind === 'kcal' ? e.kcal : e.factor) ? e : null,
    protein: m(targets.protein),
    carbohydrate: m(targets.carbohydrate),
    fat: m(targets.fat),
    water: w && usable(w.kind === 'usual_times' ? w.factor : w.ml) ? w : null,
    sodiumMg: usable(targets.sodiumMg) ? targets.sodiumMg : null,
    fluidCutoff:
      cutoff && /^([01]\d|2[0-3]):[0-5]\d$/.test(cutoff.time)
        ? { time: cutoff.time, allowanceMl: usable(cutoff.allowanceMl) ? cutoff.allowanceMl : 0 }
        : null,
    foodCutoff:
      food && clock(food.time)
        ? { time: food.time, allowanceKcal: usable(food.allowanceKcal) ? food.allowanceKcal : 0 }
        : null,
    fluidCap:
      cap && usable(cap.maxMl) && (cap.after === null || clock(cap.after))
        ? { maxMl: cap.maxMl, after: cap.after }
        : null,
    steps: usable(targets.steps) ? targets.steps : null,
    cardioMinutes: usable(targets.cardioMinutes) ? targets.cardioMinutes : null,
    supplements: targets.supplements
      .filter((s) => s.item.trim() !== '')
      .map((s) => ({
        ...s,
        dose: usable(s.dose) ? s.dose : null,
        times: s.times.filter((t) => /^([01]\d|2[0-3]):[0-5]\d$/.test(t)),
        ...(s.minutesBeforeEvent
          ? { minutesBeforeEvent: s.minutesBeforeEvent.filter((m) => usable(m) && m >= 0) }
          : {}),
      })),
    ...(targets.meals ? { meals: liveMeals(targets.meals) } : {}),
  };
}

/**
 * A schema or server path inside a DayTargets ("protein.pct", "supplements.0.times.1") → the form
 * path of the box that shows it ("protein.value", "supplements.0.times").
 */
export function targetsFormPath(path: string): string {
  const parts = path.split('.');
  const [head, second, third] = parts;
  if (
    head === 'energy' ||
    head === 'water' ||
    head === 'protein' ||
    head === 'carbohydrate' ||
    head === 'fat'
  ) {
    return `${head}.value`;
  }
  if (head === 'fluidCutoff')
    return second === 'allowanceMl' ? 'fluidCutoff.allowanceMl' : 'fluidCutoff.time';
  if (head === 'foodCutoff')
    return second === 'allowanceKcal' ? 'foodCutoff.allowanceKcal' : 'foodCutoff.time';
  if (head === 'fluidCap') return second === 'after' ? 'fluidCap.after' : 'fluidCap.maxMl';
  if (head === 'meals') {
    // meals.0.foods.1.quantityG → the quantity box; a meal's name and time are their own boxes.
    const [, , , food, field] = parts;
    if (third === 'foods' && food !== undefined) {
      const box = field === 'quantityG' || field === undefined || field === 'foodId' ? 'quantity' : field;
      return `meals.${second}.foods.${food}.${box}`;
    }
    return third === 'time' || third === 'name' ? `meals.${second}.${third}` : `meals.${second}.name`;
  }
  if (head === 'supplements') {
    if (second === undefined) return 'supplements';
    const field =
      third === 'id' || third === undefined
        ? 'item'
        : third === 'minutesBeforeEvent'
          ? 'beforeEventHours'
          : third;
    return `supplements.${second}.${field}`;
  }
  return head ?? path;
}

/** No baseline figures at all (the template editor, or an athlete with no intake yet). */
export const NO_BASELINE: PlanBaseline = {
  usualWaterMl: null,
  usualEnergyKcal: null,
  weightKg: null,
  sex: null,
};
