export const invitationKeys = {
  all: ['invitations'] as const,
  /** Pending invitations the signed-in staff member can see. */
  list: () => [...invitationKeys.all, 'list'] as const,
  /** The public preview behind an e-mailed link. */
  lookup: (token: string) => [...invitationKeys.all, 'lookup', token] as const,
  /** Staff of the team, for choosing the coach an invited athlete is assigned to. */
  teamMembers: () => [...invitationKeys.all, 'team-members'] as const,
};
