import type { CreateCutPlanRequest, CutView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutKeys } from './keys';

/** POST /api/athletes/:athleteId/cut-plans: 409 `guardrails_unacknowledged` lists warnings by key and whole. */
export function createCutPlan(athleteId: string, body: CreateCutPlanRequest): Promise<CutView> {
  return api.post<CutView>(`/api/athletes/${encodeURIComponent(athleteId)}/cut-plans`, body);
}

export function useCreateCutPlan(athleteId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateCutPlanRequest) => createCutPlan(athleteId, body),
    onSuccess: async (view) => {
      queryClient.setQueryData(
        cutKeys.detail(athleteId),
        (old: { abilities: { plan: boolean } } | undefined) => (old ? { ...old, data: view } : old),
      );
      await queryClient.invalidateQueries({ queryKey: cutKeys.detail(athleteId) });
    },
  });
}
