import type { InvitationPreview, InvitationSummary } from '@driftmark/shared';
import type { Invitation } from '../entities/invitation.entity.js';
import type { User } from '../entities/user.entity.js';

export function presentInvitationSummary(
  inv: Invitation,
  invitedBy: Pick<User, 'id' | 'name'>,
): InvitationSummary {
  return {
    id: inv.id,
    email: inv.email,
    name: inv.name,
    role: inv.role,
    invitedBy: { id: invitedBy.id, name: invitedBy.name },
    createdAt: inv.createdAt.toISOString(),
    expiresAt: inv.expiresAt.toISOString(),
  };
}

export function presentInvitationPreview(
  inv: Invitation,
  teamName: string,
  inviterName: string,
): InvitationPreview {
  return {
    email: inv.email,
    name: inv.name,
    role: inv.role,
    teamName,
    inviterName,
    expiresAt: inv.expiresAt.toISOString(),
  };
}
