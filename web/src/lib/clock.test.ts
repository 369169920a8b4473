import { describe, expect, it } from 'vitest';
import { clockCaption, formatClock, formatClockLong, formatInstant, zonePlace } from './clock';

describe('whose clock', () => {
  const athlete = { whose: 'athlete', timeZone: 'Europe/Madrid' } as const;

  it('labels a time of day with its place, compact or in full', () => {
    expect(formatClock('07:10', athlete)).toBe('07:10 Madrid time');
    expect(formatClock('07:10:00', athlete)).toBe('07:10 Madrid time');
    expect(formatClockLong('07:10', athlete)).toBe("07:10 (athlete's time, Europe/Madrid)");
    expect(zonePlace('America/New_York')).toBe('New York');
    expect(zonePlace('UTC')).toBe('UTC');
  });

  it('labels an instant on the clock it is read on (IANA tz database via Intl)', () => {
    // 08:14 UTC on 2 Dec 2026 is 21:14 in Auckland (NZDT, UTC+13).
    expect(formatInstant('2026-12-02T08:14:00Z', { whose: 'viewer', timeZone: 'Pacific/Auckland' })).toBe(
      '2 Dec 2026, 21:14 Auckland time',
    );
  });

  it('captions a group of times for the athlete and for staff', () => {
    expect(clockCaption(athlete, true)).toBe('Times on your clock (Europe/Madrid)');
    expect(clockCaption(athlete)).toBe("Times on the athlete's clock (Europe/Madrid)");
    expect(clockCaption({ whose: 'viewer', timeZone: 'UTC' })).toBe('Times on your clock (UTC)');
  });
});
