import type { Role } from '@driftmark/shared';
import type { User } from '../entities/user.entity.js';

export interface TeamMember {
  id: string;
  name: string;
  email: string;
  role: Role;
}

export function presentTeamMember(user: User): TeamMember {
  return { id: user.id, name: user.name, email: user.email, role: user.role };
}
