import type { AcceptInvitationRequest, Me } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

/** POST /api/invitations/accept (public): creates the account and signs it in. */
export function acceptInvitation(body: AcceptInvitationRequest): Promise<Me> {
  return api.post<Me>('/api/invitations/accept', body);
}

export function useAcceptInvitation(options: { onSuccess?: (me: Me) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (me, variables) => {
      // The link is spent now; a stale "valid" preview must not linger.
      queryClient.removeQueries({ queryKey: invitationKeys.lookup(variables.token) });
      options.onSuccess?.(me);
    },
  });
}
