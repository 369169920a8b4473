import { z } from 'zod';
import { INVITABLE_ROLES, ROLES } from '../roles.js';
import { email, newPassword, personName, uuid } from './common.js';

/** POST /api/invitations: a coach invites an athlete; the owner also invites coaches and assistants. */
export const createInvitationRequest = z.object({
  /** Where the invitation goes. */
  email,
  /** The invitee's name as the coach knows it (they can change it when accepting). */
  name: personName,
  /** athlete, coach or assistant. */
  role: z.enum(INVITABLE_ROLES, { error: 'Choose a role' }),
  /** For an athlete invited by the owner: the coach to assign (defaults to the inviter). */
  coachId: uuid.optional(),
});
export type CreateInvitationRequest = z.infer<typeof createInvitationRequest>;

/** A pending invitation as staff see it. */
export const invitationSummary = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  invitedBy: z.object({ id: z.uuid(), name: z.string() }),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type InvitationSummary = z.infer<typeof invitationSummary>;

/** GET /api/invitations/lookup/:token (public): what the invitee sees before accepting. */
export const invitationPreview = z.object({
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  teamName: z.string(),
  inviterName: z.string(),
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof invitationPreview>;

/** POST /api/invitations/accept: sets the password and signs the invitee in. */
export const acceptInvitationRequest = z.object({
  /** The token from the e-mailed link. */
  token: z
    .string({ error: 'Invitation link is incomplete' })
    .min(20, 'Invitation link is incomplete')
    .max(200),
  /** Display name. */
  name: personName,
  /** The new account's password. */
  password: newPassword,
});
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationRequest>;
