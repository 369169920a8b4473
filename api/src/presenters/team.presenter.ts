import type { TeamMember } from '@driftmark/shared';
import type { User } from '../entities/user.entity.js';

export type { TeamMember };

export function presentTeamMember(user: User): TeamMember {
  return { id: user.id, name: user.name, email: user.email, role: user.role };
}
