import type { DayView, SymptomReportRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { applyDayChange, entryPath } from './day-cache';

export interface SymptomReportResult {
  day: DayView;
  /** Set when the report names a symptom that stops the plan (the server also flags it for the coach). */
  urgentMessage: string | null;
}

/**
 * POST /api/athletes/:athleteId/days/:date/symptoms. An urgent report answers with
 * `meta.urgentMessage` beside the day; the clientId makes a repeat return the first report.
 */
export async function createSymptomReport(
  athleteId: string,
  date: string,
  body: SymptomReportRequest,
): Promise<SymptomReportResult> {
  const { data, meta } = await api.postWithMeta<DayView>(entryPath(athleteId, date, 'symptoms'), body);
  const message = meta.urgentMessage;
  return {
    day: data,
    urgentMessage: typeof message === 'string' && message ? message : null,
  };
}

export function useCreateSymptomReport(
  athleteId: string,
  date: string,
  options: { onSuccess?: (result: SymptomReportResult) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SymptomReportRequest) => createSymptomReport(athleteId, date, body),
    onSuccess: async (result) => {
      await applyDayChange(queryClient, athleteId, result.day);
      options.onSuccess?.(result);
    },
  });
}
