import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

/** POST /api/auth/sign-out: revokes this session on the server and clears the cookie. */
export function signOut(): Promise<void> {
  return api.post<void>('/api/auth/sign-out');
}

export function useSignOut(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSettled: (_data, error) => {
      // Signed out on the server, or the session had already ended: either way nobody is signed in here.
      if (!error || (error as { status?: number }).status === 401) {
        queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
        queryClient.setQueryData(authKeys.me, null);
        options.onSuccess?.();
      }
    },
  });
}
