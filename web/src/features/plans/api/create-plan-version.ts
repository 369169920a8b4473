import type { CreatePlanVersionRequest, PlanVersionView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterPlanWrite, planPath, type PlanWriteOptions } from './plan-cache';

/**
 * POST /api/athletes/:athleteId/plan/versions: saves a new version. Every current guardrail warning
 * must be in `acknowledgedKeys`, else 409 guardrails_unacknowledged with the missing ones in `fields`
 * (key → message) and whole in `warnings`.
 */
export function createPlanVersion(
  athleteId: string,
  body: CreatePlanVersionRequest,
): Promise<PlanVersionView> {
  return api.post<PlanVersionView>(planPath(athleteId, '/versions'), body);
}

export function useCreatePlanVersion(athleteId: string, options: PlanWriteOptions<PlanVersionView> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreatePlanVersionRequest) => createPlanVersion(athleteId, body),
    onSuccess: async (version) => {
      await afterPlanWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(version);
    },
  });
}
