import type { CreateReplyRequest, MarkView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterMarkWrite, markPath, type MarkWriteOptions } from './mark-cache';

/**
 * POST /api/marks/:markId/replies (the athlete themself, or staff who can read the athlete): adds a
 * reply and counts the thread as read by its writer. Answers the whole mark with its thread.
 */
export function replyToMark(markId: string, body: CreateReplyRequest): Promise<MarkView> {
  return api.post<MarkView>(markPath(markId, '/replies'), body);
}

/** Pass the review queue's key in `linkedKeys` when staff reply (the queue lists unread replies). */
export function useReplyToMark(athleteId: string, options: MarkWriteOptions<MarkView> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ markId, body }: { markId: string; body: CreateReplyRequest }) => replyToMark(markId, body),
    onSuccess: async (mark) => {
      await afterMarkWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(mark);
    },
  });
}
