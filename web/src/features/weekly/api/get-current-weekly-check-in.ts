import type { WeeklyCheckInView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { athleteWeeklyPath, weeklyKeys } from './keys';

/** GET /api/athletes/:athleteId/weekly-check-ins/current: the check-in due now (stored or computed). */
export function getCurrentWeeklyCheckIn(
  athleteId: string,
  signal?: AbortSignal,
): Promise<WithAbilities<WeeklyCheckInView>> {
  return api.getWithAbilities<WeeklyCheckInView>(`${athleteWeeklyPath(athleteId)}/current`, signal);
}

export function currentWeeklyCheckInQueryOptions(athleteId: string) {
  return queryOptions({
    queryKey: weeklyKeys.current(athleteId),
    queryFn: ({ signal }) => getCurrentWeeklyCheckIn(athleteId, signal),
  });
}

export function useCurrentWeeklyCheckIn(athleteId: string) {
  return useQuery({ ...currentWeeklyCheckInQueryOptions(athleteId), enabled: athleteId !== '' });
}
