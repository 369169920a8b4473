import type { ReplyWeeklyCheckInRequest, WeeklyCheckInView } from '@driftmark/shared';
import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { weeklyKeys } from './keys';

/** POST /api/weekly-check-ins/:checkInId/reply (staff who may annotate the athlete). */
export function replyWeeklyCheckIn(
  checkInId: string,
  body: ReplyWeeklyCheckInRequest,
): Promise<WeeklyCheckInView> {
  return api.post<WeeklyCheckInView>(`/api/weekly-check-ins/${encodeURIComponent(checkInId)}/reply`, body);
}

/** Pass the review queue's key in `linkedKeys` (it lives in another feature). */
export function useReplyWeeklyCheckIn(
  athleteId: string,
  checkInId: string,
  options: { onSuccess?: (view: WeeklyCheckInView) => void; linkedKeys?: QueryKey[] } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReplyWeeklyCheckInRequest) => replyWeeklyCheckIn(checkInId, body),
    onSuccess: async (view) => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: weeklyKeys.athlete(athleteId) }),
        queryClient.invalidateQueries({ queryKey: weeklyKeys.detail(checkInId) }),
        ...(options.linkedKeys ?? []).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      ]);
      options.onSuccess?.(view);
    },
  });
}
