import type { CreateInvitationRequest, InvitationSummary } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

/** POST /api/invitations: e-mails an invitation (replacing a pending one to the same address). */
export function createInvitation(body: CreateInvitationRequest): Promise<InvitationSummary> {
  return api.post<InvitationSummary>('/api/invitations', body);
}

export function useCreateInvitation(options: { onSuccess?: (invitation: InvitationSummary) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: async (invitation) => {
      await queryClient.invalidateQueries({ queryKey: invitationKeys.list() });
      options.onSuccess?.(invitation);
    },
  });
}
