import { notFound } from '../errors.js';
import type { Actor } from './actor.js';

export interface SessionTarget {
  userId: string;
}

export const SESSION_ACTIONS = ['read', 'revoke'] as const;
export type SessionAction = (typeof SESSION_ACTIONS)[number];

/**
 * A session (a signed-in device) belongs to one user: only they list or sign it out. Nobody else,
 * the team owner included, sees another person's devices.
 */
export function canOnSession(actor: Actor, _action: SessionAction, session: SessionTarget): boolean {
  return actor.userId === session.userId;
}

/** Throws 404 (an id never reveals that someone else's session exists). */
export function authorizeSession(actor: Actor, action: SessionAction, session: SessionTarget): void {
  if (!canOnSession(actor, action, session)) throw notFound();
}
