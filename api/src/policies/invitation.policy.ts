import { forbidden, notFound } from '../errors.js';
import type { Actor } from './actor.js';

export interface InvitationTarget {
  teamId: string;
  invitedById: string;
}

export const INVITATION_ACTIONS = ['read', 'revoke', 'resend'] as const;
export type InvitationAction = (typeof INVITATION_ACTIONS)[number];

export type InvitationRelationship = 'owner' | 'inviter' | 'otherStaff' | 'athlete' | 'otherTeam';

export function invitationRelationship(actor: Actor, target: InvitationTarget): InvitationRelationship {
  if (actor.teamId !== target.teamId) return 'otherTeam';
  if (actor.role === 'owner') return 'owner';
  if (actor.userId === target.invitedById) return 'inviter';
  return actor.role === 'athlete' ? 'athlete' : 'otherStaff';
}

const RULES: Record<InvitationRelationship, readonly InvitationAction[]> = {
  owner: ['read', 'revoke', 'resend'],
  inviter: ['read', 'revoke', 'resend'],
  otherStaff: [],
  athlete: [],
  otherTeam: [],
};

export function canOnInvitation(actor: Actor, action: InvitationAction, target: InvitationTarget): boolean {
  return RULES[invitationRelationship(actor, target)].includes(action);
}

export function authorizeInvitation(actor: Actor, action: InvitationAction, target: InvitationTarget): void {
  if (!canOnInvitation(actor, 'read', target)) throw notFound();
  if (!canOnInvitation(actor, action, target)) throw forbidden();
}

/**
 * Whether the actor may name `coachUserId` as the coach of an invited athlete: the owner may
 * pick any coach of the team (the caller checks the person is one), a coach only themself.
 */
export function canAssignCoach(actor: Actor, coachUserId: string): boolean {
  if (actor.role === 'owner') return true;
  if (actor.role === 'coach') return coachUserId === actor.userId;
  return false;
}
