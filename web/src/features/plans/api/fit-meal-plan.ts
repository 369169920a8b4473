import type { FitMealPlanRequest, MealPlanFit } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/**
 * POST /api/meal-plans/fit: the server's proposal of grams for the chosen foods against the day's
 * energy and macros, with what cannot be met. Writes nothing.
 */
export function fitMealPlan(body: FitMealPlanRequest): Promise<MealPlanFit> {
  return api.post<MealPlanFit>('/api/meal-plans/fit', body);
}

export function useFitMealPlan() {
  return useMutation({ mutationFn: fitMealPlan });
}
