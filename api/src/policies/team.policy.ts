import type { InvitableRole } from '@driftmark/shared';
import { forbidden, notFound } from '../errors.js';
import type { Actor } from './actor.js';

export interface TeamTarget {
  id: string;
}

export type TeamAction =
  | { kind: 'read' }
  | { kind: 'manageSettings' }
  /** Edit the team's condition-photo pose list. */
  | { kind: 'managePoses' }
  /** Edit the questions every weekly check-in asks. */
  | { kind: 'manageCheckInQuestions' }
  | { kind: 'viewRoster' }
  | { kind: 'viewMembers' }
  /** Read the team's guardrail floors (changing them is manageSettings). */
  | { kind: 'viewGuardrails' }
  | { kind: 'invite'; role: InvitableRole };

/** Who may invite whom: the owner anyone, a coach only athletes, nobody else. */
const INVITES: Record<Actor['role'], readonly InvitableRole[]> = {
  owner: ['athlete', 'coach', 'assistant'],
  coach: ['athlete'],
  assistant: [],
  athlete: [],
};

export function canOnTeam(actor: Actor, action: TeamAction, team: TeamTarget): boolean {
  if (actor.teamId !== team.id) return false;
  const staff = actor.role !== 'athlete';
  switch (action.kind) {
    case 'read':
      return true;
    case 'manageSettings':
      return actor.role === 'owner';
    case 'managePoses':
    case 'manageCheckInQuestions':
      return actor.role === 'owner' || actor.role === 'coach';
    case 'viewRoster':
    case 'viewMembers':
    case 'viewGuardrails':
      return staff;
    case 'invite':
      return INVITES[actor.role].includes(action.role);
  }
}

export function authorizeTeam(actor: Actor, action: TeamAction, team: TeamTarget): void {
  if (!canOnTeam(actor, { kind: 'read' }, team)) throw notFound();
  if (!canOnTeam(actor, action, team)) throw forbidden();
}
