import type { WeeklyCheckInView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { weeklyKeys } from './keys';

/** GET /api/weekly-check-ins/:checkInId: one stored check-in with figures, answers and the reply. */
export function getWeeklyCheckIn(
  checkInId: string,
  signal?: AbortSignal,
): Promise<WithAbilities<WeeklyCheckInView>> {
  return api.getWithAbilities<WeeklyCheckInView>(
    `/api/weekly-check-ins/${encodeURIComponent(checkInId)}`,
    signal,
  );
}

export function weeklyCheckInQueryOptions(checkInId: string) {
  return queryOptions({
    queryKey: weeklyKeys.detail(checkInId),
    queryFn: ({ signal }) => getWeeklyCheckIn(checkInId, signal),
  });
}

export function useWeeklyCheckIn(checkInId: string) {
  return useQuery({ ...weeklyCheckInQueryOptions(checkInId), enabled: checkInId !== '' });
}
