import type { LabelFoodRequest, LabelFoodResult } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { LinkedKeys } from './keys';

/** Whose food a label makes: the team's (staff) or one athlete's personal food. */
export type LabelFoodOwner = { kind: 'team' } | { kind: 'personal'; athleteId: string };

/** POST /api/foods/label (staff) or POST /api/athletes/:athleteId/foods (the athlete). */
export function createLabelFood(owner: LabelFoodOwner, body: LabelFoodRequest): Promise<LabelFoodResult> {
  const path =
    owner.kind === 'team' ? '/api/foods/label' : `/api/athletes/${encodeURIComponent(owner.athleteId)}/foods`;
  return api.post<LabelFoodResult>(path, body);
}

export function useCreateLabelFood(
  owner: LabelFoodOwner,
  options: { linkedKeys?: LinkedKeys; onSuccess?: (result: LabelFoodResult) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: LabelFoodRequest) => createLabelFood(owner, body),
    onSuccess: async (result) => {
      await Promise.all(
        (options.linkedKeys ?? []).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      );
      options.onSuccess?.(result);
    },
  });
}
