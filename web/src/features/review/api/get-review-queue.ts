import type { ReviewQueueItem } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

/**
 * GET /api/review-queue (staff): one row per athlete who needs attention, in the server's order
 * (safety first, then missed check-ins, drift, unread replies; oldest first within each).
 */
export function getReviewQueue(signal?: AbortSignal): Promise<ReviewQueueItem[]> {
  return api.get<ReviewQueueItem[]>('/api/review-queue', signal);
}

export function reviewQueueQueryOptions() {
  return queryOptions({
    queryKey: reviewKeys.queue(),
    queryFn: ({ signal }) => getReviewQueue(signal),
  });
}

export function useReviewQueue() {
  return useQuery(reviewQueueQueryOptions());
}
