import type { CreateMarkRequest, MarkView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterMarkWrite, marksPath, type MarkWriteOptions } from './mark-cache';

/** POST /api/athletes/:athleteId/marks (staff who may annotate the athlete): pins a note to a date or range. */
export function createMark(athleteId: string, body: CreateMarkRequest): Promise<MarkView> {
  return api.post<MarkView>(marksPath(athleteId), body);
}

/** Pass the trend's key in `linkedKeys` so the chart draws the new mark. */
export function useCreateMark(athleteId: string, options: MarkWriteOptions<MarkView> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateMarkRequest) => createMark(athleteId, body),
    onSuccess: async (mark) => {
      await afterMarkWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(mark);
    },
  });
}
