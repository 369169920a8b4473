import { describe, expect, it } from 'vitest';
import { formatTimeSince } from './time-since';

describe('formatTimeSince', () => {
  const now = Date.parse('2026-12-09T12:00:00Z');
  const ago = (ms: number) => new Date(now - ms).toISOString();

  it('says "just now" under a minute and for small clock skew into the future', () => {
    expect(formatTimeSince(ago(30_000), now)).toBe('just now');
    expect(formatTimeSince(ago(-5_000), now)).toBe('just now');
  });

  it('counts whole minutes, hours and days, rounding down', () => {
    expect(formatTimeSince(ago(12 * 60_000 + 59_000), now)).toBe('12 min ago');
    expect(formatTimeSince(ago(2 * 3_600_000 + 59 * 60_000), now)).toBe('2 h ago');
    expect(formatTimeSince(ago(86_400_000), now)).toBe('1 day ago');
    expect(formatTimeSince(ago(3 * 86_400_000 + 3_600_000), now)).toBe('3 days ago');
  });

  it('gives the date from four weeks on', () => {
    expect(formatTimeSince('2026-11-01T08:00:00Z', now)).toBe('1 Nov 2026');
  });

  it('returns an unreadable value unchanged', () => {
    expect(formatTimeSince('not a time', now)).toBe('not a time');
  });
});
