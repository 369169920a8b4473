import { describe, expect, it } from 'vitest';
import type { Actor } from './actor.js';
import {
  ATHLETE_ACTIONS,
  athleteAbilities,
  authorizeAthlete,
  canOnAthlete,
  type AthleteAction,
  type AthleteTarget,
} from './athlete.policy.js';

const TEAM = 'team-a';
const athlete: AthleteTarget = {
  userId: 'u-athlete',
  teamId: TEAM,
  coachId: 'u-coach',
  sharedWithUserIds: ['u-shared-coach', 'u-shared-assistant'],
};

const actors = {
  self: { userId: 'u-athlete', role: 'athlete', teamId: TEAM },
  'other athlete, same team': { userId: 'u-athlete-2', role: 'athlete', teamId: TEAM },
  'owner of the team': { userId: 'u-owner', role: 'owner', teamId: TEAM },
  'assigned coach': { userId: 'u-coach', role: 'coach', teamId: TEAM },
  'coach, same team, not assigned, not shared': { userId: 'u-coach-2', role: 'coach', teamId: TEAM },
  'coach with a share': { userId: 'u-shared-coach', role: 'coach', teamId: TEAM },
  'assistant with the share': { userId: 'u-shared-assistant', role: 'assistant', teamId: TEAM },
  'assistant without the share': { userId: 'u-assistant-2', role: 'assistant', teamId: TEAM },
  'owner of another team': { userId: 'u-owner-b', role: 'owner', teamId: 'team-b' },
  'coach of another team': { userId: 'u-coach-b', role: 'coach', teamId: 'team-b' },
  // Same user id as the assigned coach but another team: ids alone never grant access.
  'assigned coach id, other team': { userId: 'u-coach', role: 'coach', teamId: 'team-b' },
} satisfies Record<string, Actor>;
type ActorName = keyof typeof actors;

const Y = true;
const N = false;

// Every relationship × every action. A new action or relationship fails the completeness test
// below until someone decides its row/column here.
// prettier-ignore
const EXPECTED: Record<ActorName, Record<AthleteAction, boolean>> = {
  self:                                         { read: Y, update: Y, log: Y, delete: N, share: N, annotate: N, endCoaching: N, completeIntake: Y, plan: N, measure: Y, noteRehearsal: Y },
  'other athlete, same team':                   { read: N, update: N, log: N, delete: N, share: N, annotate: N, endCoaching: N, completeIntake: N, plan: N, measure: N, noteRehearsal: N },
  'owner of the team':                          { read: Y, update: Y, log: N, delete: Y, share: Y, annotate: Y, endCoaching: Y, completeIntake: N, plan: Y, measure: Y, noteRehearsal: Y },
  'assigned coach':                             { read: Y, update: Y, log: N, delete: Y, share: Y, annotate: Y, endCoaching: Y, completeIntake: N, plan: Y, measure: Y, noteRehearsal: Y },
  'coach, same team, not assigned, not shared': { read: N, update: N, log: N, delete: N, share: N, annotate: N, endCoaching: N, completeIntake: N, plan: N, measure: N, noteRehearsal: N },
  'coach with a share':                         { read: Y, update: Y, log: N, delete: N, share: N, annotate: Y, endCoaching: N, completeIntake: N, plan: Y, measure: Y, noteRehearsal: Y },
  'assistant with the share':                   { read: Y, update: Y, log: N, delete: N, share: N, annotate: Y, endCoaching: N, completeIntake: N, plan: Y, measure: Y, noteRehearsal: Y },
  'assistant without the share':                { read: N, update: N, log: N, delete: N, share: N, annotate: N, endCoaching: N, completeIntake: N, plan: N, measure: N, noteRehearsal: N },
  'owner of another team':                      { read: N, update: N, log: N, delete: N, share: N, annotate: N, endCoaching: N, completeIntake: N, plan: N, measure: N, noteRehearsal: N },
  'coach of another team':                      { read: N, update: N, log: N, delete: N, share: N, annotate: N, endCoaching: N, completeIntake: N, plan: N, measure: N, noteRehearsal: N },
  'assigned coach id, other team':              { read: N, update: N, log: N, delete: N, share: N, annotate: N, endCoaching: N, completeIntake: N, plan: N, measure: N, noteRehearsal: N },
};

describe('athlete policy', () => {
  it('has an expectation for every actor and every action', () => {
    for (const name of Object.keys(actors) as ActorName[]) {
      expect(Object.keys(EXPECTED[name]).sort(), name).toEqual([...ATHLETE_ACTIONS].sort());
    }
  });

  const cases = (Object.keys(actors) as ActorName[]).flatMap((name) =>
    ATHLETE_ACTIONS.map((action) => ({ name, action, allowed: EXPECTED[name][action] })),
  );

  it.each(cases)('$name → $action: $allowed', ({ name, action, allowed }) => {
    expect(canOnAthlete(actors[name], action, athlete)).toBe(allowed);
  });

  it.each(cases)(
    'authorize: $name → $action answers 404 when unreadable, 403 when readable',
    ({ name, action, allowed }) => {
      const run = () => authorizeAthlete(actors[name], action, athlete);
      if (allowed) expect(run).not.toThrow();
      else if (!EXPECTED[name].read)
        expect(run).toThrow(expect.objectContaining({ status: 404, code: 'not_found' }));
      else expect(run).toThrow(expect.objectContaining({ status: 403, code: 'forbidden' }));
    },
  );

  it('abilities mirror the rules', () => {
    expect(athleteAbilities(actors['assistant with the share'], athlete)).toEqual({
      update: true,
      delete: false,
      share: false,
      log: false,
      endCoaching: false,
      plan: true,
    });
    expect(athleteAbilities(actors.self, athlete)).toEqual({
      update: true,
      delete: false,
      share: false,
      log: true,
      endCoaching: false,
      plan: false,
    });
  });
});
