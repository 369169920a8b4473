import type { SignedInDevice } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { sessionKeys } from './keys';

/** GET /api/me/sessions: the signed-in user's live devices, this one marked, most recently seen first. */
export function getSessions(signal?: AbortSignal): Promise<SignedInDevice[]> {
  return api.get<SignedInDevice[]>('/api/me/sessions', signal);
}

export function sessionsQueryOptions() {
  return queryOptions({
    queryKey: sessionKeys.devices,
    queryFn: ({ signal }) => getSessions(signal),
  });
}

export function useSessions() {
  return useQuery(sessionsQueryOptions());
}
