import { describe, expect, it } from 'vitest';
import { createClientIdKeeper, newClientId } from './client-id';

const UUID_V4 = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

function counter() {
  let n = 0;
  return () => `id-${++n}`;
}

describe('newClientId', () => {
  it('makes version-4 uuids the shared schema accepts', () => {
    const a = newClientId();
    expect(a).toMatch(UUID_V4);
    expect(newClientId()).not.toBe(a);
  });

  it('still makes one without randomUUID (plain http outside localhost)', () => {
    const original = globalThis.crypto.randomUUID;
    Object.defineProperty(globalThis.crypto, 'randomUUID', { value: undefined, configurable: true });
    try {
      expect(newClientId()).toMatch(UUID_V4);
    } finally {
      Object.defineProperty(globalThis.crypto, 'randomUUID', { value: original, configurable: true });
    }
  });
});

describe('createClientIdKeeper', () => {
  it('reuses the id for a retry and a double tap until the submission succeeds', () => {
    const keeper = createClientIdKeeper(counter());
    const first = keeper.take();
    expect(keeper.take()).toBe(first); // second tap while the first is on its way
    expect(keeper.take()).toBe(first); // retry after a lost answer
    expect(keeper.pending).toBe(first);
    keeper.settle(first);
    expect(keeper.pending).toBeNull();
    expect(keeper.take()).toBe('id-2'); // the next entry is a new one
  });

  it('starts a new submission when a keyed submission changes (another quick-add button)', () => {
    const keeper = createClientIdKeeper(counter());
    const a = keeper.take('quick:250:ml:water');
    expect(keeper.take('quick:250:ml:water')).toBe(a);
    const b = keeper.take('quick:500:ml:water');
    expect(b).not.toBe(a);
    expect(keeper.take('quick:500:ml:water')).toBe(b);
  });

  it('ignores a late success of an older submission', () => {
    const keeper = createClientIdKeeper(counter());
    const a = keeper.take('quick:250');
    const b = keeper.take('quick:500');
    keeper.settle(a);
    expect(keeper.pending).toBe(b);
    expect(keeper.take('quick:500')).toBe(b);
  });
});
