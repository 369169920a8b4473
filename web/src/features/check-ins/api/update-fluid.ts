import type { FluidView, FluidEntryRequest } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryByIdPath, useDayCache } from './day-cache';

export type FluidUpdate = Omit<FluidEntryRequest, 'clientId'>;

/** PATCH /api/athletes/:athleteId/fluids/:entryId: the same fields as a create, less clientId. */
export function updateFluid(athleteId: string, entryId: string, body: FluidUpdate): Promise<FluidView> {
  return api.patch<FluidView>(entryByIdPath(athleteId, 'fluids', entryId), body);
}

/** `date` is the day the entry is on (an edit keeps its date). */
export function useUpdateFluid(
  athleteId: string,
  date: string,
  options: { onSuccess?: (entry: FluidView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: FluidUpdate }) =>
      updateFluid(athleteId, entryId, body),
    onSuccess: async (entry) => {
      await cache.entry(date, 'fluids', entry);
      options.onSuccess?.(entry);
    },
  });
}
