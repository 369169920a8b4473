import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isValidTimeZone, listTimeZones } from '@driftmark/shared';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { planContent, versionBody } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

/**
 * The one input policy over HTTP: a NUL in any free-text field answers 400 naming the field (it
 * used to reach PostgreSQL and answer 500); time zones are ones PostgreSQL knows; upload file
 * names are read as UTF-8 and cleaned of control characters.
 */
const now = new Date('2026-12-01T20:00:00Z');
const TODAY = '2026-12-01';
const NUL = 'a\u0000b';

let t: TestApp;
let owner: User;
let coach: User;
let athlete: CreatedAthlete;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let agents: Record<'owner' | 'coach' | 'athlete', Agent>;

beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
  await t.reset();
  owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  athlete = await createAthlete(t.dataSource, { coach });
  agents = {
    owner: await signedIn(t.app, owner.email, FACTORY_PASSWORD),
    coach: await signedIn(t.app, coach.email, FACTORY_PASSWORD),
    athlete: await signedIn(t.app, athlete.user.email, FACTORY_PASSWORD),
  };
});
afterAll(() => t.close());

describe('a NUL in a free-text field', () => {
  const fill = (path: string) =>
    path
      .replace('{a}', `/api/athletes/${athlete.athlete.id}`)
      .replace('{d}', `/api/athletes/${athlete.athlete.id}/days/${TODAY}`);
  const dayType = (name: string) => ({ key: 'training', name, targets: {} });
  /** [who, method, path ({a}: the athlete, {d}: its day today), body, field the answer names] */
  const cases: [keyof typeof agents, 'post' | 'put' | 'patch', string, object, string][] = [
    ['athlete', 'patch', '/api/me/settings', { name: NUL }, 'name'],
    ['coach', 'post', '/api/invitations', { email: 'x@example.test', name: NUL, role: 'athlete' }, 'name'],
    ['athlete', 'put', '{a}/intake', { eventName: NUL }, 'eventName'],
    ['athlete', 'put', '{a}/intake', { division: NUL }, 'division'],
    ['coach', 'patch', '{a}/event', { eventDate: '2027-03-14', eventName: NUL }, 'eventName'],
    ['athlete', 'post', '{d}/meals', { source: 'macros', name: NUL }, 'name'],
    ['athlete', 'post', '{d}/supplements', { name: NUL }, 'name'],
    ['athlete', 'post', '{d}/supplements', { name: 'Creatine', doseUnit: NUL }, 'doseUnit'],
    ['athlete', 'put', '{d}/evening', { trainingNote: NUL }, 'trainingNote'],
    ['athlete', 'put', '{d}/evening', { note: NUL }, 'note'],
    ['athlete', 'post', '{d}/symptoms', { note: NUL }, 'note'],
    ['coach', 'post', '/api/foods', { name: NUL }, 'name'],
    ['coach', 'put', '/api/team/poses', { poses: [NUL] }, 'poses.0'],
    ['coach', 'post', '{a}/marks', { metric: 'weight', fromDate: TODAY, toDate: TODAY, note: NUL }, 'note'],
    ['coach', 'post', '{a}/plan/versions', { reason: NUL }, 'reason'],
    ['coach', 'post', '{a}/plan/check', { content: { dayTypes: [dayType(NUL)] } }, 'content.dayTypes.0.name'],
    ['coach', 'post', '/api/countdown-templates', { name: NUL }, 'name'],
    ['coach', 'post', '/api/countdown-templates', { description: NUL }, 'description'],
    ['coach', 'post', '/api/countdown-templates', { days: [{ offset: 0, label: NUL }] }, 'days.0.label'],
    [
      'coach',
      'put',
      '/api/team/check-in-questions',
      { questions: [{ kind: 'text', prompt: NUL }] },
      'questions.0.prompt',
    ],
    ['athlete', 'post', '{a}/weekly-check-ins', { questionsForCoach: NUL }, 'questionsForCoach'],
  ];
  it.each(cases)('%s: %s %s answers 400 naming the field', async (who, method, path, body, field) => {
    const res = await agents[who][method](fill(path)).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields[field]).toMatch(/control character/);
  });
});

