import type { DayView, WeighInRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryPath } from './day-cache';

/** PUT /api/athletes/:athleteId/days/:date/weigh-in: one per day, a repeat replaces it. */
export function saveWeighIn(athleteId: string, date: string, body: WeighInRequest): Promise<DayView> {
  return api.put<DayView>(entryPath(athleteId, date, 'weigh-in'), body);
}

export function useSaveWeighIn(
  athleteId: string,
  date: string,
  options: { onSuccess?: (day: DayView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: WeighInRequest) => saveWeighIn(athleteId, date, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
