import type { DayView, SupplementEntryRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryPath } from './day-cache';

/**
 * POST /api/athletes/:athleteId/days/:date/supplements: adds a supplement taken. The body's clientId makes a repeat
 * return the first entry (200) instead of a second one.
 */
export function createSupplement(
  athleteId: string,
  date: string,
  body: SupplementEntryRequest,
): Promise<DayView> {
  return api.post<DayView>(entryPath(athleteId, date, 'supplements'), body);
}

export function useCreateSupplement(
  athleteId: string,
  date: string,
  options: { onSuccess?: (day: DayView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SupplementEntryRequest) => createSupplement(athleteId, date, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
