import { describe, expect, it } from 'vitest';
import type { Actor } from './actor.js';
import type { AthleteTarget } from './athlete.policy.js';
import {
  MARK_ACTIONS,
  authorizeMark,
  canOnMark,
  markAbilities,
  markListAbilities,
  type MarkAction,
} from './mark.policy.js';

const TEAM = 'team-a';
const athlete: AthleteTarget = {
  userId: 'u-athlete',
  teamId: TEAM,
  coachId: 'u-coach',
  sharedWithUserIds: ['u-shared-coach', 'u-shared-assistant'],
};

const people = {
  self: { userId: 'u-athlete', role: 'athlete', teamId: TEAM },
  otherAthlete: { userId: 'u-athlete-2', role: 'athlete', teamId: TEAM },
  owner: { userId: 'u-owner', role: 'owner', teamId: TEAM },
  assignedCoach: { userId: 'u-coach', role: 'coach', teamId: TEAM },
  unrelatedCoach: { userId: 'u-coach-2', role: 'coach', teamId: TEAM },
  sharedCoach: { userId: 'u-shared-coach', role: 'coach', teamId: TEAM },
  sharedAssistant: { userId: 'u-shared-assistant', role: 'assistant', teamId: TEAM },
  unsharedAssistant: { userId: 'u-assistant-2', role: 'assistant', teamId: TEAM },
  otherTeamOwner: { userId: 'u-owner-b', role: 'owner', teamId: 'team-b' },
  otherTeamCoach: { userId: 'u-coach-b', role: 'coach', teamId: 'team-b' },
  coachIdOtherTeam: { userId: 'u-coach', role: 'coach', teamId: 'team-b' },
} satisfies Record<string, Actor>;

/** Rows: who acts on a mark written by whom. */
const rows = {
  'self, coach’s mark': { actor: people.self, authorId: 'u-coach' },
  'other athlete, same team': { actor: people.otherAthlete, authorId: 'u-coach' },
  'owner of the team, coach’s mark': { actor: people.owner, authorId: 'u-coach' },
  'owner of the team, own mark': { actor: people.owner, authorId: 'u-owner' },
  'assigned coach, own mark': { actor: people.assignedCoach, authorId: 'u-coach' },
  'assigned coach, assistant’s mark': { actor: people.assignedCoach, authorId: 'u-shared-assistant' },
  'coach, same team, not assigned, not shared': { actor: people.unrelatedCoach, authorId: 'u-coach' },
  'coach with a share, coach’s mark': { actor: people.sharedCoach, authorId: 'u-coach' },
  'assistant with the share, coach’s mark': { actor: people.sharedAssistant, authorId: 'u-coach' },
  'assistant with the share, own mark': { actor: people.sharedAssistant, authorId: 'u-shared-assistant' },
  'assistant without the share': { actor: people.unsharedAssistant, authorId: 'u-coach' },
  // Wrote the mark while shared; the share was removed since: authorship alone grants nothing.
  'assistant whose share was removed, own mark': {
    actor: people.unsharedAssistant,
    authorId: 'u-assistant-2',
  },
  'owner of another team': { actor: people.otherTeamOwner, authorId: 'u-coach' },
  'coach of another team': { actor: people.otherTeamCoach, authorId: 'u-coach' },
  // Same user id as the author but another team: ids alone never grant access.
  'author id, other team': { actor: people.coachIdOtherTeam, authorId: 'u-coach' },
} satisfies Record<string, { actor: Actor; authorId: string }>;
type RowName = keyof typeof rows;

const Y = true;
const N = false;

