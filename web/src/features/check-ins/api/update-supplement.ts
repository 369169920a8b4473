import type { DayView, SupplementEntryRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryByIdPath } from './day-cache';

export type SupplementUpdate = Omit<SupplementEntryRequest, 'clientId'>;

/** PATCH /api/athletes/:athleteId/supplements/:entryId: the same fields as a create, less clientId. */
export function updateSupplement(
  athleteId: string,
  entryId: string,
  body: SupplementUpdate,
): Promise<DayView> {
  return api.patch<DayView>(entryByIdPath(athleteId, 'supplements', entryId), body);
}

export function useUpdateSupplement(athleteId: string, options: { onSuccess?: (day: DayView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: SupplementUpdate }) =>
      updateSupplement(athleteId, entryId, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
