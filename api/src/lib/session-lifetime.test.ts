import { describe, expect, it } from 'vitest';
import { absoluteEnd, sessionEnd, sessionState } from './session-lifetime.js';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
// The defaults of config.ts (common practice, no source; see session-lifetime.ts).
const config = {
  sessionLifetimes: {
    athlete: { idleMs: 30 * DAY, absoluteMs: 90 * DAY },
    staff: { idleMs: 12 * HOUR, absoluteMs: 14 * DAY },
  },
};
const start = new Date('2026-03-02T07:00:00Z');
const at = (ms: number) => new Date(start.getTime() + ms);

describe('session lifetimes', () => {
  it('gives athletes and staff their own absolute ends', () => {
    expect(absoluteEnd('athlete', start, config)).toEqual(at(90 * DAY));
    for (const role of ['owner', 'coach', 'assistant'] as const)
      expect(absoluteEnd(role, start, config)).toEqual(at(14 * DAY));
  });

  it('ends at last seen + idle lifetime, never past the absolute end', () => {
    const athlete = { lastSeenAt: at(10 * DAY), expiresAt: at(90 * DAY) };
    expect(sessionEnd(athlete, 'athlete', config)).toEqual(at(40 * DAY));
    expect(sessionEnd({ ...athlete, lastSeenAt: at(80 * DAY) }, 'athlete', config)).toEqual(at(90 * DAY));
    expect(sessionEnd({ lastSeenAt: at(HOUR), expiresAt: at(14 * DAY) }, 'coach', config)).toEqual(
      at(13 * HOUR),
    );
  });

  it('is live up to its end (exclusive), revoked before anything else', () => {
    const s = { lastSeenAt: start, expiresAt: at(14 * DAY), revokedAt: null };
    expect(sessionState(s, 'owner', config, at(12 * HOUR - 1))).toBe('live');
    expect(sessionState(s, 'owner', config, at(12 * HOUR))).toBe('ended');
    expect(sessionState(s, 'athlete', config, at(12 * HOUR))).toBe('live');
    expect(sessionState({ ...s, revokedAt: start }, 'athlete', config, start)).toBe('revoked');
  });
});
