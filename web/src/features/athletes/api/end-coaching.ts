import type { AthleteProfile } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { athleteKeys, rosterKeys } from './keys';

/** POST /api/athletes/:athleteId/end-coaching (the assigned coach or the owner). */
export function endCoaching(athleteId: string): Promise<AthleteProfile> {
  return api.post<AthleteProfile>(`/api/athletes/${encodeURIComponent(athleteId)}/end-coaching`);
}

export function useEndCoaching(athleteId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => endCoaching(athleteId),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: athleteKeys.detail(athleteId) }),
        queryClient.invalidateQueries({ queryKey: rosterKeys.all }),
      ]);
    },
  });
}
