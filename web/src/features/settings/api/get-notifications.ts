import type { NotificationPreferences } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { notificationKeys } from './keys';

/** GET /api/me/notifications: which e-mails the signed-in user gets, and (athletes) the reminder hour. */
export function getNotifications(signal?: AbortSignal): Promise<NotificationPreferences> {
  return api.get<NotificationPreferences>('/api/me/notifications', signal);
}

export function notificationsQueryOptions() {
  return queryOptions({
    queryKey: notificationKeys.preferences,
    queryFn: ({ signal }) => getNotifications(signal),
  });
}

export function useNotifications() {
  return useQuery(notificationsQueryOptions());
}
