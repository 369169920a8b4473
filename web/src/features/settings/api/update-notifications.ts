import type { NotificationPreferences } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { notificationKeys } from './keys';

/** PUT /api/me/notifications: replaces the user's e-mail choices; answers with the saved ones. */
export function updateNotifications(body: NotificationPreferences): Promise<NotificationPreferences> {
  return api.put<NotificationPreferences>('/api/me/notifications', body);
}

export function useUpdateNotifications(
  options: { onSuccess?: (prefs: NotificationPreferences) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNotifications,
    onSuccess: (prefs) => {
      queryClient.setQueryData(notificationKeys.preferences, prefs);
      options.onSuccess?.(prefs);
    },
  });
}
