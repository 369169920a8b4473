import { describe, expect, it } from 'vitest';
import { daysBetween, daysToEvent, todayIn } from './dates.js';

describe('dates', () => {
  // 2026-03-10 11:00 UTC is already 2026-03-11 in Kiritimati (UTC+14) and still 2026-03-10 in Los Angeles.
  const now = new Date('2026-03-10T11:00:00Z');

  it('gives today in a time zone', () => {
    expect(todayIn('Pacific/Kiritimati', now)).toBe('2026-03-11');
    expect(todayIn('America/Los_Angeles', now)).toBe('2026-03-10');
    expect(todayIn('UTC', now)).toBe('2026-03-10');
  });

  it('counts days to the event from the athlete’s own today', () => {
    expect(daysToEvent('2026-03-12', 'Pacific/Kiritimati', now)).toBe(1);
    expect(daysToEvent('2026-03-12', 'America/Los_Angeles', now)).toBe(2);
    expect(daysToEvent('2026-03-10', 'America/Los_Angeles', now)).toBe(0);
    expect(daysToEvent('2026-03-01', 'UTC', now)).toBe(-9);
    expect(daysToEvent(null, 'UTC', now)).toBeNull();
  });

  it('is not fooled by daylight-saving changes', () => {
    // Europe/Lisbon moves clocks on 2026-03-29.
    expect(daysBetween('2026-03-28', '2026-03-30')).toBe(2);
    expect(daysBetween('2026-12-31', '2027-01-01')).toBe(1);
  });
});
