import type { DayView, MealEntryRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { WithoutClientId } from '../utils/form-values';
import { applyDayChange, entryByIdPath } from './day-cache';

/** A meal is macros or a food: the update leaves out the client id from whichever it is. */
export type MealUpdate = WithoutClientId<MealEntryRequest>;

/** PATCH /api/athletes/:athleteId/meals/:entryId: the same fields as a create, less clientId. */
export function updateMeal(athleteId: string, entryId: string, body: MealUpdate): Promise<DayView> {
  return api.patch<DayView>(entryByIdPath(athleteId, 'meals', entryId), body);
}

export function useUpdateMeal(athleteId: string, options: { onSuccess?: (day: DayView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: MealUpdate }) =>
      updateMeal(athleteId, entryId, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
