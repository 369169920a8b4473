import { parseTypedNumber, toTypedText } from '@driftmark/shared';
import type { FoodView, PlannedFood, PlannedMeal, PlannedPer100g } from '@driftmark/shared';

/*
 * A day's meal plan as the coach types it: quantities and fitting bounds as text, so a half-typed
 * number never becomes NaN inside the form. The food's name and per-100 g values ride along for
 * the live figures; the server sets both from the food list on save.
 */

export interface PlannedFoodFormValues {
  foodId: string;
  name: string;
  per100g: PlannedPer100g;
  /** Grams. */
  quantity: string;
  /** Fitting bounds, grams (empty: the defaults, 0–400 g in steps of 5 g). */
  minG: string;
  maxG: string;
  stepG: string;
}

export interface MealFormValues {
  /** The planned meal's id (kept across versions; a logged meal points at it). */
  mealId: string;
  name: string;
  time: string;
  foods: PlannedFoodFormValues[];
}

const MEAL_NAMES = ['Breakfast', 'Lunch', 'Snack', 'Dinner', 'Supper'];
const MEAL_TIMES = ['08:00', '13:00', '16:30', '19:30', '21:30'];

/** A new meal, named and timed after the ones before it. */
export function newMealRow(index: number): MealFormValues {
  return {
    mealId: crypto.randomUUID(),
    name: MEAL_NAMES[index] ?? `Meal ${index + 1}`,
    time: MEAL_TIMES[index] ?? '12:00',
    foods: [],
  };
}

/** A food chosen from the list, with no quantity yet. */
export function plannedFoodRow(food: FoodView): PlannedFoodFormValues {
  return {
    foodId: food.id,
    name: food.name,
    per100g: {
      energyKcal: food.per100g.energyKcal,
      proteinG: food.per100g.proteinG,
      carbohydrateG: food.per100g.carbohydrateG,
      fatG: food.per100g.fatG,
      sodiumMg: food.per100g.sodiumMg,
    },
    quantity: '',
    minG: '',
    maxG: '',
    stepG: '',
  };
}

export function mealFormValues(m: PlannedMeal): MealFormValues {
  return {
    mealId: m.id,
    name: m.name,
    time: m.time,
    foods: m.foods.map((f) => ({
      foodId: f.foodId,
      name: f.name,
      per100g: f.per100g,
      quantity: toTypedText(f.quantityG, 1),
      minG: toTypedText(f.minG ?? null, 1),
      maxG: toTypedText(f.maxG ?? null, 1),
      stepG: toTypedText(f.stepG ?? null, 1),
    })),
  };
}

/**
 * The form's meals → the schema's, through `read` (the day form's number reader, which records
 * boxes that hold no number). A missing quantity stays undefined so the schema names the box.
 */
export function toPlannedMeals(
  meals: readonly MealFormValues[],
  read: (path: string, text: string) => number | undefined,
): PlannedMeal[] {
  return meals.map((m, i) => ({
    id: m.mealId,
    name: m.name.trim(),
    time: m.time,
    foods: m.foods.map((f, j): PlannedFood => {
      const path = `meals.${i}.foods.${j}`;
      const bound = (key: 'minG' | 'maxG' | 'stepG') => {
        const n = read(`${path}.${key}`, f[key]);
        return n === undefined ? {} : { [key]: n };
      };
      return {
        foodId: f.foodId,
        name: f.name,
        per100g: f.per100g,
        quantityG: read(`${path}.quantityG`, f.quantity) as number,
        ...bound('minG'),
        ...bound('maxG'),
        ...bound('stepG'),
      };
    }),
  }));
}

const usable = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);

/** What the typed meals say so far, for live figures: a quantity not (yet) a number counts as 0 g. */
export function liveMeals(meals: readonly PlannedMeal[]): PlannedMeal[] {
  return meals.map((m) => ({
    ...m,
    foods: m.foods.map((f) => ({ ...f, quantityG: usable(f.quantityG) ? f.quantityG : 0 })),
  }));
}

/** The typed grams of a box, for a fit's proposal written back (whole grams, or tenths). */
export function gramsText(g: number): string {
  return toTypedText(g, 1);
}

/** Reads a typed bound (empty → undefined; not a number → undefined, the box shows the error). */
export function typedBound(text: string): number | undefined {
  const n = parseTypedNumber(text);
  return n === undefined || Number.isNaN(n) ? undefined : n;
}
