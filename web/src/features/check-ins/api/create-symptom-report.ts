import type { SymptomReportRequest, SymptomView } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryPath, useDayCache } from './day-cache';

export interface SymptomReportResult {
  report: SymptomView;
  /** Set when the report names a symptom that stops the plan (the server also flags it for the coach). */
  urgentMessage: string | null;
}

/**
 * POST /api/athletes/:athleteId/days/:date/symptoms. An urgent report answers with
 * `meta.urgentMessage` beside the report; the clientId makes a repeat return the first report.
 */
export async function createSymptomReport(
  athleteId: string,
  date: string,
  body: SymptomReportRequest,
): Promise<SymptomReportResult> {
  const { data, meta } = await api.postWithMeta<SymptomView>(entryPath(athleteId, date, 'symptoms'), body);
  const message = meta.urgentMessage;
  return {
    report: data,
    urgentMessage: typeof message === 'string' && message ? message : null,
  };
}

export function useCreateSymptomReport(
  athleteId: string,
  date: string,
  options: { onSuccess?: (result: SymptomReportResult) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (body: SymptomReportRequest) => createSymptomReport(athleteId, date, body),
    onSuccess: async (result) => {
      await cache.entry(date, 'symptoms', result.report);
      options.onSuccess?.(result);
    },
  });
}
