import type { InvitationPreview } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

/** GET /api/invitations/lookup/:token (public); 410 token_invalid when expired, used or unknown. */
export function lookupInvitation(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return api.get<InvitationPreview>(`/api/invitations/lookup/${encodeURIComponent(token)}`, signal);
}

export function lookupInvitationQueryOptions(token: string) {
  return queryOptions({
    queryKey: invitationKeys.lookup(token),
    queryFn: ({ signal }) => lookupInvitation(token, signal),
    staleTime: 60_000,
  });
}

export function useInvitationLookup(token: string) {
  return useQuery(lookupInvitationQueryOptions(token));
}
