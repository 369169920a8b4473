import type { DayView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryByIdPath } from './day-cache';

/** DELETE /api/athletes/:athleteId/symptoms/:entryId */
export function deleteSymptomReport(athleteId: string, entryId: string): Promise<DayView> {
  return api.delete<DayView>(entryByIdPath(athleteId, 'symptoms', entryId));
}

export function useDeleteSymptomReport(
  athleteId: string,
  options: { onSuccess?: (day: DayView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (entryId: string) => deleteSymptomReport(athleteId, entryId),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
