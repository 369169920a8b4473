import type { AthleteProfile, UpdateEventRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterPlanWrite, type PlanWriteOptions } from './plan-cache';

export interface UpdateEventResult {
  /** The profile after the change; `countdownMismatch` says when the countdown now aims elsewhere. */
  athlete: AthleteProfile;
}

/** PATCH /api/athletes/:athleteId/event: the coach changes the event date (and time, name). */
export function updateEvent(athleteId: string, body: UpdateEventRequest): Promise<UpdateEventResult> {
  return api.patch<UpdateEventResult>(`/api/athletes/${encodeURIComponent(athleteId)}/event`, body);
}

/** Pass the athlete profile's key in `linkedKeys` (it lives in another feature). */
export function useUpdateEvent(athleteId: string, options: PlanWriteOptions<UpdateEventResult> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateEventRequest) => updateEvent(athleteId, body),
    onSuccess: async (result) => {
      // The guardrail context (event date, make-weight rate) is part of the plan view.
      await afterPlanWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(result);
    },
  });
}
