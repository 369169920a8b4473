import type { PlanVersionView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { planKeys } from './keys';
import { planPath } from './plan-cache';

/** GET /api/athletes/:athleteId/plan/versions/:versionId: one version's content and acknowledgements. */
export function getPlanVersion(
  athleteId: string,
  versionId: string,
  signal?: AbortSignal,
): Promise<PlanVersionView> {
  return api.get<PlanVersionView>(planPath(athleteId, `/versions/${encodeURIComponent(versionId)}`), signal);
}

export function planVersionQueryOptions(athleteId: string, versionId: string) {
  return queryOptions({
    queryKey: planKeys.version(athleteId, versionId),
    queryFn: ({ signal }) => getPlanVersion(athleteId, versionId, signal),
    // A saved version never changes.
    staleTime: Infinity,
  });
}

export function usePlanVersion(athleteId: string, versionId: string | null) {
  return useQuery({
    ...planVersionQueryOptions(athleteId, versionId ?? ''),
    enabled: athleteId !== '' && Boolean(versionId),
  });
}
