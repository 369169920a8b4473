import { forbidden, notFound } from '../errors.js';
import type { Actor } from './actor.js';
import { athleteRelationship, canOnAthlete, type AthleteTarget } from './athlete.policy.js';

/**
 * What a rule needs about a mark: the athlete it is pinned to and who wrote it. `authorId` is null
 * for the athlete's marks as a whole (listing, creating).
 */
export interface MarkTarget {
  athlete: AthleteTarget;
  authorId: string | null;
}

export const MARK_ACTIONS = [
  /** See the marks and their threads: anyone who can read the athlete. */
  'read',
  /** Pin a new mark: staff with `annotate` on the athlete. */
  'create',
  /** Edit the note: its author only, while they can still read the athlete. */
  'update',
  /** Delete the mark with its thread: its author only, while they can still read the athlete. */
  'delete',
  /** Reply in the thread: the athlete themself, or staff who can read the athlete. */
  'reply',
  /** Record that the actor has read the thread: anyone who can read it. */
  'markRead',
] as const;
export type MarkAction = (typeof MARK_ACTIONS)[number];

export function canOnMark(actor: Actor, action: MarkAction, target: MarkTarget): boolean {
  // Every action needs the athlete readable: a mark never outlives its reader's access.
  if (!canOnAthlete(actor, 'read', target.athlete)) return false;
  switch (action) {
    case 'read':
    case 'markRead':
      return true;
    case 'create':
      return canOnAthlete(actor, 'annotate', target.athlete);
    case 'update':
    case 'delete':
      return target.authorId !== null && actor.userId === target.authorId;
    case 'reply':
      // Readable means self or staff already; spelled out so a new readable relationship must choose.
      return athleteRelationship(actor, target.athlete) === 'self' || actor.role !== 'athlete';
  }
}

/** Throws 404 when the actor can't read the athlete, 403 when they can but not do this. */
export function authorizeMark(actor: Actor, action: MarkAction, target: MarkTarget): void {
  if (!canOnMark(actor, 'read', target)) throw notFound();
  if (!canOnMark(actor, action, target)) throw forbidden();
}

/** The abilities sent with one mark. */
export function markAbilities(actor: Actor, target: MarkTarget) {
  return {
    update: canOnMark(actor, 'update', target),
    delete: canOnMark(actor, 'delete', target),
    reply: canOnMark(actor, 'reply', target),
  };
}

/** The abilities sent with an athlete's list of marks. */
export function markListAbilities(actor: Actor, athlete: AthleteTarget) {
  return { create: canOnMark(actor, 'create', { athlete, authorId: null }) };
}
