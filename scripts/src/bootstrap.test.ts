import { describe, expect, it } from 'vitest';
import { installDecision, isValidCommand, sha256 } from '../bootstrap.mjs';

describe('installDecision', () => {
  const lockHash = sha256('{"lockfileVersion":3}');

  it.each([
    { nodeModulesExists: false, stampHash: null, install: true, reason: 'node_modules is missing' },
    { nodeModulesExists: false, stampHash: lockHash, install: true, reason: 'node_modules is missing' },
    { nodeModulesExists: true, stampHash: null, install: true, reason: 'node_modules has no install stamp' },
    {
      nodeModulesExists: true,
      stampHash: sha256('other'),
      install: true,
      reason: 'package-lock.json changed',
    },
    {
      nodeModulesExists: true,
      stampHash: `${lockHash}\n`,
      install: false,
      reason: 'node_modules matches package-lock.json',
    },
  ])(
    'node_modules=$nodeModulesExists stamp=$stampHash → install=$install',
    ({ install, reason, ...state }) => {
      expect(installDecision({ ...state, lockHash })).toEqual({ install, reason });
    },
  );
});

describe('isValidCommand', () => {
  it.each(['start', 'test', 'db-reset', 'migration-check'])('accepts %s', (name) => {
    expect(isValidCommand(name)).toBe(true);
  });
  it.each([undefined, '', '../etc', 'lib/postgres', 'Start', '-x', 'a b'])('rejects %s', (name) => {
    expect(isValidCommand(name)).toBe(false);
  });
});

describe('sha256', () => {
  it('hashes like sha256sum', () => {
    expect(sha256('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});
