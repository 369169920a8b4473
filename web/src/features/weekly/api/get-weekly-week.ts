import type { WeeklyCheckInView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { athleteWeeklyPath, weeklyKeys } from './keys';

/**
 * GET /api/athletes/:athleteId/weekly-check-ins/week/:dueDate: the check-in due on that date (stored,
 * or computed from the logs), with the week's range and figures as the server works them out.
 */
export function getWeeklyWeek(
  athleteId: string,
  dueDate: string,
  signal?: AbortSignal,
): Promise<WithAbilities<WeeklyCheckInView>> {
  return api.getWithAbilities<WeeklyCheckInView>(
    `${athleteWeeklyPath(athleteId)}/week/${encodeURIComponent(dueDate)}`,
    signal,
  );
}

export function weeklyWeekQueryOptions(athleteId: string, dueDate: string) {
  return queryOptions({
    queryKey: weeklyKeys.week(athleteId, dueDate),
    queryFn: ({ signal }) => getWeeklyWeek(athleteId, dueDate, signal),
  });
}

export function useWeeklyWeek(athleteId: string, dueDate: string, options: { enabled?: boolean } = {}) {
  return useQuery({
    ...weeklyWeekQueryOptions(athleteId, dueDate),
    enabled: athleteId !== '' && dueDate !== '' && (options.enabled ?? true),
  });
}
