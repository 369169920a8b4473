import type { CheckInDayRequest } from '@driftmark/shared';
import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { weeklyKeys } from './keys';

/** PATCH /api/athletes/:athleteId/check-in-day (staff who may update the athlete). */
export function updateCheckInDay(athleteId: string, body: CheckInDayRequest): Promise<unknown> {
  return api.patch<unknown>(`/api/athletes/${encodeURIComponent(athleteId)}/check-in-day`, body);
}

/** Pass the athlete profile's key in `linkedKeys` (it lives in another feature). */
export function useUpdateCheckInDay(
  athleteId: string,
  options: { onSuccess?: () => void; linkedKeys?: QueryKey[] } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CheckInDayRequest) => updateCheckInDay(athleteId, body),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: weeklyKeys.athlete(athleteId) }),
        ...(options.linkedKeys ?? []).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      ]);
      options.onSuccess?.();
    },
  });
}
