import type { FluidEntryRequest, FluidView } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryPath, useDayCache } from './day-cache';

/**
 * POST /api/athletes/:athleteId/days/:date/fluids: adds a drink and answers with the entry. The
 * body's clientId makes a repeat return the first entry (200) instead of a second one.
 */
export function createFluid(athleteId: string, date: string, body: FluidEntryRequest): Promise<FluidView> {
  return api.post<FluidView>(entryPath(athleteId, date, 'fluids'), body);
}

export function useCreateFluid(
  athleteId: string,
  date: string,
  options: { onSuccess?: (entry: FluidView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (body: FluidEntryRequest) => createFluid(athleteId, date, body),
    onSuccess: async (entry) => {
      await cache.entry(date, 'fluids', entry);
      options.onSuccess?.(entry);
    },
  });
}
