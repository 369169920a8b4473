import { z } from 'zod';
import { ROLES } from '../roles.js';

/** One staff member in GET /api/team/members. */
export const teamMember = z.object({
  /** User id. */
  id: z.uuid(),
  /** Display name. */
  name: z.string(),
  /** Sign-in e-mail. */
  email: z.string(),
  /** owner, coach or assistant. */
  role: z.enum(ROLES),
});
export type TeamMember = z.infer<typeof teamMember>;
