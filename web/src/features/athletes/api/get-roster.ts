import type { RosterRow } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { rosterKeys } from './keys';

/** GET /api/roster (staff): the athletes the signed-in coach may see, nearest event first. */
export function getRoster(signal?: AbortSignal): Promise<RosterRow[]> {
  return api.get<RosterRow[]>('/api/roster', signal);
}

export function rosterQueryOptions() {
  return queryOptions({
    queryKey: rosterKeys.all,
    queryFn: ({ signal }) => getRoster(signal),
  });
}

export function useRoster() {
  return useQuery(rosterQueryOptions());
}
