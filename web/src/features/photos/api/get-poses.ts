import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { poseKeys } from './keys';

/** GET /api/team/poses: the three relaxed poses, then the team's own. */
export function getPoses(signal?: AbortSignal): Promise<string[]> {
  return api.get<string[]>('/api/team/poses', signal);
}

export function posesQueryOptions() {
  return queryOptions({
    queryKey: poseKeys.all,
    queryFn: ({ signal }) => getPoses(signal),
    staleTime: 5 * 60_000,
  });
}

export function usePoses() {
  return useQuery(posesQueryOptions());
}
