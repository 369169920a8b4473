import { TZDate } from '@date-fns/tz';
import { zonedDateTime, zonedInstant } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';

/** The reference reading: @date-fns/tz's TZDate for a wall clock in a zone, and back. */
function referenceInstant(date: string, time: string, timeZone: string): number {
  const [y, mo, d] = date.split('-').map(Number) as [number, number, number];
  const [h, mi] = time.split(':').map(Number) as [number, number];
  return new TZDate(y, mo - 1, d, h, mi, timeZone).getTime();
}
function referenceWallClock(ms: number, timeZone: string): { date: string; time: string } {
  const t = new TZDate(ms, timeZone);
  const pad = (n: number) => String(n).padStart(2, '0');
  return {
    date: `${t.getFullYear()}-${pad(t.getMonth() + 1)}-${pad(t.getDate())}`,
    time: `${pad(t.getHours())}:${pad(t.getMinutes())}`,
  };
}

/*
 * shared/'s time-zone arithmetic (Intl, no library) against @date-fns/tz, an independent time-zone library: every half hour of the days around each 2027 daylight-saving change
 * of these zones (IANA tz database), plus ordinary days.
 */
const ZONES = [
  'Europe/Madrid',
  'Pacific/Auckland',
  'America/New_York',
  'Australia/Lord_Howe',
  'Asia/Kolkata',
];
const DAYS = [
  '2027-03-13',
  '2027-03-14',
  '2027-03-27',
  '2027-03-28',
  '2027-04-03',
  '2027-04-04',
  '2027-09-25',
  '2027-09-26',
  '2027-10-02',
  '2027-10-03',
  '2027-10-30',
  '2027-10-31',
  '2027-11-06',
  '2027-11-07',
  '2027-06-15',
];

describe('zonedInstant / zonedDateTime agree with @date-fns/tz', () => {
  it('on every hour and half hour around the changes', () => {
    for (const zone of ZONES) {
      for (const date of DAYS) {
        for (let minutes = 0; minutes < 24 * 60; minutes += 30) {
          const time = `${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
          const ours = zonedInstant(date, time, zone);
          const reference = referenceInstant(date, time, zone);
          // The same wall clock read back (a skipped time reads as the later one in both) …
          expect(zonedDateTime(ours, zone)).toEqual(referenceWallClock(reference, zone));
          // … and the same instant, except in a repeated hour, where either reading is valid and
          // @date-fns/tz is not consistent across zones (ours: the first, RFC 5545 §3.3.5).
          const repeated = [30, 60].some((m) => zonedDateTime(ours + m * 60_000, zone).time === time);
          if (!repeated) expect({ zone, date, time, at: ours }).toEqual({ zone, date, time, at: reference });
        }
      }
    }
  });
});
