import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryByIdPath, useDayCache } from './day-cache';

/** DELETE /api/athletes/:athleteId/supplements/:entryId (204). */
export function deleteSupplement(athleteId: string, entryId: string): Promise<void> {
  return api.delete<void>(entryByIdPath(athleteId, 'supplements', entryId));
}

/** `date` is the day the entry is on (the cached day it leaves). */
export function useDeleteSupplement(
  athleteId: string,
  date: string,
  options: { onSuccess?: () => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (entryId: string) => deleteSupplement(athleteId, entryId),
    onSuccess: async (_, entryId) => {
      await cache.removed(date, 'supplements', entryId);
      options.onSuccess?.();
    },
  });
}
