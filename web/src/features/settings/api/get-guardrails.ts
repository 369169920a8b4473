import type { GuardrailFloors } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { guardrailKeys } from './keys';

/** GET /api/team/guardrails (staff): the team's energy and water floors per sex. */
export function getGuardrails(signal?: AbortSignal): Promise<WithAbilities<GuardrailFloors>> {
  return api.getWithAbilities<GuardrailFloors>('/api/team/guardrails', signal);
}

export function guardrailsQueryOptions() {
  return queryOptions({
    queryKey: guardrailKeys.floors,
    queryFn: ({ signal }) => getGuardrails(signal),
  });
}

export function useGuardrails(options: { enabled?: boolean } = {}) {
  return useQuery({ ...guardrailsQueryOptions(), enabled: options.enabled ?? true });
}
