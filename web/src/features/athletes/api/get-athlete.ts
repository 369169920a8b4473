import type { AthleteProfile } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { athleteKeys } from './keys';

export type AthleteAbilities = {
  update: boolean;
  delete: boolean;
  share: boolean;
  log: boolean;
  /** Write the athlete's plan (versions, countdowns). */
  plan: boolean;
};

/** GET /api/athletes/:athleteId: the profile and what the signed-in user may do with it. */
export async function getAthlete(
  athleteId: string,
  signal?: AbortSignal,
): Promise<WithAbilities<AthleteProfile>> {
  return api.getWithAbilities<AthleteProfile>(`/api/athletes/${encodeURIComponent(athleteId)}`, signal);
}

export function athleteQueryOptions(athleteId: string) {
  return queryOptions({
    queryKey: athleteKeys.detail(athleteId),
    queryFn: ({ signal }) => getAthlete(athleteId, signal),
  });
}

/** Waits while there is no id yet (a staff account has none of its own). */
export function useAthlete(athleteId: string) {
  return useQuery({ ...athleteQueryOptions(athleteId), enabled: athleteId !== '' });
}
