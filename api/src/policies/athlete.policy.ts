import { forbidden, notFound } from '../errors.js';
import type { Actor } from './actor.js';

/** What a rule needs to know about an athlete. */
export interface AthleteTarget {
  /** The athlete's own user id. */
  userId: string;
  teamId: string;
  /** The assigned coach's user id. */
  coachId: string;
  /** Staff the athlete is shared with. */
  sharedWithUserIds: readonly string[];
}

export const ATHLETE_ACTIONS = [
  'read',
  'update',
  /** Write the athlete's own days (check-ins, fluids, meals…): only the athlete. */
  'log',
  'delete',
  'share',
  'annotate',
  'endCoaching',
  /** Fill in the intake form: only the athlete. */
  'completeIntake',
  /** Write the athlete's plan (new versions, countdowns); reading it is `read`. */
  'plan',
  /** Enter or remove body-composition measurements: the athlete and the staff working on them. */
  'measure',
  /** Write what was done on a practice cut's days: the athlete and the staff working on them. */
  'noteRehearsal',
] as const;
export type AthleteAction = (typeof ATHLETE_ACTIONS)[number];

/** How the actor stands to the athlete; every rule below is a function of this alone. */
export type AthleteRelationship =
  'self' | 'otherAthlete' | 'owner' | 'assignedCoach' | 'sharedStaff' | 'unrelatedStaff' | 'otherTeam';

export function athleteRelationship(actor: Actor, target: AthleteTarget): AthleteRelationship {
  if (actor.teamId !== target.teamId) return 'otherTeam';
  if (actor.userId === target.userId) return 'self';
  switch (actor.role) {
    case 'athlete':
      return 'otherAthlete';
    case 'owner':
      return 'owner';
    case 'coach':
    case 'assistant':
      if (actor.role === 'coach' && actor.userId === target.coachId) return 'assignedCoach';
      return target.sharedWithUserIds.includes(actor.userId) ? 'sharedStaff' : 'unrelatedStaff';
  }
}

const RULES: Record<AthleteRelationship, readonly AthleteAction[]> = {
  self: ['read', 'update', 'log', 'completeIntake', 'measure', 'noteRehearsal'],
  otherAthlete: [],
  owner: ['read', 'update', 'delete', 'share', 'annotate', 'endCoaching', 'plan', 'measure', 'noteRehearsal'],
  assignedCoach: [
    'read',
    'update',
    'delete',
    'share',
    'annotate',
    'endCoaching',
    'plan',
    'measure',
    'noteRehearsal',
  ],
  // A coach or assistant the athlete is shared with works on them (the plan included) but never
  // deletes, re-shares or ends the coaching.
  sharedStaff: ['read', 'update', 'annotate', 'plan', 'measure', 'noteRehearsal'],
  unrelatedStaff: [],
  otherTeam: [],
};

export function canOnAthlete(actor: Actor, action: AthleteAction, target: AthleteTarget): boolean {
  return RULES[athleteRelationship(actor, target)].includes(action);
}

/** Throws 404 when the actor can't read the athlete at all, 403 when they can but not do this. */
export function authorizeAthlete(actor: Actor, action: AthleteAction, target: AthleteTarget): void {
  if (!canOnAthlete(actor, 'read', target)) throw notFound();
  if (!canOnAthlete(actor, action, target)) throw forbidden();
}

/** The abilities map sent with an athlete, so the web app shows only what the server allows. */
export function athleteAbilities(actor: Actor, target: AthleteTarget) {
  return {
    update: canOnAthlete(actor, 'update', target),
    delete: canOnAthlete(actor, 'delete', target),
    share: canOnAthlete(actor, 'share', target),
    log: canOnAthlete(actor, 'log', target),
    endCoaching: canOnAthlete(actor, 'endCoaching', target),
    plan: canOnAthlete(actor, 'plan', target),
  };
}
