import type { Me, UpdateSettingsRequest } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** PATCH /api/me/settings: any subset of name, time zone and units; answers with the updated user. */
export function updateSettings(body: UpdateSettingsRequest): Promise<Me> {
  return api.patch<Me>('/api/me/settings', body);
}

/**
 * The signed-in user is cached by the auth feature; the app passes `onSuccess` to put the answer
 * there (features do not reach into each other's caches).
 */
export function useUpdateSettings(options: { onSuccess?: (me: Me) => void } = {}) {
  return useMutation({ mutationFn: updateSettings, onSuccess: (me) => options.onSuccess?.(me) });
}
