import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryPath, useDayCache } from './day-cache';

/** DELETE /api/athletes/:athleteId/days/:date/weigh-in (204). */
export function deleteWeighIn(athleteId: string, date: string): Promise<void> {
  return api.delete<void>(entryPath(athleteId, date, 'weigh-in'));
}

export function useDeleteWeighIn(athleteId: string, date: string, options: { onSuccess?: () => void } = {}) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: () => deleteWeighIn(athleteId, date),
    onSuccess: async () => {
      await cache.part(date, 'weighIn', null);
      options.onSuccess?.();
    },
  });
}
