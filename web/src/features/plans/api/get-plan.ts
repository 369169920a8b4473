import type { PlanView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { planKeys } from './keys';
import { planPath } from './plan-cache';

export type PlanAbilities = { edit: boolean };

/** GET /api/athletes/:athleteId/plan: the history, the versions in force and latest, the baseline. */
export function getPlan(athleteId: string, signal?: AbortSignal): Promise<WithAbilities<PlanView>> {
  return api.getWithAbilities<PlanView>(planPath(athleteId), signal);
}

export function planQueryOptions(athleteId: string) {
  return queryOptions({
    queryKey: planKeys.plan(athleteId),
    queryFn: ({ signal }) => getPlan(athleteId, signal),
  });
}

export function usePlan(athleteId: string) {
  return useQuery({ ...planQueryOptions(athleteId), enabled: athleteId !== '' });
}
