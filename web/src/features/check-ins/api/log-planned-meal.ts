import type { LogPlannedMealRequest, MealView } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryPath, useDayCache } from './day-cache';

/**
 * POST /api/athletes/:athleteId/days/:date/planned-meals/:mealId: logs a planned meal as eaten
 * (its foods, or the changed ones sent) and answers with the meal entry; the clientId makes a
 * repeat return the first entry.
 */
export function logPlannedMeal(
  athleteId: string,
  date: string,
  mealId: string,
  body: LogPlannedMealRequest,
): Promise<MealView> {
  return api.post<MealView>(
    `${entryPath(athleteId, date, 'planned-meals')}/${encodeURIComponent(mealId)}`,
    body,
  );
}

export function useLogPlannedMeal(athleteId: string, date: string) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: ({ mealId, body }: { mealId: string; body: LogPlannedMealRequest }) =>
      logPlannedMeal(athleteId, date, mealId, body),
    onSuccess: (entry) => cache.entry(date, 'meals', entry),
  });
}
