import type { WeeklyCheckInView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { athleteWeeklyPath, weeklyKeys } from './keys';

/** GET /api/athletes/:athleteId/weekly-check-ins: stored check-ins, newest first. */
export function listWeeklyCheckIns(
  athleteId: string,
  signal?: AbortSignal,
): Promise<WithAbilities<WeeklyCheckInView[]>> {
  return api.getWithAbilities<WeeklyCheckInView[]>(athleteWeeklyPath(athleteId), signal);
}

export function weeklyCheckInsQueryOptions(athleteId: string) {
  return queryOptions({
    queryKey: weeklyKeys.list(athleteId),
    queryFn: ({ signal }) => listWeeklyCheckIns(athleteId, signal),
  });
}

export function useWeeklyCheckIns(athleteId: string) {
  return useQuery({ ...weeklyCheckInsQueryOptions(athleteId), enabled: athleteId !== '' });
}
