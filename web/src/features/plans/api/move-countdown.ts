import type { CountdownPreview, MoveCountdownRequest, PlanVersionView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterPlanWrite, planPath, type PlanWriteOptions } from './plan-cache';

type MoveBody = Omit<MoveCountdownRequest, 'preview'>;

/**
 * POST …/plan/countdown/move with preview: the latest version's countdown shifted to a new event
 * date. 409 conflict when the latest version has no countdown.
 */
export function previewMoveCountdown(athleteId: string, body: MoveBody): Promise<CountdownPreview> {
  return api.post<CountdownPreview>(planPath(athleteId, '/countdown/move'), { ...body, preview: true });
}

export function moveCountdown(athleteId: string, body: MoveBody): Promise<PlanVersionView> {
  return api.post<PlanVersionView>(planPath(athleteId, '/countdown/move'), { ...body, preview: false });
}

export function usePreviewMoveCountdown(athleteId: string) {
  return useMutation({ mutationFn: (body: MoveBody) => previewMoveCountdown(athleteId, body) });
}

export function useMoveCountdown(athleteId: string, options: PlanWriteOptions<PlanVersionView> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: MoveBody) => moveCountdown(athleteId, body),
    onSuccess: async (version) => {
      await afterPlanWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(version);
    },
  });
}
