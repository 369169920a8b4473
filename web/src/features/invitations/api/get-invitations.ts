import type { InvitationSummary } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

/** GET /api/invitations (staff): pending invitations (the owner sees all, a coach their own). */
export function getInvitations(signal?: AbortSignal): Promise<InvitationSummary[]> {
  return api.get<InvitationSummary[]>('/api/invitations', signal);
}

export function invitationsQueryOptions() {
  return queryOptions({
    queryKey: invitationKeys.list(),
    queryFn: ({ signal }) => getInvitations(signal),
  });
}

export function useInvitations(options: { enabled?: boolean } = {}) {
  return useQuery({ ...invitationsQueryOptions(), enabled: options.enabled ?? true });
}
