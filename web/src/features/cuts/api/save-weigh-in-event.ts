import type { CutView, WeighInEventRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutKeys } from './keys';

/** PUT /api/athletes/:athleteId/weigh-in: the weigh-in's record; answers with the whole cut view. */
export function saveWeighInEvent(athleteId: string, body: WeighInEventRequest): Promise<CutView> {
  return api.put<CutView>(`/api/athletes/${encodeURIComponent(athleteId)}/weigh-in`, body);
}

export function useSaveWeighInEvent(athleteId: string, options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: WeighInEventRequest) => saveWeighInEvent(athleteId, body),
    onSuccess: async (view) => {
      queryClient.setQueryData(
        cutKeys.detail(athleteId),
        (old: { abilities: { plan: boolean } } | undefined) => (old ? { ...old, data: view } : old),
      );
      await queryClient.invalidateQueries({ queryKey: cutKeys.detail(athleteId) });
      options.onSuccess?.();
    },
  });
}
