import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryByIdPath, useDayCache } from './day-cache';

/** DELETE /api/athletes/:athleteId/fluids/:entryId (204). */
export function deleteFluid(athleteId: string, entryId: string): Promise<void> {
  return api.delete<void>(entryByIdPath(athleteId, 'fluids', entryId));
}

/** `date` is the day the entry is on (the cached day it leaves). */
export function useDeleteFluid(athleteId: string, date: string, options: { onSuccess?: () => void } = {}) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (entryId: string) => deleteFluid(athleteId, entryId),
    onSuccess: async (_, entryId) => {
      await cache.removed(date, 'fluids', entryId);
      options.onSuccess?.();
    },
  });
}
