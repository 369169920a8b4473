import type { MealView, MealEntryRequest } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { WithoutClientId } from '../utils/form-values';
import { entryByIdPath, useDayCache } from './day-cache';

/** A meal is macros or foods: the update leaves out the client id from whichever it is. */
export type MealUpdate = WithoutClientId<MealEntryRequest>;

/** PATCH /api/athletes/:athleteId/meals/:entryId: the same fields as a create, less clientId. */
export function updateMeal(athleteId: string, entryId: string, body: MealUpdate): Promise<MealView> {
  return api.patch<MealView>(entryByIdPath(athleteId, 'meals', entryId), body);
}

/** `date` is the day the entry is on (an edit keeps its date). */
export function useUpdateMeal(
  athleteId: string,
  date: string,
  options: { onSuccess?: (entry: MealView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: MealUpdate }) =>
      updateMeal(athleteId, entryId, body),
    onSuccess: async (entry) => {
      await cache.entry(date, 'meals', entry);
      options.onSuccess?.(entry);
    },
  });
}
