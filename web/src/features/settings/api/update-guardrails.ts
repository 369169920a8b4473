import type { GuardrailFloors } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { guardrailKeys } from './keys';

/** PUT /api/team/guardrails (owner): replaces the floors; answers with the saved floors. */
export function updateGuardrails(body: GuardrailFloors): Promise<GuardrailFloors> {
  return api.put<GuardrailFloors>('/api/team/guardrails', body);
}

export function useUpdateGuardrails(options: { onSuccess?: (floors: GuardrailFloors) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateGuardrails,
    onSuccess: async (floors) => {
      queryClient.setQueryData<WithAbilities<GuardrailFloors>>(guardrailKeys.floors, (prev) => ({
        data: floors,
        abilities: prev?.abilities ?? {},
      }));
      // Plan pages read the floors from the plan answer; those refresh when next opened.
      await queryClient.invalidateQueries({ queryKey: guardrailKeys.floors });
      options.onSuccess?.(floors);
    },
  });
}
