import type { DayView, FluidEntryRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryByIdPath } from './day-cache';

export type FluidUpdate = Omit<FluidEntryRequest, 'clientId'>;

/** PATCH /api/athletes/:athleteId/fluids/:entryId: the same fields as a create, less clientId. */
export function updateFluid(athleteId: string, entryId: string, body: FluidUpdate): Promise<DayView> {
  return api.patch<DayView>(entryByIdPath(athleteId, 'fluids', entryId), body);
}

export function useUpdateFluid(athleteId: string, options: { onSuccess?: (day: DayView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: FluidUpdate }) =>
      updateFluid(athleteId, entryId, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
