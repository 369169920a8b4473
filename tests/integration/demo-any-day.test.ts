/**
 * The demo holds on any day: seeded with the clock pinned to each day of a window that crosses the
 * daylight-saving changes of every demo athlete's zone and a New Year, every promise of the README's
 * demo table holds, read through the services behind the review queue and the roster. A second
 * test moves an existing demo forward (the date refresh each `npm start` runs) and checks again.
 */
import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays } from '../../api/src/seed/calendar.js';
import { DEMO_ATHLETES, DEMO_OWNER_EMAIL, DEMO_PASSWORD } from '../../api/src/seed/demo-team.js';
import { seedDemo } from '../../api/src/seed/seed-demo.js';
import { AthleteRepository } from '../../api/src/repositories/athlete.repository.js';
import { CutService } from '../../api/src/services/cut.service.js';
import { ReviewQueueService } from '../../api/src/services/review-queue.service.js';
import { RosterService } from '../../api/src/services/roster.service.js';
import { User } from '../../api/src/entities/user.entity.js';
import { brokenDemoPromises } from './demo-promises.js';
import { buildTestApp, type TestApp } from './setup/app.js';

const DAY_MS = 86_400_000;

/** UTC offset of `zone` at `at`, minutes (from Intl: the same tz database the app uses). */
function offsetMinutes(zone: string, at: Date): number {
  const name = new Intl.DateTimeFormat('en-US', { timeZone: zone, timeZoneName: 'longOffset' })
    .formatToParts(at)
    .find((p) => p.type === 'timeZoneName')!.value;
  const m = /GMT([+-])(\d{2}):(\d{2})/.exec(name);
  return m ? (m[1] === '-' ? -1 : 1) * (Number(m[2]) * 60 + Number(m[3])) : 0;
}

/** The local dates (in UTC terms) on which `zone` changes its offset between `from` and `to`. */
function offsetChanges(zone: string, from: Date, to: Date): string[] {
  const out: string[] = [];
  for (let at = from.getTime(); at < to.getTime(); at += DAY_MS) {
    if (offsetMinutes(zone, new Date(at)) !== offsetMinutes(zone, new Date(at + DAY_MS))) {
      out.push(new Date(at + DAY_MS).toISOString().slice(0, 10));
    }
  }
  return out;
}

// A pinned window (the clock, not the calendar): 24 Sep 2026 – 3 Jan 2027, 102 consecutive days.
// It holds Auckland's spring change (27 Sep), Madrid's autumn change (25 Oct), Chicago's and Los
// Angeles' (1 Nov) and 31 Dec → 1 Jan. The seed runs at 10:30 UTC: 23:30 in Auckland (UTC+13 in
// summer), 00:30 in Honolulu (UTC−10), so the team's own todays span two calendar dates.
const FIRST_DAY = '2026-09-24';
const DAYS = Number(process.env.DEMO_DAYS ?? 102);
const SEED_CLOCK = 'T10:30:00Z';
const zones = ['Europe/Madrid', 'America/Chicago', 'America/Los_Angeles', 'Pacific/Auckland'];

let t: TestApp;
let now = new Date(`${FIRST_DAY}${SEED_CLOCK}`);

async function view() {
  const owner = await t.dataSource.manager.findOneByOrFail(User, { email: DEMO_OWNER_EMAIL });
  const actor = { userId: owner.id, role: owner.role, teamId: owner.teamId };
  const deps = { dataSource: t.dataSource, clock: () => now };
  const [roster, queue] = await Promise.all([
    new RosterService(deps).list(actor),
    new ReviewQueueService(deps).list(actor, { weight: owner.weightUnit, volume: owner.volumeUnit }),
  ]);
  // Aroha's practice run, as her coach's panel reads it.
  const aroha = DEMO_ATHLETES.find((d) => d.key === 'weigh_in')!;
  const row = roster.find((r) => r.email === aroha.email);
  const athlete = row
    ? await new AthleteRepository(t.dataSource.manager).findWithPeople(row.athleteId)
    : null;
  const rehearsal = athlete ? (await new CutService(deps).getCut(athlete)).rehearsal : null;
  return { now, roster, queue, rehearsal };
}

let passwordHash = '';
const seed = () => seedDemo(t.dataSource, { appMode: 'test', now, storage: null, passwordHash });

beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
  // One hash for every seed below: the accounts are never signed in to here.
  passwordHash = await bcrypt.hash(DEMO_PASSWORD, 4);
});
afterAll(async () => {
  await t?.reset();
  await t?.close();
});

describe('the demo on any day', () => {
  it('covers every demo zone’s daylight-saving change and a New Year', () => {
    const from = new Date(`${FIRST_DAY}${SEED_CLOCK}`);
    const to = new Date(from.getTime() + (DAYS - 1) * DAY_MS);
    for (const zone of zones) expect(offsetChanges(zone, from, to), zone).not.toHaveLength(0);
    const dates = Array.from({ length: DAYS }, (_, i) => addDays(FIRST_DAY, i));
    expect(dates).toContain('2026-12-31');
    expect(dates).toContain('2027-01-01');
  });

  it(
    `keeps every promise of the README's demo table when seeded on each of ${DAYS} days`,
    async () => {
      const failures: string[] = [];
      for (let i = 0; i < DAYS; i++) {
        now = new Date(`${addDays(FIRST_DAY, i)}${SEED_CLOCK}`);
        await t.reset();
        await seed();
        for (const broken of brokenDemoPromises(await view())) {
          failures.push(`${now.toISOString()}: ${broken}`);
        }
      }
      expect(failures).toEqual([]);
    },
    30 * 60_000,
  );

  it(
    'keeps them after the start-up date refresh moves the demo 1, 7 and 40 days on',
    async () => {
      const failures: string[] = [];
      // Seed days just before Madrid's change, Chicago's change and New Year: each move crosses one.
      for (const seededOn of ['2026-10-22', '2026-10-30', '2026-12-28']) {
        for (const days of [1, 7, 40]) {
          now = new Date(`${seededOn}${SEED_CLOCK}`);
          await t.reset();
          await seed();
          now = new Date(now.getTime() + days * DAY_MS);
          const moved = await seed();
          if (moved.created || moved.movedDays !== days) {
            failures.push(`${seededOn} + ${days}: the refresh moved ${moved.movedDays} days`);
          }
          for (const broken of brokenDemoPromises(await view())) {
            failures.push(`${seededOn} + ${days} days: ${broken}`);
          }
        }
      }
      expect(failures).toEqual([]);
    },
    10 * 60_000,
  );
});
