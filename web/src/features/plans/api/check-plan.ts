import type { CheckPlanRequest, PlanCheckResult } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { planPath } from './plan-cache';

/**
 * POST /api/athletes/:athleteId/plan/check: the server's refusals and guardrail warnings for a
 * draft, so the acknowledgement step lists exactly what the save will demand. Writes nothing.
 */
export function checkPlan(athleteId: string, body: CheckPlanRequest): Promise<PlanCheckResult> {
  return api.post<PlanCheckResult>(planPath(athleteId, '/check'), body);
}

export function useCheckPlan(athleteId: string) {
  return useMutation({ mutationFn: (body: CheckPlanRequest) => checkPlan(athleteId, body) });
}
