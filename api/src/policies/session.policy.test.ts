import { describe, expect, it } from 'vitest';
import type { Actor } from './actor.js';
import { SESSION_ACTIONS, authorizeSession, canOnSession, type SessionAction } from './session.policy.js';

/** A session of the athlete u-athlete. */
const session = { userId: 'u-athlete' };

const actors = {
  'the athlete (own device)': { userId: 'u-athlete', role: 'athlete', teamId: 'team-a' },
  'another athlete': { userId: 'u-athlete-2', role: 'athlete', teamId: 'team-a' },
  'assigned coach': { userId: 'u-coach', role: 'coach', teamId: 'team-a' },
  'team owner': { userId: 'u-owner', role: 'owner', teamId: 'team-a' },
  'owner of another team': { userId: 'u-owner-b', role: 'owner', teamId: 'team-b' },
} satisfies Record<string, Actor>;
type ActorName = keyof typeof actors;

const Y = true;
const N = false;

// prettier-ignore
const EXPECTED: Record<ActorName, Record<SessionAction, boolean>> = {
  'the athlete (own device)': { read: Y, revoke: Y },
  'another athlete':          { read: N, revoke: N },
  'assigned coach':           { read: N, revoke: N },
  'team owner':               { read: N, revoke: N },
  'owner of another team':    { read: N, revoke: N },
};

describe('session policy', () => {
  it('has an expectation for every actor and every action', () => {
    for (const name of Object.keys(actors) as ActorName[]) {
      expect(Object.keys(EXPECTED[name]).sort(), name).toEqual([...SESSION_ACTIONS].sort());
    }
  });

  const cases = (Object.keys(actors) as ActorName[]).flatMap((name) =>
    SESSION_ACTIONS.map((action) => ({ name, action, allowed: EXPECTED[name][action] })),
  );

  it.each(cases)('$name → $action: $allowed', ({ name, action, allowed }) => {
    expect(canOnSession(actors[name], action, session)).toBe(allowed);
    const run = () => authorizeSession(actors[name], action, session);
    if (allowed) expect(run).not.toThrow();
    else expect(run).toThrow(expect.objectContaining({ status: 404 }));
  });
});
