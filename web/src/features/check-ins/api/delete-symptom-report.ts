import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryByIdPath, useDayCache } from './day-cache';

/** DELETE /api/athletes/:athleteId/symptoms/:entryId (204). */
export function deleteSymptomReport(athleteId: string, entryId: string): Promise<void> {
  return api.delete<void>(entryByIdPath(athleteId, 'symptoms', entryId));
}

/** `date` is the day the report is on (the cached day it leaves). */
export function useDeleteSymptomReport(
  athleteId: string,
  date: string,
  options: { onSuccess?: () => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (entryId: string) => deleteSymptomReport(athleteId, entryId),
    onSuccess: async (_, entryId) => {
      await cache.removed(date, 'symptoms', entryId);
      options.onSuccess?.();
    },
  });
}
