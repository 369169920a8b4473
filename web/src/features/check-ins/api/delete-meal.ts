import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryByIdPath, useDayCache } from './day-cache';

/** DELETE /api/athletes/:athleteId/meals/:entryId (204). */
export function deleteMeal(athleteId: string, entryId: string): Promise<void> {
  return api.delete<void>(entryByIdPath(athleteId, 'meals', entryId));
}

/** `date` is the day the entry is on (the cached day it leaves). */
export function useDeleteMeal(athleteId: string, date: string, options: { onSuccess?: () => void } = {}) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (entryId: string) => deleteMeal(athleteId, entryId),
    onSuccess: async (_, entryId) => {
      await cache.removed(date, 'meals', entryId);
      options.onSuccess?.();
    },
  });
}
