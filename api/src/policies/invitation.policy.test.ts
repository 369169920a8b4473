import { describe, expect, it } from 'vitest';
import type { Actor } from './actor.js';
import {
  INVITATION_ACTIONS,
  authorizeInvitation,
  canAssignCoach,
  canOnInvitation,
  type InvitationAction,
} from './invitation.policy.js';

const invitation = { teamId: 'team-a', invitedById: 'u-coach' };

const actors = {
  owner: { userId: 'u-owner', role: 'owner', teamId: 'team-a' },
  'coach who sent it': { userId: 'u-coach', role: 'coach', teamId: 'team-a' },
  'another coach': { userId: 'u-coach-2', role: 'coach', teamId: 'team-a' },
  assistant: { userId: 'u-assistant', role: 'assistant', teamId: 'team-a' },
  athlete: { userId: 'u-athlete', role: 'athlete', teamId: 'team-a' },
  'owner of another team': { userId: 'u-owner-b', role: 'owner', teamId: 'team-b' },
  'sender id, other team': { userId: 'u-coach', role: 'coach', teamId: 'team-b' },
} satisfies Record<string, Actor>;
type ActorName = keyof typeof actors;

const Y = true;
const N = false;

// prettier-ignore
const EXPECTED: Record<ActorName, Record<InvitationAction, boolean>> = {
  owner:                   { read: Y, revoke: Y, resend: Y },
  'coach who sent it':     { read: Y, revoke: Y, resend: Y },
  'another coach':         { read: N, revoke: N, resend: N },
  assistant:               { read: N, revoke: N, resend: N },
  athlete:                 { read: N, revoke: N, resend: N },
  'owner of another team': { read: N, revoke: N, resend: N },
  'sender id, other team': { read: N, revoke: N, resend: N },
};

describe('invitation policy', () => {
  it('has an expectation for every actor and every action', () => {
    for (const name of Object.keys(actors) as ActorName[]) {
      expect(Object.keys(EXPECTED[name]).sort(), name).toEqual([...INVITATION_ACTIONS].sort());
    }
  });

  const cases = (Object.keys(actors) as ActorName[]).flatMap((name) =>
    INVITATION_ACTIONS.map((action) => ({ name, action, allowed: EXPECTED[name][action] })),
  );

  it.each(cases)('$name → $action: $allowed', ({ name, action, allowed }) => {
    expect(canOnInvitation(actors[name], action, invitation)).toBe(allowed);
    const run = () => authorizeInvitation(actors[name], action, invitation);
    if (allowed) expect(run).not.toThrow();
    else expect(run).toThrow(expect.objectContaining({ status: 404 }));
  });

  // prettier-ignore
  const ASSIGN: Record<ActorName, { self: boolean; other: boolean }> = {
    owner:                   { self: Y, other: Y },
    'coach who sent it':     { self: Y, other: N },
    'another coach':         { self: Y, other: N },
    assistant:               { self: N, other: N },
    athlete:                 { self: N, other: N },
    'owner of another team': { self: Y, other: Y },
    'sender id, other team': { self: Y, other: N },
  };

  it.each(Object.keys(actors) as ActorName[])('%s choosing the coach of an invited athlete', (name) => {
    const actor = actors[name];
    expect(canAssignCoach(actor, actor.userId)).toBe(ASSIGN[name].self);
    expect(canAssignCoach(actor, 'u-someone-else')).toBe(ASSIGN[name].other);
  });
});
