import type { Role } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

export interface TeamMember {
  id: string;
  name: string;
  email: string;
  role: Role;
}

/** GET /api/team/members (staff): the coaching staff of the team. */
export function getTeamMembers(signal?: AbortSignal): Promise<TeamMember[]> {
  return api.get<TeamMember[]>('/api/team/members', signal);
}

export function teamMembersQueryOptions() {
  return queryOptions({
    queryKey: invitationKeys.teamMembers(),
    queryFn: ({ signal }) => getTeamMembers(signal),
    staleTime: 5 * 60_000,
  });
}

export function useTeamMembers(options: { enabled?: boolean } = {}) {
  return useQuery({ ...teamMembersQueryOptions(), enabled: options.enabled ?? true });
}
