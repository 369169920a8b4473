import type { CutView, RehearsalNoteRequest, RehearsalView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { cutKeys } from './keys';

/** PUT /api/athletes/:athleteId/cut-plans/:cutPlanId/note: one rehearsal day's note; answers the record. */
export function saveRehearsalNote(
  athleteId: string,
  cutPlanId: string,
  body: RehearsalNoteRequest,
): Promise<RehearsalView> {
  return api.put<RehearsalView>(
    `/api/athletes/${encodeURIComponent(athleteId)}/cut-plans/${encodeURIComponent(cutPlanId)}/note`,
    body,
  );
}

export function useSaveRehearsalNote(athleteId: string, cutPlanId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RehearsalNoteRequest) => saveRehearsalNote(athleteId, cutPlanId, body),
    onSuccess: (rehearsal) => {
      queryClient.setQueryData(cutKeys.detail(athleteId), (old: WithAbilities<CutView> | undefined) =>
        old ? { ...old, data: { ...old.data, rehearsal } } : old,
      );
    },
  });
}
