import type { DayView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { checkInKeys } from './keys';

export function dayPath(athleteId: string, date: string): string {
  return `/api/athletes/${encodeURIComponent(athleteId)}/days/${encodeURIComponent(date)}`;
}

/** GET /api/athletes/:athleteId/days/:date: everything logged that day (the athlete's local date). */
export function getDay(
  athleteId: string,
  date: string,
  signal?: AbortSignal,
): Promise<WithAbilities<DayView>> {
  return api.getWithAbilities<DayView>(dayPath(athleteId, date), signal);
}

export function dayQueryOptions(athleteId: string, date: string) {
  return queryOptions({
    queryKey: checkInKeys.day(athleteId, date),
    queryFn: ({ signal }) => getDay(athleteId, date, signal),
  });
}

export function useDay(athleteId: string, date: string, options: { enabled?: boolean } = {}) {
  return useQuery({
    ...dayQueryOptions(athleteId, date),
    enabled: athleteId !== '' && date !== '' && (options.enabled ?? true),
  });
}
