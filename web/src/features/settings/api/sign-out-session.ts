import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { sessionKeys } from './keys';

/** DELETE /api/me/sessions/:id: signs one of the user's own devices out. */
export function signOutSession(id: string): Promise<void> {
  return api.delete(`/api/me/sessions/${encodeURIComponent(id)}`);
}

export function useSignOutSession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOutSession,
    onSettled: () => queryClient.invalidateQueries({ queryKey: sessionKeys.devices }),
  });
}
