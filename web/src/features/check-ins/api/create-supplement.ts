import type { SupplementEntryRequest, SupplementView } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryPath, useDayCache } from './day-cache';

/**
 * POST /api/athletes/:athleteId/days/:date/supplements: adds a supplement taken and answers with the entry. The
 * body's clientId makes a repeat return the first entry (200) instead of a second one.
 */
export function createSupplement(
  athleteId: string,
  date: string,
  body: SupplementEntryRequest,
): Promise<SupplementView> {
  return api.post<SupplementView>(entryPath(athleteId, date, 'supplements'), body);
}

export function useCreateSupplement(
  athleteId: string,
  date: string,
  options: { onSuccess?: (entry: SupplementView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (body: SupplementEntryRequest) => createSupplement(athleteId, date, body),
    onSuccess: async (entry) => {
      await cache.entry(date, 'supplements', entry);
      options.onSuccess?.(entry);
    },
  });
}
