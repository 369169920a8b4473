import type { AthleteProfile, IntakeRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { athleteKeys } from './keys';

/** PUT /api/athletes/:athleteId/intake (the athlete themself): all quantities in SI. */
export function submitIntake(athleteId: string, body: IntakeRequest): Promise<AthleteProfile> {
  return api.put<AthleteProfile>(`/api/athletes/${encodeURIComponent(athleteId)}/intake`, body);
}

export function useSubmitIntake(
  athleteId: string,
  options: { onSuccess?: (profile: AthleteProfile) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: IntakeRequest) => submitIntake(athleteId, body),
    onSuccess: async (profile) => {
      queryClient.setQueryData<WithAbilities<AthleteProfile>>(athleteKeys.detail(athleteId), (prev) =>
        prev ? { ...prev, data: profile } : prev,
      );
      await queryClient.invalidateQueries({ queryKey: athleteKeys.detail(athleteId) });
      options.onSuccess?.(profile);
    },
  });
}
