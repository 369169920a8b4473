import type { WeighInRequest, WeighInView } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { entryPath, useDayCache } from './day-cache';

/** PUT /api/athletes/:athleteId/days/:date/weigh-in: one per day, a repeat replaces it. */
export function saveWeighIn(athleteId: string, date: string, body: WeighInRequest): Promise<WeighInView> {
  return api.put<WeighInView>(entryPath(athleteId, date, 'weigh-in'), body);
}

export function useSaveWeighIn(
  athleteId: string,
  date: string,
  options: { onSuccess?: (weighIn: WeighInView) => void } = {},
) {
  const cache = useDayCache(athleteId);
  return useMutation({
    mutationFn: (body: WeighInRequest) => saveWeighIn(athleteId, date, body),
    onSuccess: async (weighIn) => {
      await cache.part(date, 'weighIn', weighIn);
      options.onSuccess?.(weighIn);
    },
  });
}
