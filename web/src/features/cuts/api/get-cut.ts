import type { CutView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { cutKeys } from './keys';

/**
 * `plan`: build plans and edit the weigh-in; `log`: tick the recovery checklist (the athlete);
 * `noteRehearsal`: write a practice run's day notes.
 */
export type CutAbilities = { plan: boolean; log?: boolean; noteRehearsal: boolean };

/** GET /api/athletes/:athleteId/cut: the weigh-in, the projection against its limit, the cut plan. */
export function getCut(athleteId: string, signal?: AbortSignal): Promise<WithAbilities<CutView>> {
  return api.getWithAbilities<CutView>(`/api/athletes/${encodeURIComponent(athleteId)}/cut`, signal);
}

export function cutQueryOptions(athleteId: string) {
  return queryOptions({
    queryKey: cutKeys.detail(athleteId),
    queryFn: ({ signal }) => getCut(athleteId, signal),
  });
}

export function useCut(athleteId: string) {
  return useQuery({ ...cutQueryOptions(athleteId), enabled: athleteId !== '' });
}
