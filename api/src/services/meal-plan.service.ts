import {
  versionInForce,
  type DayTargets,
  type FitMealPlanRequest,
  type LogPlannedMealRequest,
  type MealPlanFit,
  type PlanContent,
  type PlannedPer100g,
} from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import type { MealEntry } from '../entities/meal-entry.entity.js';
import { notFound, validationFailed } from '../errors.js';
import { versionDay } from '../lib/day-plan.js';
import { localDateTime } from '../lib/local-time.js';
import { fitAnswer, fitQuantities, type FitFood } from '../lib/meal-plan-fit.js';
import type { Actor } from '../policies/actor.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { PlanRepository } from '../repositories/plan.repository.js';
import type { EntryResult } from './check-in.service.js';
import { logMealFromItems } from './meal-log.service.js';
import { resolveFoods, type ResolvedFood } from './food.service.js';

type Deps = { dataSource: DataSource; clock: () => Date };

/** What a planned food keeps of a food of the list. */
export function plannedPer100gOf(food: ResolvedFood): PlannedPer100g {
  return {
    energyKcal: food.per100g.energyKcal,
    proteinG: food.per100g.proteinG,
    carbohydrateG: food.per100g.carbohydrateG,
    fatG: food.per100g.fatG,
    sodiumMg: food.per100g.sodiumMg ?? null,
  };
}

/** Resolves each distinct food id once (reference foods from the table, team foods in the team). */
async function foodsById(
  manager: EntityManager,
  teamId: string,
  ids: Iterable<string>,
): Promise<Map<string, ResolvedFood | null>> {
  const keys = [...new Set([...ids].map((id) => id.toLowerCase()))];
  const resolved = await resolveFoods(manager, { id: null, teamId }, keys);
  return new Map(keys.map((key) => [key, resolved.get(key) ?? null]));
}

/**
 * Sets every planned food's name and per-100 g values from the team's food list, so a version or
 * template keeps the figures it was saved with; refuses (400, the field named by `path`) a food the
 * team has not. Returns the days' targets in the order given.
 */
export async function withPlannedFoods(
  manager: EntityManager,
  teamId: string,
  days: readonly { path: string; targets: DayTargets }[],
): Promise<DayTargets[]> {
  const ids = days.flatMap((d) => (d.targets.meals ?? []).flatMap((m) => m.foods.map((f) => f.foodId)));
  if (ids.length === 0) return days.map((d) => d.targets);
  const foods = await foodsById(manager, teamId, ids);
  const errors: Record<string, string> = {};
  const filled = days.map(({ path, targets }) =>
    targets.meals
      ? {
          ...targets,
          meals: targets.meals.map((meal, m) => ({
            ...meal,
            foods: meal.foods.map((f, i) => {
              const food = foods.get(f.foodId.toLowerCase());
              if (!food) {
                errors[`${path}.meals.${m}.foods.${i}.foodId`] = 'Choose a food from the list';
                return f;
              }
              return { ...f, foodId: food.id, name: food.name, per100g: plannedPer100gOf(food) };
            }),
          })),
        }
      : targets,
  );
  if (Object.keys(errors).length > 0) throw validationFailed(errors);
  return filled;
}

/** withPlannedFoods over a plan content's day types and dated days (paths under `content.`). */
export async function contentWithPlannedFoods(
  manager: EntityManager,
  teamId: string,
  content: PlanContent,
): Promise<PlanContent> {
  const n = content.dayTypes.length;
  const targets = await withPlannedFoods(manager, teamId, [
    ...content.dayTypes.map((t, i) => ({ path: `content.dayTypes.${i}.targets`, targets: t.targets })),
    ...content.dates.map((d, i) => ({ path: `content.dates.${i}.targets`, targets: d.targets })),
  ]);
  return {
    ...content,
    dayTypes: content.dayTypes.map((t, i) => ({ ...t, targets: targets[i] ?? t.targets })),
    dates: content.dates.map((d, i) => ({ ...d, targets: targets[n + i] ?? d.targets })),
  };
}

export class MealPlanService {
  constructor(private readonly deps: Deps) {}

  /**
   * Logs the day's planned meal `mealId` as eaten (its foods, or the changed ones the request
   * carries): 404 when the day's meal plan (its version's, as for the targets) has no such meal.
   * Without a time it is the planned time, or the athlete's clock now when that is still ahead.
   */
  async logPlannedMeal(
    athlete: AthleteWithPeople,
    date: string,
    mealId: string,
    input: LogPlannedMealRequest,
  ): Promise<EntryResult<MealEntry>> {
    const manager = this.deps.dataSource.manager;
    const version = versionInForce(await new PlanRepository(manager).listVersions(athlete.id), date);
    const meal = version ? versionDay(version, date).targets.meals?.find((m) => m.id === mealId) : undefined;
    if (!meal) throw notFound();
    const now = localDateTime(this.deps.clock(), athlete.user.timeZone);
    const time = input.time ?? (date === now.date && meal.time > now.time ? now.time : meal.time);
    const foods = input.foods ?? meal.foods.map((f) => ({ foodId: f.foodId, quantityG: f.quantityG }));
    // The athlete's own way of logging a meal of foods (same checks, nutrients as eaten, limits,
    // client-id idempotency); a bad food answers 400 naming `items.<i>.<field>`.
    return logMealFromItems(this.deps, athlete, date, {
      clientId: input.clientId,
      time,
      name: meal.name,
      items: foods.map((f) => ({ foodId: f.foodId, quantityG: f.quantityG })),
      plannedMealId: meal.id,
    });
  }

  /** Proposes quantities for the chosen foods (see lib/meal-plan-fit.ts); 400 for a food the team has not. */
  async fit(actor: Actor, input: FitMealPlanRequest): Promise<MealPlanFit> {
    const manager = this.deps.dataSource.manager;
    const foods = await foodsById(
      manager,
      actor.teamId,
      input.meals.flatMap((m) => m.foods.map((f) => f.foodId)),
    );
    const errors: Record<string, string> = {};
    const fitFoods: FitFood[] = [];
    input.meals.forEach((meal, m) =>
      meal.foods.forEach((f, i) => {
        const food = foods.get(f.foodId.toLowerCase());
        if (!food) {
          errors[`meals.${m}.foods.${i}.foodId`] = 'Choose a food from the list';
          return;
        }
        fitFoods.push({
          mealId: meal.id,
          foodId: food.id,
          per100g: plannedPer100gOf(food),
          minG: f.minG,
          maxG: f.maxG,
          stepG: f.stepG,
        });
      }),
    );
    if (Object.keys(errors).length > 0) throw validationFailed(errors);
    return fitAnswer(fitFoods, await fitQuantities(fitFoods, input.targets, input.tolerances));
  }
}
