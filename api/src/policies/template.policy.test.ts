import { describe, expect, it } from 'vitest';
import type { Actor } from './actor.js';
import {
  TEMPLATE_ACTIONS,
  authorizeTemplate,
  canOnTemplate,
  templateAbilities,
  type TemplateAction,
} from './template.policy.js';

const TEAM = 'team-a';
const template = { teamId: TEAM };

const actors = {
  'owner of the team': { userId: 'u-owner', role: 'owner', teamId: TEAM },
  'coach of the team': { userId: 'u-coach', role: 'coach', teamId: TEAM },
  'assistant of the team': { userId: 'u-assistant', role: 'assistant', teamId: TEAM },
  'athlete of the team': { userId: 'u-athlete', role: 'athlete', teamId: TEAM },
  'owner of another team': { userId: 'u-owner-b', role: 'owner', teamId: 'team-b' },
  'coach of another team': { userId: 'u-coach-b', role: 'coach', teamId: 'team-b' },
  'assistant of another team': { userId: 'u-assistant-b', role: 'assistant', teamId: 'team-b' },
  'athlete of another team': { userId: 'u-athlete-b', role: 'athlete', teamId: 'team-b' },
} satisfies Record<string, Actor>;
type ActorName = keyof typeof actors;

const Y = true;
const N = false;

// prettier-ignore
const EXPECTED: Record<ActorName, Record<TemplateAction, boolean>> = {
  'owner of the team':         { read: Y, manage: Y },
  'coach of the team':         { read: Y, manage: Y },
  'assistant of the team':     { read: Y, manage: N },
  'athlete of the team':       { read: N, manage: N },
  'owner of another team':     { read: N, manage: N },
  'coach of another team':     { read: N, manage: N },
  'assistant of another team': { read: N, manage: N },
  'athlete of another team':   { read: N, manage: N },
};

describe('countdown template policy', () => {
  it('has an expectation for every actor and every action', () => {
    for (const name of Object.keys(actors) as ActorName[]) {
      expect(Object.keys(EXPECTED[name]).sort(), name).toEqual([...TEMPLATE_ACTIONS].sort());
    }
  });

  const cases = (Object.keys(actors) as ActorName[]).flatMap((name) =>
    TEMPLATE_ACTIONS.map((action) => ({ name, action, allowed: EXPECTED[name][action] })),
  );

  it.each(cases)('$name → $action: $allowed', ({ name, action, allowed }) => {
    expect(canOnTemplate(actors[name], action, template)).toBe(allowed);
  });

  it.each(cases)(
    'authorize: $name → $action answers 404 when unreadable, 403 when readable',
    ({ name, action, allowed }) => {
      const run = () => authorizeTemplate(actors[name], action, template);
      if (allowed) expect(run).not.toThrow();
      else if (!EXPECTED[name].read)
        expect(run).toThrow(expect.objectContaining({ status: 404, code: 'not_found' }));
      else expect(run).toThrow(expect.objectContaining({ status: 403, code: 'forbidden' }));
    },
  );

  it('abilities mirror the rules', () => {
    expect(templateAbilities(actors['coach of the team'], template)).toEqual({ manage: true });
    expect(templateAbilities(actors['assistant of the team'], template)).toEqual({ manage: false });
  });
});
