import type { DayView, MealEntryRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryPath } from './day-cache';

/**
 * POST /api/athletes/:athleteId/days/:date/meals: adds a meal. The body's clientId makes a repeat
 * return the first entry (200) instead of a second one.
 */
export function createMeal(athleteId: string, date: string, body: MealEntryRequest): Promise<DayView> {
  return api.post<DayView>(entryPath(athleteId, date, 'meals'), body);
}

export function useCreateMeal(
  athleteId: string,
  date: string,
  options: { onSuccess?: (day: DayView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: MealEntryRequest) => createMeal(athleteId, date, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
