import type { EveningRequest, EveningView } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryPath, useDayCache } from './day-cache';

/** PUT /api/athletes/:athleteId/days/:date/evening: one per day, any subset; answers with the card as saved. */
export function saveEvening(athleteId: string, date: string, body: EveningRequest): Promise<EveningView> {
  return api.put<EveningView>(entryPath(athleteId, date, 'evening'), body);
}

export function useSaveEvening(
  athleteId: string,
  date: string,
  options: { onSuccess?: (evening: EveningView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (body: EveningRequest) => saveEvening(athleteId, date, body),
    onSuccess: async (evening) => {
      await cache.part(date, 'evening', evening);
      options.onSuccess?.(evening);
    },
  });
}
