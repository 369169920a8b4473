import type { SymptomView, SymptomReportRequest } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryByIdPath, useDayCache } from './day-cache';

export type SymptomReportUpdate = Omit<SymptomReportRequest, 'clientId'>;

/** PATCH /api/athletes/:athleteId/symptoms/:entryId: the same fields as a create, less clientId. */
export function updateSymptomReport(
  athleteId: string,
  entryId: string,
  body: SymptomReportUpdate,
): Promise<SymptomView> {
  return api.patch<SymptomView>(entryByIdPath(athleteId, 'symptoms', entryId), body);
}

/** `date` is the day the entry is on (an edit keeps its date). */
export function useUpdateSymptomReport(
  athleteId: string,
  date: string,
  options: { onSuccess?: (entry: SymptomView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: SymptomReportUpdate }) =>
      updateSymptomReport(athleteId, entryId, body),
    onSuccess: async (entry) => {
      await cache.entry(date, 'symptoms', entry);
      options.onSuccess?.(entry);
    },
  });
}
