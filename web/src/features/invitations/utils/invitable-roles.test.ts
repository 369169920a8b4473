import { describe, expect, it } from 'vitest';
import { invitableRolesFor } from './invitable-roles';

describe('invitableRolesFor', () => {
  it.each([
    ['owner', ['athlete', 'coach', 'assistant']],
    ['coach', ['athlete']],
    ['assistant', []],
    ['athlete', []],
  ] as const)('%s may be offered %j', (role, expected) => {
    expect(invitableRolesFor(role)).toEqual(expected);
  });
});