describe('time zones', () => {
  it('every zone the picker lists and every name PostgreSQL lists that we accept is one PostgreSQL knows', async () => {
    const rows = await t.dataSource.query<{ name: string }[]>('SELECT name FROM pg_timezone_names');
    const pg = new Set(rows.map((r) => r.name));
    expect(listTimeZones().filter((tz) => !pg.has(tz))).toEqual([]);
    // Names Intl accepts but PostgreSQL does not (the two, and other abbreviations) are refused.
    for (const tz of ['SST', 'US/Pacific-New', 'EST', 'HST', 'PST8PDT', 'GMT+0', 'Asia/Nowhere']) {
      expect(isValidTimeZone(tz), tz).toBe(false);
    }
    const acceptedButUnknown = [...pg].filter((tz) => isValidTimeZone(tz) && !pg.has(tz));
    expect(acceptedButUnknown).toEqual([]);
  });

  it('a zone PostgreSQL does not know is refused with the field named', async () => {
    for (const tz of ['SST', 'US/Pacific-New']) {
      const res = await agents.athlete.patch('/api/me/settings').send({ timeZone: tz });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.timeZone).toBe('Choose a time zone from the list');
    }
  });
});

describe('upload file names', () => {
  const send = (filename: string) =>
    agents.athlete
      .post(`/api/athletes/${athlete.athlete.id}/photos`)
      .field('date', TODAY)
      .field('pose', 'Front relaxed')
      .attach('files', Buffer.from('not an image'), { filename, contentType: 'image/jpeg' });

  it('are read as UTF-8 ("é" stays "é")', async () => {
    const res = await send('café.jpg');
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.body.error.message).toContain('"café.jpg"');
  });

  it('with a control character answer 400 in the error shape, never a 500', async () => {
    for (const name of ['caf\u0007e.jpg', 'a\u0000.jpg', 'a\u001b[31m.jpg', 'a\u0085.jpg']) {
      const res = await send(name);
      expect(res.status, JSON.stringify(name)).toBeGreaterThanOrEqual(400);
      expect(res.status, JSON.stringify(name)).toBeLessThan(500);
      expect(res.body.error.code).toEqual(expect.any(String));
      expect(res.body.error.message).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/);
    }
  });

  it('a malformed part header answers 400 in the error shape', async () => {
    const boundary = 'xyz';
    const body = Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="a\u0000\r\nb.jpg"\r\n\r\nxx\r\n--${boundary}--\r\n`,
      'latin1',
    );
    const res = await agents.athlete
      .post(`/api/athletes/${athlete.athlete.id}/photos`)
      .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
      .send(body);
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.body.error.code).toEqual(expect.any(String));
  });
});

describe('dates within their windows (5 years back, 3 years ahead of the pinned today)', () => {
  const a = () => `/api/athletes/${athlete.athlete.id}`;
  const weighIn = { weight: 72.4, unit: 'kg', time: '07:10', protocolConfirmed: true, tags: [] };

  it('an entry: at most 5 years back, naming the date', async () => {
    const old = await agents.athlete.put(`${a()}/days/2021-11-30/weigh-in`).send(weighIn);
    expect(old.status).toBe(400);
    expect(old.body.error.fields.date).toMatch(/No earlier than 2021-12-01/);
    const oldest = await agents.athlete.put(`${a()}/days/2021-12-01/weigh-in`).send(weighIn);
    expect(oldest.status).toBe(200);
  });

  it('an event: at most 3 years ahead', async () => {
    const res = await agents.coach.patch(`${a()}/event`).send({ eventDate: '2029-12-02' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.eventDate).toMatch(/No later than 2029-12-01/);
  });

  it('a plan version, a mark and a trend range', async () => {
    const version = await agents.coach
      .post(`${a()}/plan/versions`)
      .send(versionBody('9999-12-31', planContent()));
    expect(version.status).toBe(400);
    expect(version.body.error.fields.effectiveFrom).toMatch(/No later than 2029-12-01/);
    const mark = await agents.coach
      .post(`${a()}/marks`)
      .send({ metric: 'weight', fromDate: '1000-01-01', toDate: TODAY, note: 'Old' });
    expect(mark.status).toBe(400);
    expect(mark.body.error.fields.fromDate).toMatch(/No earlier than/);
    const trend = await agents.coach.get(`${a()}/trend`).query({ from: '1000-01-01', to: '9999-12-31' });
    expect(trend.status).toBe(400);
    expect(trend.body.error.fields).toMatchObject({ from: expect.any(String), to: expect.any(String) });
  });
});
