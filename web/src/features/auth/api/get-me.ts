import type { Me } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';
import { authKeys } from './keys';

/** GET /api/me: the signed-in user, or null when nobody is signed in (a 401 is an answer here). */
export async function getMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    return await api.get<Me>('/api/me', signal);
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: authKeys.me,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}
