import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LocalFolderStorage } from '../../api/src/adapters/storage.js';
import { addDays, localDate } from '../../api/src/seed/calendar.js';
import { DEMO_ATHLETES, DEMO_PASSWORD } from '../../api/src/seed/demo-team.js';
import { SHIFTED_DATE_COLUMNS } from '../../api/src/seed/refresh-demo-dates.js';
import { seedDemo } from '../../api/src/seed/seed-demo.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

const DAY_MS = 86_400_000;
const seededAt = new Date('2026-12-01T11:30:00Z');
// Nine days on, at the same clock time: every athlete's own today is nine days later too.
const later = new Date(seededAt.getTime() + 9 * DAY_MS);
const COUNTDOWN_EMAIL = 'athlete@driftmark.test';
const COUNTDOWN_TZ = 'Europe/Madrid';

let t: TestApp;
let now = seededAt;
const uploadsDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-refresh-'));
const seed = () =>
  seedDemo(t.dataSource, { appMode: 'test', now, storage: new LocalFolderStorage(uploadsDir) });

const tables = () => t.dataSource.entityMetadatas.map((m) => m.tableName).sort();

/** Rows per table; sessions and rate-limit counters aside (the test signs in). */
async function counts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of tables().filter((x) => x !== 'sessions' && x !== 'rate_limit_counters')) {
    const [row] = await t.dataSource.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM "${table}"`);
    out[table] = row!.n;
  }
  return out;
}

/** One hash per table of every row as text: equal means nothing changed. */
async function fingerprint(): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const table of tables()) {
    const [row] = await t.dataSource.query<{ h: string }[]>(
      `SELECT md5(coalesce(string_agg(x::text, '|' ORDER BY x.id), '')) AS h FROM "${table}" x`,
    );
    out[table] = row!.h;
  }
  return out;
}

/** Every moved date column, by `table.column` and row id. */
async function movedDates(): Promise<Map<string, string | null>> {
  const out = new Map<string, string | null>();
  for (const qualified of SHIFTED_DATE_COLUMNS) {
    const [table, column] = qualified.split('.') as [string, string];
    const rows = await t.dataSource.query<{ id: string; d: string | null }[]>(
      `SELECT id, to_char("${column}", 'YYYY-MM-DD') AS d FROM "${table}"`,
    );
    for (const r of rows) out.set(`${qualified}:${r.id}`, r.d);
  }
  return out;
}

/** Rows whose instants no longer fall on their local date (or, when timed, at their local time). */
/** The instants of the mark threads, by `table.column:id`, in ms (no DST change in December's demo weeks). */
async function markInstants(): Promise<Map<string, number>> {
  const out = new Map<string, number>();
  const columns: Record<string, string[]> = {
    marks: ['created_at', 'updated_at'],
    mark_replies: ['created_at', 'updated_at'],
    mark_reads: ['read_at', 'created_at', 'updated_at'],
  };
  for (const [table, cols] of Object.entries(columns)) {
    const rows = await t.dataSource.query<Record<string, Date>[]>(
      `SELECT id, ${cols.join(', ')} FROM "${table}"`,
    );
    for (const r of rows) for (const c of cols) out.set(`${table}.${c}:${String(r.id)}`, r[c]!.getTime());
  }
  return out;
}

async function incoherentRows(): Promise<number> {
  let n = 0;
  for (const table of SHIFTED_DATE_COLUMNS.filter((c) => c.endsWith('.local_date')).map(
    (c) => c.split('.')[0],
  )) {
    const timed = ['weigh_ins', 'fluid_entries', 'meal_entries', 'supplement_entries', 'symptom_reports'];
    const [row] = await t.dataSource.query<{ n: number }[]>(
      `SELECT count(*)::int AS n FROM "${table}" x
         JOIN athletes a ON a.id = x.athlete_id JOIN users u ON u.id = a.user_id
        WHERE (x.created_at AT TIME ZONE u.time_zone)::date <> x.local_date` +
        (timed.includes(table!)
          ? ` OR (x.logged_at AT TIME ZONE u.time_zone)::date <> x.local_date
              OR to_char(x.logged_at AT TIME ZONE u.time_zone, 'HH24:MI') <> x.local_time`
          : ''),
    );
    n += row!.n;
  }
  return n;
}

async function countdownAthlete() {
  const [row] = await t.dataSource.query<{ id: string; event_date: string; last_weigh_in: string }[]>(
    `SELECT a.id, to_char(a.event_date, 'YYYY-MM-DD') AS event_date,
            (SELECT to_char(max(w.local_date), 'YYYY-MM-DD') FROM weigh_ins w WHERE w.athlete_id = a.id) AS last_weigh_in
       FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = $1`,
    [COUNTDOWN_EMAIL],
  );
  return row!;
}

async function anchor(): Promise<string | undefined> {
  const [row] = await t.dataSource.query<{ a: string | null }[]>(
    `SELECT settings->>'demoAnchorAt' AS a FROM teams`,
  );
  return row?.a ?? undefined;
}

async function day(date: string) {
  const agent = await signedIn(t.app, COUNTDOWN_EMAIL, DEMO_PASSWORD);
  const { id } = await countdownAthlete();
  const res = await agent.get(`/api/athletes/${id}/days/${date}`);
  expect(res.status).toBe(200);
  return res.body.data;
}

beforeAll(async () => {
  t = await buildTestApp({ uploadsDir }, { clock: () => now });
  await t.reset();
  expect(await seed()).toEqual({ created: true, movedDays: 0 });
});
afterAll(async () => {
  await t?.reset();
  await t?.close();
  rmSync(uploadsDir, { recursive: true, force: true });
});

describe('demo date refresh', () => {
  it('names every date column of the schema (birth dates stay as they are)', () => {
    const dateColumns = t.dataSource.entityMetadatas.flatMap((m) =>
      m.columns.filter((c) => c.type === 'date').map((c) => `${m.tableName}.${c.databaseName}`),
    );
    expect(dateColumns.filter((c) => c !== 'athletes.birth_date').sort()).toEqual(
      [...SHIFTED_DATE_COLUMNS].sort(),
    );
  });

  it('moves every dated thing forward by the days since the seed, keeping the countdown around today', async () => {
    const today = localDate(seededAt, COUNTDOWN_TZ);
    const before = {
      counts: await counts(),
      dates: await movedDates(),
      marks: await markInstants(),
      athlete: await countdownAthlete(),
      today: await day(today),
    };
    expect(await anchor()).toBe(seededAt.toISOString());
    expect(before.athlete).toMatchObject({ event_date: '2026-12-05', last_weigh_in: addDays(today, -1) });
    expect(before.today.countdown).toMatchObject({ dayLabel: 'E-4', label: 'Steady' });
    expect(await incoherentRows()).toBe(0);

    now = later;
    expect(await seed()).toEqual({ created: false, movedDays: 9 });

    const newToday = localDate(later, COUNTDOWN_TZ);
    expect(newToday).toBe(addDays(today, 9));
    const athlete = await countdownAthlete();
    expect(athlete.event_date).toBe('2026-12-14');
    expect(athlete.last_weigh_in).toBe(addDays(newToday, -1));

    // The new today is the same countdown day the seed's today was.
    const view = await day(newToday);
    expect(view.countdown).toEqual({ ...before.today.countdown, eventDate: '2026-12-14' });
    expect(view.targets).toEqual({
      ...before.today.targets,
      effectiveFrom: addDays(before.today.targets.effectiveFrom, 9),
    });
    expect(view.cautions).toEqual(before.today.cautions);
    expect(view.weighIn).toBeNull();
    // E-3 keeps its acknowledged carbohydrate-load caution, with the date in its words moved too.
    const e3 = await day(addDays(newToday, 1));
    expect(e3.countdown.dayLabel).toBe('E-3');
    expect(e3.cautions.map((c: { code: string }) => c.code)).toEqual(['countdown', 'carb_load']);
    expect(e3.cautions[1].message).toMatch(/^Fri 11 Dec \(E-3\)/);

    // Every date column moved by exactly nine days; nothing added or lost; instants still on their days.
    const dates = await movedDates();
    expect(dates.size).toBe(before.dates.size);
    for (const [key, d] of before.dates) expect(dates.get(key), key).toBe(d === null ? null : addDays(d, 9));
    expect(await counts()).toEqual(before.counts);
    expect(await incoherentRows()).toBe(0);
    expect(await anchor()).toBe(later.toISOString());
    // The marks' threads moved with their athletes: every instant nine days on.
    const marks = await markInstants();
    expect(before.marks.size).toBeGreaterThan(10);
    expect(marks.size).toBe(before.marks.size);
    for (const [key, ms] of before.marks) expect(marks.get(key), key).toBe(ms + 9 * DAY_MS);

    const plans = await t.dataSource.query<{ reason: string; content: { countdown: unknown } }[]>(
      `SELECT reason, content FROM plan_versions v JOIN athletes a ON a.id = v.athlete_id
         JOIN users u ON u.id = a.user_id WHERE u.email = $1 AND v.content->'countdown' <> 'null'`,
      [COUNTDOWN_EMAIL],
    );
    expect(plans).toEqual([
      expect.objectContaining({
        reason: 'Countdown "Classic show week" for 2026-12-14',
        content: expect.objectContaining({ countdown: expect.objectContaining({ eventDate: '2026-12-14' }) }),
      }),
    ]);
  });

  it('changes nothing on another run the same day, or with a clock behind the anchor', async () => {
    const before = await fingerprint();
    now = new Date(later.getTime() + 60 * 60_000);
    expect(await seed()).toEqual({ created: false, movedDays: 0 });
    now = seededAt;
    expect(await seed()).toEqual({ created: false, movedDays: 0 });
    expect(await fingerprint()).toEqual(before);
  });

  it('counts the days in each athlete’s own time zone', async () => {
    // 01:00 UTC: already the next day in Madrid and Tokyo, still the same one in the Americas,
    // Honolulu and (since the anchor was already 11 December there) Auckland.
    now = new Date('2026-12-11T01:00:00Z');
    expect(await seed()).toEqual({ created: false, movedDays: 1 });
    const rows = await t.dataSource.query<{ email: string; event_date: string | null }[]>(
      `SELECT u.email, to_char(a.event_date, 'YYYY-MM-DD') AS event_date
         FROM athletes a JOIN users u ON u.id = a.user_id`,
    );
    for (const def of DEMO_ATHLETES) {
      const row = rows.find((r) => r.email === def.email)!;
      const expected =
        def.event.type === 'none' ? null : addDays(localDate(now, def.timeZone), def.event.daysFromSeed);
      expect(row.event_date, def.email).toBe(expected);
    }
    const athlete = await countdownAthlete();
    expect(athlete.last_weigh_in).toBe(addDays(localDate(now, COUNTDOWN_TZ), -1));
    expect((await day(localDate(now, COUNTDOWN_TZ))).countdown.dayLabel).toBe('E-4');
    expect(await incoherentRows()).toBe(0);
  });
  it('never fails on a bad stored value: an unknown zone moves by UTC days, a date too far ahead stays put', async () => {
    const athletes = await t.dataSource.query<{ id: string; user_id: string }[]>(
      'SELECT id, user_id FROM athletes ORDER BY id',
    );
    const [odd, far, plain] = athletes as [
      { id: string; user_id: string },
      { id: string; user_id: string },
      { id: string; user_id: string },
    ];
    // Values the input policy now refuses, written before it existed.
    await t.dataSource.query(`UPDATE users SET time_zone = 'US/Pacific-New' WHERE id = $1`, [odd.user_id]);
    await t.dataSource.query(`UPDATE athletes SET event_date = '9999-12-30' WHERE id = $1`, [far.id]);
    const eventOf = async (id: string) =>
      (
        await t.dataSource.query<{ d: string }[]>(
          `SELECT to_char(event_date, 'YYYY-MM-DD') AS d FROM athletes WHERE id = $1`,
          [id],
        )
      )[0]?.d;
    const plainBefore = await eventOf(plain.id);
    const warnings: string[] = [];
    now = new Date(now.getTime() + 3 * DAY_MS);
    const result = await seedDemo(t.dataSource, {
      appMode: 'test',
      now,
      storage: new LocalFolderStorage(uploadsDir),
      warn: (message) => warnings.push(message),
    });
    expect(result.movedDays).toBeGreaterThan(0);
    expect(await eventOf(far.id)).toBe('9999-12-30');
    if (plainBefore) expect(await eventOf(plain.id)).toBe(addDays(plainBefore, 3));
    expect(warnings.some((w) => /unknown time zone/.test(w))).toBe(true);
    expect(warnings.some((w) => /too far ahead/.test(w))).toBe(true);
  });
});
