import type { MealEntryRequest, MealView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryPath, useDayCache } from './day-cache';
import { foodKeys } from './keys';

/**
 * POST /api/athletes/:athleteId/days/:date/meals: adds a meal and answers with the entry. The
 * body's clientId makes a repeat return the first entry (200) instead of a second one.
 */
export function createMeal(athleteId: string, date: string, body: MealEntryRequest): Promise<MealView> {
  return api.post<MealView>(entryPath(athleteId, date, 'meals'), body);
}

export function useCreateMeal(
  athleteId: string,
  date: string,
  options: { onSuccess?: (entry: MealView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: MealEntryRequest) => createMeal(athleteId, date, body),
    onSuccess: async (entry) => {
      await cache.entry(date, 'meals', entry);
      // The foods just logged move up the recent and frequent list and the search ranking.
      if (entry.items.length > 0) void queryClient.invalidateQueries({ queryKey: foodKeys.all });
      options.onSuccess?.(entry);
    },
  });
}
