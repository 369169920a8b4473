import type { SupplementView, SupplementEntryRequest } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryByIdPath, useDayCache } from './day-cache';

export type SupplementUpdate = Omit<SupplementEntryRequest, 'clientId'>;

/** PATCH /api/athletes/:athleteId/supplements/:entryId: the same fields as a create, less clientId. */
export function updateSupplement(
  athleteId: string,
  entryId: string,
  body: SupplementUpdate,
): Promise<SupplementView> {
  return api.patch<SupplementView>(entryByIdPath(athleteId, 'supplements', entryId), body);
}

/** `date` is the day the entry is on (an edit keeps its date). */
export function useUpdateSupplement(
  athleteId: string,
  date: string,
  options: { onSuccess?: (entry: SupplementView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: SupplementUpdate }) =>
      updateSupplement(athleteId, entryId, body),
    onSuccess: async (entry) => {
      await cache.entry(date, 'supplements', entry);
      options.onSuccess?.(entry);
    },
  });
}
