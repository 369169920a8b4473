import type { SubmitWeeklyCheckInRequest, WeeklyCheckInView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { athleteWeeklyPath, weeklyKeys } from './keys';

/** POST /api/athletes/:athleteId/weekly-check-ins (the athlete): creates or updates until answered. */
export function submitWeeklyCheckIn(
  athleteId: string,
  body: SubmitWeeklyCheckInRequest,
): Promise<WeeklyCheckInView> {
  return api.post<WeeklyCheckInView>(athleteWeeklyPath(athleteId), body);
}

export function useSubmitWeeklyCheckIn(
  athleteId: string,
  options: { onSuccess?: (view: WeeklyCheckInView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SubmitWeeklyCheckInRequest) => submitWeeklyCheckIn(athleteId, body),
    onSuccess: async (view) => {
      queryClient.setQueryData(
        weeklyKeys.current(athleteId),
        (old: { abilities: Record<string, boolean> } | undefined) => ({
          data: view,
          abilities: old?.abilities ?? {},
        }),
      );
      await queryClient.invalidateQueries({ queryKey: weeklyKeys.athlete(athleteId) });
      options.onSuccess?.(view);
    },
  });
}
