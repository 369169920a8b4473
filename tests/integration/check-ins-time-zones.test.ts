import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach } from '../factories/users.js';
import { fluidBody, weighInBody } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// "Today" is the athlete's own date in their time zone, whatever the server's clock says in UTC.
// Tonga (Pacific/Tongatapu) keeps UTC+13 all year, Auckland is UTC+13 on December daylight time,
// Honolulu is UTC−10; each case sits half an hour from local midnight.
let now = new Date();
const at = (iso: string) => {
  now = new Date(iso);
};

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

let tonga: CreatedAthlete;
let honolulu: CreatedAthlete;
let auckland: CreatedAthlete;
beforeEach(async () => {
  await t.reset();
  const coach = await createCoach(t.dataSource);
  tonga = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Pacific/Tongatapu' } });
  honolulu = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Pacific/Honolulu' } });
  auckland = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Pacific/Auckland' } });
});

const as = async (a: CreatedAthlete) => ({
  agent: await signedIn(t.app, a.user.email, FACTORY_PASSWORD),
  base: `/api/athletes/${a.athlete.id}`,
});

const loggedAt = async (clientId: string): Promise<string> => {
  const [row] = await t.dataSource.query(
    'SELECT logged_at, local_date::text AS d FROM fluid_entries WHERE client_id = $1',
    [clientId],
  );
  return `${row.d} ${row.logged_at.toISOString()}`;
};

describe('an athlete at UTC+13 (Pacific/Tongatapu)', () => {
  it('at 2026-12-01T10:30Z it is 23:30 on 1 December there: that day is today, 2 December is the future', async () => {
    at('2026-12-01T10:30:00Z');
    const { agent, base } = await as(tonga);
    const body = fluidBody({ time: '23:30' });
    const res = await agent.post(`${base}/days/2026-12-01/fluids`).send(body);
    expect(res.status).toBe(201);
    expect((await agent.get(`${base}/days/2026-12-01`)).body.data.isToday).toBe(true);
    expect(await loggedAt(body.clientId)).toBe('2026-12-01 2026-12-01T10:30:00.000Z');

    const tomorrow = await agent.post(`${base}/days/2026-12-02/fluids`).send(fluidBody({ time: '00:10' }));
    expect(tomorrow.status).toBe(400);
    expect(tomorrow.body.error.fields).toEqual({ date: 'That date is still in the future' });
    const late = await agent.put(`${base}/days/2026-12-01/weigh-in`).send(weighInBody({ time: '23:40' }));
    expect(late.body.error.fields).toEqual({ time: 'That time is still in the future' });
  });

  it('at 2026-12-01T11:30Z it is 00:30 on 2 December there: the new day has begun', async () => {
    at('2026-12-01T11:30:00Z');
    const { agent, base } = await as(tonga);
    const body = fluidBody({ time: '00:20' });
    const res = await agent.post(`${base}/days/2026-12-02/fluids`).send(body);
    expect(res.status).toBe(201);
    expect((await agent.get(`${base}/days/2026-12-02`)).body.data).toMatchObject({
      date: '2026-12-02',
      isToday: true,
      timeZone: 'Pacific/Tongatapu',
    });
    expect(await loggedAt(body.clientId)).toBe('2026-12-02 2026-12-01T11:20:00.000Z');

    // 00:35 is within the five-minute slack, 00:40 is not.
    expect(
      (await agent.post(`${base}/days/2026-12-02/fluids`).send(fluidBody({ time: '00:35' }))).status,
    ).toBe(201);
    const early = await agent.post(`${base}/days/2026-12-02/fluids`).send(fluidBody({ time: '00:40' }));
    expect(early.body.error.fields).toEqual({ time: 'That time is still in the future' });
    // The evening before is now yesterday, and any time on it is fine.
    const yesterday = await agent.post(`${base}/days/2026-12-01/fluids`).send(fluidBody({ time: '23:59' }));
    expect(yesterday.status).toBe(201);
    expect((await agent.get(`${base}/days/2026-12-01`)).body.data.isToday).toBe(false);
  });
});

describe('an athlete at UTC+13 on daylight time (Pacific/Auckland in December)', () => {
  it('at 2026-12-01T11:30Z logs on 2 December at 00:30', async () => {
    at('2026-12-01T11:30:00Z');
    const { agent, base } = await as(auckland);
    const body = fluidBody({ time: '00:30' });
    expect((await agent.post(`${base}/days/2026-12-02/fluids`).send(body)).status).toBe(201);
    expect(await loggedAt(body.clientId)).toBe('2026-12-02 2026-12-01T11:30:00.000Z');
  });
});

describe('an athlete at UTC−10 (Pacific/Honolulu)', () => {
  it('at 2026-12-02T09:30Z it is still 23:30 on 1 December there', async () => {
    at('2026-12-02T09:30:00Z');
    const { agent, base } = await as(honolulu);
    const tomorrow = await agent.put(`${base}/days/2026-12-02/weigh-in`).send(weighInBody({ time: '06:00' }));
    expect(tomorrow.status).toBe(400);
    expect(tomorrow.body.error.fields).toEqual({ date: 'That date is still in the future' });

    const body = fluidBody({ time: '23:30' });
    const res = await agent.post(`${base}/days/2026-12-01/fluids`).send(body);
    expect(res.status).toBe(201);
    expect((await agent.get(`${base}/days/2026-12-01`)).body.data).toMatchObject({
      date: '2026-12-01',
      isToday: true,
    });
    expect(await loggedAt(body.clientId)).toBe('2026-12-01 2026-12-02T09:30:00.000Z');
    expect(
      (await agent.put(`${base}/days/2026-12-01/weigh-in`).send(weighInBody({ time: '23:34' }))).status,
    ).toBe(200);
    const late = await agent.put(`${base}/days/2026-12-01/weigh-in`).send(weighInBody({ time: '23:36' }));
    expect(late.body.error.fields).toEqual({ time: 'That time is still in the future' });

    // The history lists the athlete's local date, not the UTC one.
    const history = await agent.get(`${base}/days?from=2026-11-25&to=2026-12-02`);
    expect(history.body.data.map((d: { date: string }) => d.date)).toEqual(['2026-12-01']);
  });

  it('half an hour later (10:30Z) 2 December has begun there', async () => {
    at('2026-12-02T10:30:00Z');
    const { agent, base } = await as(honolulu);
    const res = await agent.post(`${base}/days/2026-12-02/fluids`).send(fluidBody({ time: '00:30' }));
    expect(res.status).toBe(201);
    expect((await agent.get(`${base}/days/2026-12-02`)).body.data.isToday).toBe(true);
    expect((await agent.get(`${base}/days/2026-12-01`)).body.data.isToday).toBe(false);
  });
});

describe('two athletes at the same instant', () => {
  it('have different todays', async () => {
    at('2026-12-01T11:30:00Z');
    const t1 = await as(tonga);
    const h1 = await as(honolulu);
    expect((await t1.agent.get(`${t1.base}/days/2026-12-02`)).body.data.isToday).toBe(true);
    expect((await h1.agent.get(`${h1.base}/days/2026-12-01`)).body.data.isToday).toBe(true);
    expect(
      (await h1.agent.post(`${h1.base}/days/2026-12-02/fluids`).send(fluidBody({ time: '00:10' }))).status,
    ).toBe(400);
  });
});
