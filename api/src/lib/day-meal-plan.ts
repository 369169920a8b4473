import {
  isInProgress,
  mealPlanAdherence,
  mealPlanDayTotals,
  plannedMealTotals,
  type DayMealPlan,
  type PlannedMeal,
} from '@driftmark/shared';

/**
 * The day's meal plan as the day view carries it: each planned meal with its totals and the entry
 * logging it (the latest, if logged twice), the planned day's totals and the adherence verdict
 * (`mealPlanAdherence`, the shared rule). Null without planned meals, and for a day after the
 * athlete's today nothing is judged: like drift, a future day never counts as not logged.
 */
export function dayMealPlan(input: {
  planned: readonly PlannedMeal[];
  logged: readonly { id: string; plannedMealId: string | null }[];
  date: string;
  today: string;
}): DayMealPlan | null {
  if (input.planned.length === 0) return null;
  const entryOf = new Map<string, string>();
  for (const m of input.logged) if (m.plannedMealId) entryOf.set(m.plannedMealId, m.id);
  const meals = [...input.planned]
    .sort((a, b) => (a.time < b.time ? -1 : a.time > b.time ? 1 : 0))
    .map((meal) => ({
      ...meal,
      totals: plannedMealTotals(meal),
      loggedEntryId: entryOf.get(meal.id) ?? null,
    }));
  const logged = meals.filter((m) => m.loggedEntryId !== null).length;
  const future = input.date > input.today;
  const adherence = mealPlanAdherence({
    planned: meals.length,
    logged,
    anyMealLogged: input.logged.length > 0,
    // A future day reads like one in progress: shown, never judged.
    inProgress: future || isInProgress(input.date, input.today),
  });
  if (!adherence) return null;
  return { meals, totals: mealPlanDayTotals(meals), adherence };
}
