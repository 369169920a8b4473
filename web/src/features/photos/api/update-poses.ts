import type { z } from 'zod';
import type { posesRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { poseKeys } from './keys';

export type PosesRequest = z.input<typeof posesRequest>;

/** PUT /api/team/poses (owner or coach): replaces the team's own poses; answers the full list. */
export function updatePoses(body: PosesRequest): Promise<string[]> {
  return api.put<string[]>('/api/team/poses', body);
}

export function useUpdatePoses(options: { onSuccess?: (poses: string[]) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePoses,
    onSuccess: (poses) => {
      queryClient.setQueryData(poseKeys.all, poses);
      options.onSuccess?.(poses);
    },
  });
}
