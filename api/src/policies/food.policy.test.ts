import { describe, expect, it } from 'vitest';
import type { Actor } from './actor.js';
import {
  FOOD_ACTIONS,
  authorizeFoods,
  authorizeReadFood,
  canOnFoods,
  canReadFood,
  foodAbilities,
  type FoodAction,
  type FoodTarget,
} from './food.policy.js';

const TEAM = 'team-a';
const list = { teamId: TEAM };

const actors = {
  'owner of the team': { userId: 'u-owner', role: 'owner', teamId: TEAM },
  'coach of the team': { userId: 'u-coach', role: 'coach', teamId: TEAM },
  'assistant of the team': { userId: 'u-assistant', role: 'assistant', teamId: TEAM },
  'athlete of the team': { userId: 'u-athlete', role: 'athlete', teamId: TEAM },
  'owner of another team': { userId: 'u-owner-b', role: 'owner', teamId: 'team-b' },
  'coach of another team': { userId: 'u-coach-b', role: 'coach', teamId: 'team-b' },
  'athlete of another team': { userId: 'u-athlete-b', role: 'athlete', teamId: 'team-b' },
} satisfies Record<string, Actor>;
type ActorName = keyof typeof actors;

const Y = true;
const N = false;

// prettier-ignore
const EXPECTED: Record<ActorName, Record<FoodAction, boolean>> = {
  'owner of the team':       { read: Y, create: Y, plan_meals: Y },
  'coach of the team':       { read: Y, create: Y, plan_meals: Y },
  'assistant of the team':   { read: Y, create: N, plan_meals: N },
  'athlete of the team':     { read: Y, create: N, plan_meals: N },
  'owner of another team':   { read: N, create: N, plan_meals: N },
  'coach of another team':   { read: N, create: N, plan_meals: N },
  'athlete of another team': { read: N, create: N, plan_meals: N },
};

describe('food policy', () => {
  it('has an expectation for every actor and every action', () => {
    for (const name of Object.keys(actors) as ActorName[]) {
      expect(Object.keys(EXPECTED[name]).sort(), name).toEqual([...FOOD_ACTIONS].sort());
    }
  });

  const cases = (Object.keys(actors) as ActorName[]).flatMap((name) =>
    FOOD_ACTIONS.map((action) => ({ name, action, allowed: EXPECTED[name][action] })),
  );

  it.each(cases)('$name → $action: $allowed', ({ name, action, allowed }) => {
    expect(canOnFoods(actors[name], action, list)).toBe(allowed);
  });

  it.each(cases)(
    'authorize: $name → $action answers 404 when unreadable, 403 when readable',
    ({ name, action, allowed }) => {
      const run = () => authorizeFoods(actors[name], action, list);
      if (allowed) expect(run).not.toThrow();
      else if (!EXPECTED[name].read) expect(run).toThrow(expect.objectContaining({ status: 404 }));
      else expect(run).toThrow(expect.objectContaining({ status: 403, code: 'forbidden' }));
    },
  );

  it('abilities mirror the rules', () => {
    expect(foodAbilities(actors['coach of the team'], list)).toEqual({ create: true });
    expect(foodAbilities(actors['athlete of the team'], list)).toEqual({ create: false });
  });
});

describe('one food by id (team food or personal food)', () => {
  const teamFood: FoodTarget = { teamId: TEAM, athlete: null };
  const personalFood: FoodTarget = {
    teamId: TEAM,
    athlete: { userId: 'u-athlete', teamId: TEAM, coachId: 'u-coach', sharedWithUserIds: ['u-shared'] },
  };
  const people = {
    'the athlete': { userId: 'u-athlete', role: 'athlete', teamId: TEAM },
    'another athlete of the team': { userId: 'u-athlete-2', role: 'athlete', teamId: TEAM },
    'the assigned coach': { userId: 'u-coach', role: 'coach', teamId: TEAM },
    'staff it is shared with': { userId: 'u-shared', role: 'assistant', teamId: TEAM },
    'an unassigned coach': { userId: 'u-coach-2', role: 'coach', teamId: TEAM },
    'the owner': { userId: 'u-owner', role: 'owner', teamId: TEAM },
    'a coach of another team': { userId: 'u-coach-b', role: 'coach', teamId: 'team-b' },
  } satisfies Record<string, Actor>;
  type Person = keyof typeof people;

  // prettier-ignore
  const READS: Record<Person, { team: boolean; personal: boolean }> = {
    'the athlete':                 { team: Y, personal: Y },
    'another athlete of the team': { team: Y, personal: N },
    'the assigned coach':          { team: Y, personal: Y },
    'staff it is shared with':     { team: Y, personal: Y },
    'an unassigned coach':         { team: Y, personal: N },
    'the owner':                   { team: Y, personal: Y },
    'a coach of another team':     { team: N, personal: N },
  };

  const cases = (Object.keys(people) as Person[]).flatMap((name) => [
    { name, kind: 'team' as const, target: teamFood, allowed: READS[name].team },
    { name, kind: 'personal' as const, target: personalFood, allowed: READS[name].personal },
  ]);

  it.each(cases)('$name reads a $kind food: $allowed (404 otherwise)', ({ name, target, allowed }) => {
    expect(canReadFood(people[name], target)).toBe(allowed);
    const run = () => authorizeReadFood(people[name], target);
    if (allowed) expect(run).not.toThrow();
    else expect(run).toThrow(expect.objectContaining({ status: 404 }));
  });
});
