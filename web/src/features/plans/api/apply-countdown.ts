import type { ApplyCountdownRequest, CountdownPreview, PlanVersionView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterPlanWrite, planPath, type PlanWriteOptions } from './plan-cache';

type ApplyBody = Omit<ApplyCountdownRequest, 'preview'>;

/** POST …/plan/countdown with preview: the dated days and warnings a template would give. Writes nothing. */
export function previewCountdown(athleteId: string, body: ApplyBody): Promise<CountdownPreview> {
  return api.post<CountdownPreview>(planPath(athleteId, '/countdown'), { ...body, preview: true });
}

/** POST …/plan/countdown: applies a template as a new version (201), every warning acknowledged. */
export function applyCountdown(athleteId: string, body: ApplyBody): Promise<PlanVersionView> {
  return api.post<PlanVersionView>(planPath(athleteId, '/countdown'), { ...body, preview: false });
}

export function usePreviewCountdown(athleteId: string) {
  return useMutation({ mutationFn: (body: ApplyBody) => previewCountdown(athleteId, body) });
}

export function useApplyCountdown(athleteId: string, options: PlanWriteOptions<PlanVersionView> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ApplyBody) => applyCountdown(athleteId, body),
    onSuccess: async (version) => {
      await afterPlanWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(version);
    },
  });
}
