import { describe, expect, it } from 'vitest';
import type { Actor } from './actor.js';
import { FOOD_ACTIONS, authorizeFoods, canOnFoods, foodAbilities, type FoodAction } from './food.policy.js';

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
