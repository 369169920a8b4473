import type { DayView, FluidEntryRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryPath } from './day-cache';

/**
 * POST /api/athletes/:athleteId/days/:date/fluids: adds a drink. The body's clientId makes a repeat
 * return the first entry (200) instead of a second one.
 */
export function createFluid(athleteId: string, date: string, body: FluidEntryRequest): Promise<DayView> {
  return api.post<DayView>(entryPath(athleteId, date, 'fluids'), body);
}

export function useCreateFluid(
  athleteId: string,
  date: string,
  options: { onSuccess?: (day: DayView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: FluidEntryRequest) => createFluid(athleteId, date, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
