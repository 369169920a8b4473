import { INVITABLE_ROLES, type InvitableRole } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import type { Actor } from './actor.js';
import { authorizeTeam, canOnTeam, type TeamAction } from './team.policy.js';

const team = { id: 'team-a' };

const actors = {
  owner: { userId: 'u-owner', role: 'owner', teamId: 'team-a' },
  coach: { userId: 'u-coach', role: 'coach', teamId: 'team-a' },
  assistant: { userId: 'u-assistant', role: 'assistant', teamId: 'team-a' },
  athlete: { userId: 'u-athlete', role: 'athlete', teamId: 'team-a' },
  'owner of another team': { userId: 'u-owner-b', role: 'owner', teamId: 'team-b' },
} satisfies Record<string, Actor>;
type ActorName = keyof typeof actors;

const ACTIONS = {
  read: { kind: 'read' },
  manageSettings: { kind: 'manageSettings' },
  managePoses: { kind: 'managePoses' },
  manageCheckInQuestions: { kind: 'manageCheckInQuestions' },
  viewRoster: { kind: 'viewRoster' },
  viewMembers: { kind: 'viewMembers' },
  viewGuardrails: { kind: 'viewGuardrails' },
  ...(Object.fromEntries(
    INVITABLE_ROLES.map((role) => [`invite:${role}`, { kind: 'invite', role }]),
  ) as Record<`invite:${InvitableRole}`, TeamAction>),
} satisfies Record<string, TeamAction>;
type ActionName = keyof typeof ACTIONS;

const Y = true;
const N = false;

// prettier-ignore
const EXPECTED: Record<ActorName, Record<ActionName, boolean>> = {
  owner:                   { read: Y, manageSettings: Y, managePoses: Y, manageCheckInQuestions: Y, viewRoster: Y, viewMembers: Y, viewGuardrails: Y, 'invite:athlete': Y, 'invite:coach': Y, 'invite:assistant': Y },
  coach:                   { read: Y, manageSettings: N, managePoses: Y, manageCheckInQuestions: Y, viewRoster: Y, viewMembers: Y, viewGuardrails: Y, 'invite:athlete': Y, 'invite:coach': N, 'invite:assistant': N },
  assistant:               { read: Y, manageSettings: N, managePoses: N, manageCheckInQuestions: N, viewRoster: Y, viewMembers: Y, viewGuardrails: Y, 'invite:athlete': N, 'invite:coach': N, 'invite:assistant': N },
  athlete:                 { read: Y, manageSettings: N, managePoses: N, manageCheckInQuestions: N, viewRoster: N, viewMembers: N, viewGuardrails: N, 'invite:athlete': N, 'invite:coach': N, 'invite:assistant': N },
  'owner of another team': { read: N, manageSettings: N, managePoses: N, manageCheckInQuestions: N, viewRoster: N, viewMembers: N, viewGuardrails: N, 'invite:athlete': N, 'invite:coach': N, 'invite:assistant': N },
};

describe('team policy', () => {
  it('has an expectation for every actor and every action', () => {
    for (const name of Object.keys(actors) as ActorName[]) {
      expect(Object.keys(EXPECTED[name]).sort(), name).toEqual(Object.keys(ACTIONS).sort());
    }
  });

  const cases = (Object.keys(actors) as ActorName[]).flatMap((name) =>
    (Object.keys(ACTIONS) as ActionName[]).map((action) => ({
      name,
      action,
      allowed: EXPECTED[name][action],
    })),
  );

  it.each(cases)('$name → $action: $allowed', ({ name, action, allowed }) => {
    expect(canOnTeam(actors[name], ACTIONS[action], team)).toBe(allowed);
  });

  it('answers 404 for another team and 403 for a member who may not', () => {
    expect(() => authorizeTeam(actors['owner of another team'], ACTIONS.manageSettings, team)).toThrow(
      expect.objectContaining({ status: 404 }),
    );
    expect(() => authorizeTeam(actors.coach, ACTIONS.manageSettings, team)).toThrow(
      expect.objectContaining({ status: 403 }),
    );
  });
});
