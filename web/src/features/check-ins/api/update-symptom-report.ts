import type { DayView, SymptomReportRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryByIdPath } from './day-cache';

export type SymptomReportUpdate = Omit<SymptomReportRequest, 'clientId'>;

/** PATCH /api/athletes/:athleteId/symptoms/:entryId: the same fields as a create, less clientId. */
export function updateSymptomReport(
  athleteId: string,
  entryId: string,
  body: SymptomReportUpdate,
): Promise<DayView> {
  return api.patch<DayView>(entryByIdPath(athleteId, 'symptoms', entryId), body);
}

export function useUpdateSymptomReport(
  athleteId: string,
  options: { onSuccess?: (day: DayView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: SymptomReportUpdate }) =>
      updateSymptomReport(athleteId, entryId, body),
    onSuccess: async (day) => {
      await applyDayChange(queryClient, athleteId, day);
      options.onSuccess?.(day);
    },
  });
}
