import type { InvitableRole, Role } from '@driftmark/shared';

/**
 * Which roles to offer in the invite form. The server decides (and refuses anything else with
 * 403); this only keeps choices off the screen that would be refused: the owner invites athletes,
 * coaches and assistants, a coach invites athletes, an assistant invites nobody.
 */
export function invitableRolesFor(role: Role): InvitableRole[] {
  switch (role) {
    case 'owner':
      return ['athlete', 'coach', 'assistant'];
    case 'coach':
      return ['athlete'];
    default:
      return [];
  }
}
