import type { DayView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryPath } from './day-cache';

/** DELETE /api/athletes/:athleteId/days/:date/weigh-in */
export function deleteWeighIn(athleteId: string, date: string): Promise<DayView> {
  return api.delete<DayView>(entryPath(athleteId, date, 'weigh-in'));
}

export function useDeleteWeighIn(
  athleteId: string,
  date: string,
  options: { onSuccess?: (day: DayView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteWeighIn(athleteId, date),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