// Every row × every action. A new action or row fails the completeness test below until someone
// decides its cell here.
// prettier-ignore
const EXPECTED: Record<RowName, Record<MarkAction, boolean>> = {
  'self, coach’s mark':                          { read: Y, create: N, update: N, delete: N, reply: Y, markRead: Y },
  'other athlete, same team':                    { read: N, create: N, update: N, delete: N, reply: N, markRead: N },
  'owner of the team, coach’s mark':             { read: Y, create: Y, update: N, delete: N, reply: Y, markRead: Y },
  'owner of the team, own mark':                 { read: Y, create: Y, update: Y, delete: Y, reply: Y, markRead: Y },
  'assigned coach, own mark':                    { read: Y, create: Y, update: Y, delete: Y, reply: Y, markRead: Y },
  'assigned coach, assistant’s mark':            { read: Y, create: Y, update: N, delete: N, reply: Y, markRead: Y },
  'coach, same team, not assigned, not shared':  { read: N, create: N, update: N, delete: N, reply: N, markRead: N },
  'coach with a share, coach’s mark':            { read: Y, create: Y, update: N, delete: N, reply: Y, markRead: Y },
  'assistant with the share, coach’s mark':      { read: Y, create: Y, update: N, delete: N, reply: Y, markRead: Y },
  'assistant with the share, own mark':          { read: Y, create: Y, update: Y, delete: Y, reply: Y, markRead: Y },
  'assistant without the share':                 { read: N, create: N, update: N, delete: N, reply: N, markRead: N },
  'assistant whose share was removed, own mark': { read: N, create: N, update: N, delete: N, reply: N, markRead: N },
  'owner of another team':                       { read: N, create: N, update: N, delete: N, reply: N, markRead: N },
  'coach of another team':                       { read: N, create: N, update: N, delete: N, reply: N, markRead: N },
  'author id, other team':                       { read: N, create: N, update: N, delete: N, reply: N, markRead: N },
};

describe('mark policy', () => {
  it('has an expectation for every row and every action', () => {
    for (const name of Object.keys(rows) as RowName[]) {
      expect(Object.keys(EXPECTED[name]).sort(), name).toEqual([...MARK_ACTIONS].sort());
    }
  });

  const cases = (Object.keys(rows) as RowName[]).flatMap((name) =>
    MARK_ACTIONS.map((action) => ({ name, action, allowed: EXPECTED[name][action] })),
  );

  it.each(cases)('$name → $action: $allowed', ({ name, action, allowed }) => {
    const { actor, authorId } = rows[name];
    expect(canOnMark(actor, action, { athlete, authorId })).toBe(allowed);
  });

  it.each(cases)(
    'authorize: $name → $action answers 404 when unreadable, 403 when readable',
    ({ name, action, allowed }) => {
      const { actor, authorId } = rows[name];
      const run = () => authorizeMark(actor, action, { athlete, authorId });
      if (allowed) expect(run).not.toThrow();
      else if (!EXPECTED[name].read)
        expect(run).toThrow(expect.objectContaining({ status: 404, code: 'not_found' }));
      else expect(run).toThrow(expect.objectContaining({ status: 403, code: 'forbidden' }));
    },
  );

  it('create does not depend on an author (the list has none)', () => {
    for (const name of Object.keys(rows) as RowName[]) {
      const { actor } = rows[name];
      expect(canOnMark(actor, 'create', { athlete, authorId: null }), name).toBe(EXPECTED[name].create);
    }
  });

  it('nobody may edit or delete a mark without an author', () => {
    for (const actor of Object.values(people)) {
      expect(canOnMark(actor, 'update', { athlete, authorId: null })).toBe(false);
      expect(canOnMark(actor, 'delete', { athlete, authorId: null })).toBe(false);
    }
  });

  it('abilities mirror the rules', () => {
    expect(markAbilities(people.self, { athlete, authorId: 'u-coach' })).toEqual({
      update: false,
      delete: false,
      reply: true,
    });
    expect(markAbilities(people.sharedAssistant, { athlete, authorId: 'u-shared-assistant' })).toEqual({
      update: true,
      delete: true,
      reply: true,
    });
    expect(markListAbilities(people.self, athlete)).toEqual({ create: false });
    expect(markListAbilities(people.assignedCoach, athlete)).toEqual({ create: true });
  });
});
