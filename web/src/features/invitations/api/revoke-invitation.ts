import type { InvitationSummary } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

/** DELETE /api/invitations/:id: the link stops working at once. */
export function revokeInvitation(id: string): Promise<void> {
  return api.delete(`/api/invitations/${encodeURIComponent(id)}`);
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: (_void, id) => {
      queryClient.setQueryData<InvitationSummary[]>(invitationKeys.list(), (list) =>
        list?.filter((i) => i.id !== id),
      );
      return queryClient.invalidateQueries({ queryKey: invitationKeys.list() });
    },
  });
}
