import type { MarkView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { markPath, patchCachedMark, type MarkWriteOptions } from './mark-cache';

/** POST /api/marks/:markId/read: the whole thread counts as read by the viewer from now. Answers the mark. */
export function markRead(markId: string): Promise<MarkView> {
  return api.post<MarkView>(markPath(markId, '/read'));
}

/**
 * Only the viewer's own read state changes, so the cached lists take the answered mark in place
 * instead of being refetched (a refetch per mark scrolled past would be wasteful). The linked keys,
 * such as the review queue, are invalidated.
 */
export function useMarkRead(athleteId: string, options: MarkWriteOptions<MarkView> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markRead,
    onSuccess: async (mark, markId) => {
      patchCachedMark(queryClient, athleteId, markId, (cached) => ({ ...cached, ...mark, unread: false }));
      await Promise.all(
        (options.linkedKeys ?? []).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      );
      options.onSuccess?.(mark);
    },
  });
}
