import type { InvitationSummary } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

/** POST /api/invitations/:id/resend: a new link and expiry, e-mailed again. */
export function resendInvitation(id: string): Promise<InvitationSummary> {
  return api.post<InvitationSummary>(`/api/invitations/${encodeURIComponent(id)}/resend`);
}

export function useResendInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvitation,
    onSuccess: (updated) => {
      queryClient.setQueryData<InvitationSummary[]>(invitationKeys.list(), (list) =>
        list?.map((i) => (i.id === updated.id ? updated : i)),
      );
      return queryClient.invalidateQueries({ queryKey: invitationKeys.list() });
    },
  });
}
