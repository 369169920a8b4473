import type { UnsubscribeView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { notificationKeys } from './keys';

/** GET /api/unsubscribe?token= (public): which e-mail kind the link stops, for which address. */
export function getUnsubscribe(token: string, signal?: AbortSignal): Promise<UnsubscribeView> {
  return api.get<UnsubscribeView>(`/api/unsubscribe?token=${encodeURIComponent(token)}`, signal);
}

export function unsubscribeQueryOptions(token: string) {
  return queryOptions({
    queryKey: notificationKeys.unsubscribe(token),
    queryFn: ({ signal }) => getUnsubscribe(token, signal),
  });
}

export function useUnsubscribeView(token: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...unsubscribeQueryOptions(token), enabled: options.enabled ?? true });
}
