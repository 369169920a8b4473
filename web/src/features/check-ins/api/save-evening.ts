import type { DayView, EveningRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryPath } from './day-cache';

/** PUT /api/athletes/:athleteId/days/:date/evening: one per day, any subset. */
export function saveEvening(athleteId: string, date: string, body: EveningRequest): Promise<DayView> {
  return api.put<DayView>(entryPath(athleteId, date, 'evening'), body);
}

export function useSaveEvening(
  athleteId: string,
  date: string,
  options: { onSuccess?: (day: DayView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: EveningRequest) => saveEvening(athleteId, date, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
