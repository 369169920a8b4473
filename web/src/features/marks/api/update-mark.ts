import type { MarkView, UpdateMarkRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterMarkWrite, markPath, type MarkWriteOptions } from './mark-cache';

/** PATCH /api/marks/:markId (the author only): edits the note. */
export function updateMark(markId: string, body: UpdateMarkRequest): Promise<MarkView> {
  return api.patch<MarkView>(markPath(markId), body);
}

export function useUpdateMark(athleteId: string, options: MarkWriteOptions<MarkView> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ markId, body }: { markId: string; body: UpdateMarkRequest }) => updateMark(markId, body),
    onSuccess: async (mark) => {
      await afterMarkWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(mark);
    },
  });
}
