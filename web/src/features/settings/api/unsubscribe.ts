import type { UnsubscribeView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { notificationKeys } from './keys';

/** POST /api/unsubscribe (public, the same call mail clients make for one-click unsubscribe). */
export function unsubscribe(token: string): Promise<UnsubscribeView | undefined> {
  return api.post<UnsubscribeView | undefined>('/api/unsubscribe', { token });
}

export function useUnsubscribe(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => unsubscribe(token),
    onSuccess: (view) => {
      queryClient.setQueryData<UnsubscribeView>(notificationKeys.unsubscribe(token), (prev) =>
        view ? { ...view, done: true } : prev ? { ...prev, done: true } : prev,
      );
      // A signed-in user's Settings shows the change when next opened.
      void queryClient.invalidateQueries({ queryKey: notificationKeys.preferences });
    },
  });
}
