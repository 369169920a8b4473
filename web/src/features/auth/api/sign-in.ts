import type { Me, SignInRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

/** POST /api/auth/sign-in: sets the session cookie and answers with the user. */
export function signIn(body: SignInRequest): Promise<Me> {
  return api.post<Me>('/api/auth/sign-in', body);
}

export function useSignIn(options: { onSuccess?: (me: Me) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => {
      // Whatever the previous person left in the cache is not theirs.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me, me);
      options.onSuccess?.(me);
    },
  });
}
