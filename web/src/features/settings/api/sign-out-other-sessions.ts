import type { SignOutOthersResponse } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { sessionKeys } from './keys';

/** POST /api/me/sessions/sign-out-others: signs out every device but this one; answers how many. */
export function signOutOtherSessions(): Promise<SignOutOthersResponse> {
  return api.post<SignOutOthersResponse>('/api/me/sessions/sign-out-others');
}

export function useSignOutOtherSessions() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOutOtherSessions,
    onSettled: () => queryClient.invalidateQueries({ queryKey: sessionKeys.devices }),
  });
}
