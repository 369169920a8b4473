import type { markReviewedResponse, ReviewQueueItem } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export type MarkReviewedResponse = z.infer<typeof markReviewedResponse>;

/** POST /api/review-queue/:athleteId/reviewed: clears the athlete's current items for the viewer. */
export function markReviewed(athleteId: string): Promise<MarkReviewedResponse> {
  return api.post<MarkReviewedResponse>(`/api/review-queue/${encodeURIComponent(athleteId)}/reviewed`);
}

/** Where the removed row stood, to put it back if the server refuses. */
interface RemovedRow {
  item: ReviewQueueItem | undefined;
  index: number;
}

/**
 * Removes the athlete from the cached queue at once (optimistic), puts the row back where it was
 * if the request fails, and refetches the queue once the last of several quick presses settles (an
 * earlier refetch would bring back rows whose requests are still on their way).
 */
export function useMarkReviewed(
  options: { onSuccess?: (result: MarkReviewedResponse) => void | Promise<void> } = {},
) {
  const queryClient = useQueryClient();
  const queueKey = reviewKeys.queue();
  return useMutation({
    mutationKey: reviewKeys.markReviewed(),
    mutationFn: (athleteId: string) => markReviewed(athleteId),
    onMutate: async (athleteId): Promise<RemovedRow> => {
      await queryClient.cancelQueries({ queryKey: queueKey });
      const rows = queryClient.getQueryData<ReviewQueueItem[]>(queueKey) ?? [];
      const index = rows.findIndex((row) => row.athleteId === athleteId);
      queryClient.setQueryData<ReviewQueueItem[]>(queueKey, (prev) =>
        prev?.filter((row) => row.athleteId !== athleteId),
      );
      return { item: rows[index], index };
    },
    onError: (_error, athleteId, removed) => {
      const item = removed?.item;
      if (!item) return;
      queryClient.setQueryData<ReviewQueueItem[]>(queueKey, (prev) => {
        if (!prev || prev.some((row) => row.athleteId === athleteId)) return prev;
        const next = prev.slice();
        next.splice(Math.min(removed.index, next.length), 0, item);
        return next;
      });
    },
    onSuccess: async (result) => {
      await options.onSuccess?.(result);
    },
    onSettled: async () => {
      // This mutation still counts as running inside its own onSettled.
      if (queryClient.isMutating({ mutationKey: reviewKeys.markReviewed() }) === 1) {
        await queryClient.invalidateQueries({ queryKey: reviewKeys.all });
      }
    },
  });
}
