import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/me/deletion/confirm (public): the link's token deletes the account for good. */
export function confirmDeletion(token: string): Promise<undefined> {
  return api.post<undefined>('/api/me/deletion/confirm', { token });
}

export function useConfirmDeletion(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => confirmDeletion(token),
    // Whoever was signed in here is gone: drop every cached answer.
    onSuccess: () => queryClient.clear(),
  });
}
