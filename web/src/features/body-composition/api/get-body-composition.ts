import type { BodyCompositionView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { bodyCompositionKeys } from './keys';

export function bodyCompositionPath(athleteId: string, rest = '/body-composition'): string {
  return `/api/athletes/${encodeURIComponent(athleteId)}${rest}`;
}

/** GET /api/athletes/:athleteId/body-composition: measurements, estimates, masses and `measure`. */
export function getBodyComposition(
  athleteId: string,
  signal?: AbortSignal,
): Promise<WithAbilities<BodyCompositionView>> {
  return api.getWithAbilities<BodyCompositionView>(bodyCompositionPath(athleteId), signal);
}

export function bodyCompositionQueryOptions(athleteId: string) {
  return queryOptions({
    queryKey: bodyCompositionKeys.athlete(athleteId),
    queryFn: ({ signal }) => getBodyComposition(athleteId, signal),
  });
}

export function useBodyComposition(athleteId: string) {
  return useQuery({ ...bodyCompositionQueryOptions(athleteId), enabled: athleteId !== '' });
}
