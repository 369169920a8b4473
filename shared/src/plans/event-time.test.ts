import { describe, expect, it } from 'vitest';
import {
  beforeEventOnAthleteClock,
  eventTimedItems,
  minutesBeforeLabel,
  zonedDateTime,
  zonedInstant,
} from './event-time.js';

/*
 * Expected values are worked by hand from the IANA tz database (tzdata) rules:
 * - Pacific/Auckland: NZST UTC+12, NZDT UTC+13 from the last Sunday of September 02:00 to the first
 *   Sunday of April 03:00 (rule "NZ" since 2007).
 * - Europe/Madrid: CET UTC+1, CEST UTC+2 from the last Sunday of March 01:00 UTC to the last Sunday of
 *   October 01:00 UTC (rule "EU").
 * - America/New_York: EST UTC−5, EDT UTC−4 from the second Sunday of March 02:00 to the first Sunday
 *   of November 02:00 (rule "US" since 2007).
 */

const at = (iso: string) => new Date(iso).getTime();

describe('zonedInstant and zonedDateTime (IANA tz database offsets)', () => {
  it('reads a wall clock in summer and winter', () => {
    // 5 Dec 2026 is NZDT (UTC+13): 09:00 in Auckland is 20:00 UTC the day before.
    expect(zonedInstant('2026-12-05', '09:00', 'Pacific/Auckland')).toBe(at('2026-12-04T20:00:00Z'));
    // 5 Jul 2027 is NZST (UTC+12).
    expect(zonedInstant('2027-07-05', '09:00', 'Pacific/Auckland')).toBe(at('2027-07-04T21:00:00Z'));
    expect(zonedDateTime(at('2026-12-04T20:00:00Z'), 'Europe/Madrid')).toEqual({
      date: '2026-12-04',
      time: '21:00',
    });
  });

  it('takes the first of a repeated hour and pushes a skipped one forward (RFC 5545 §3.3.5)', () => {
    // Madrid, 31 Oct 2027 (last Sunday of October): 02:00–03:00 CEST happens, then 02:00–03:00 CET.
    expect(zonedInstant('2027-10-31', '02:30', 'Europe/Madrid')).toBe(at('2027-10-31T00:30:00Z'));
    // Madrid, 28 Mar 2027 (last Sunday of March): 02:00–03:00 does not exist; 02:30 reads as 03:30 CEST.
    expect(zonedInstant('2027-03-28', '02:30', 'Europe/Madrid')).toBe(at('2027-03-28T01:30:00Z'));
  });
});

describe('a time before the event on the athlete’s clock', () => {
  it('an event in Auckland, an athlete in Madrid: 3 h before a 09:00 show is 18:00 the evening before', () => {
    // 09:00 NZDT on 5 Dec 2026 = 20:00 UTC 4 Dec; minus 3 h = 17:00 UTC = 18:00 CET.
    expect(
      beforeEventOnAthleteClock(
        { date: '2026-12-05', time: '09:00', timeZone: 'Pacific/Auckland' },
        180,
        'Europe/Madrid',
      ),
    ).toEqual({ date: '2026-12-04', time: '18:00' });
  });

  it('the same zone on both sides is plain clock arithmetic', () => {
    expect(
      beforeEventOnAthleteClock(
        { date: '2026-12-05', time: '13:00', timeZone: 'Europe/Madrid' },
        180,
        'Europe/Madrid',
      ),
    ).toEqual({ date: '2026-12-05', time: '10:00' });
  });

  it('counts real hours across a daylight-saving change in the event’s zone', () => {
    // Auckland leaves NZDT on Sun 4 Apr 2027 at 03:00 (clocks back to 02:00). An event at 09:00 NZST
    // (21:00 UTC on 3 Apr); 12 h before is 09:00 UTC = 22:00 NZDT on 3 Apr, not 21:00.
    expect(
      beforeEventOnAthleteClock(
        { date: '2027-04-04', time: '09:00', timeZone: 'Pacific/Auckland' },
        12 * 60,
        'Pacific/Auckland',
      ),
    ).toEqual({ date: '2027-04-03', time: '22:00' });
  });

  it('counts real hours across a change in the athlete’s zone', () => {
    // Event 10:00 EDT on Sun 14 Mar 2027 in New York (clocks went forward at 02:00) = 14:00 UTC.
    // 10 h before = 04:00 UTC = 05:00 CET in Madrid (Madrid changes only on 28 Mar).
    expect(
      beforeEventOnAthleteClock(
        { date: '2027-03-14', time: '10:00', timeZone: 'America/New_York' },
        600,
        'Europe/Madrid',
      ),
    ).toEqual({ date: '2027-03-14', time: '05:00' });
    // Read in New York itself: 23:00 EST on 13 Mar (plain clock arithmetic would say 00:00: the change
    // at 02:00 took an hour out of the night).
    expect(
      beforeEventOnAthleteClock(
        { date: '2027-03-14', time: '10:00', timeZone: 'America/New_York' },
        600,
        'America/New_York',
      ),
    ).toEqual({ date: '2027-03-13', time: '23:00' });
  });
});

describe('eventTimedItems', () => {
  const item = {
    id: '00000000-0000-4000-8000-0000000000c1',
    item: 'Caffeine',
    dose: 200,
    unit: 'mg',
    times: ['07:00'],
    minutesBeforeEvent: [180, 30],
  };

  it('one row per time before the event; unplaced without the event’s clock', () => {
    const event = { date: '2026-12-05', time: '09:00', timeZone: 'Pacific/Auckland' };
    expect(eventTimedItems([item], event, 'Europe/Madrid').map((r) => [r.minutesBefore, r.at])).toEqual([
      [180, { date: '2026-12-04', time: '18:00' }],
      [30, { date: '2026-12-04', time: '20:30' }],
    ]);
    expect(eventTimedItems([item], null, 'Europe/Madrid').map((r) => r.at)).toEqual([null, null]);
    // Versions saved before the field existed have no times before the event.
    expect(eventTimedItems([{ ...item, minutesBeforeEvent: undefined }], event, 'Europe/Madrid')).toEqual([]);
  });

  it('labels', () => {
    expect([0, 30, 180, 150].map(minutesBeforeLabel)).toEqual([
      'at the event',
      '30 min before',
      '3 h before',
      '2 h 30 min before',
    ]);
  });
});
