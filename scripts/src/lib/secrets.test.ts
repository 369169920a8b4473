import { describe, expect, it } from 'vitest';
import { appEnv } from './app.js';
import { generateSecret } from './secrets.js';

describe('generateSecret', () => {
  it('is long enough for the API (≥ 32 chars), URL-safe and different every time', () => {
    const [a, b] = [generateSecret(), generateSecret()];
    expect(a.length).toBeGreaterThanOrEqual(32);
    expect(a).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(a).not.toBe(b);
  });
});

describe('appEnv', () => {
  it('overrides and removes variables without touching process.env', () => {
    process.env.DRIFTMARK_PROBE = 'from-shell';
    const env = appEnv({ APP_MODE: 'test', DRIFTMARK_PROBE: undefined });
    expect(env.APP_MODE).toBe('test');
    expect('DRIFTMARK_PROBE' in env).toBe(false);
    expect(env.PATH).toBe(process.env.PATH);
    expect(process.env.DRIFTMARK_PROBE).toBe('from-shell');
    delete process.env.DRIFTMARK_PROBE;
  });
});
