import type { Role } from '@driftmark/shared';

/** Who is acting, as the policies see it: plain data, no database. */
export interface Actor {
  userId: string;
  role: Role;
  teamId: string;
}
