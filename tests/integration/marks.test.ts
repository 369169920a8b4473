import type { MarkView } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { AthleteReviewRepository } from '../../api/src/repositories/athlete-review.repository.js';
import { MarkRepository } from '../../api/src/repositories/mark.repository.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// A clock the tests move forward: read state compares instants, so each step needs its own.
let now = new Date('2026-12-01T10:00:00Z');
const tick = (minutes = 5) => {
  now = new Date(now.getTime() + minutes * 60_000);
  return now;
};

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

interface World {
  owner: User;
  coach: User;
  otherCoach: User;
  sharedAssistant: User;
  assistant: User;
  athlete: CreatedAthlete;
  otherAthlete: CreatedAthlete;
  outsiderCoach: User;
  /** A mark by the coach on `athlete`, with one reply by the athlete. */
  markId: string;
}
let w: World;

type Agent = Awaited<ReturnType<typeof signedIn>>;
const as = (user: { email: string }): Promise<Agent> => signedIn(t.app, user.email, FACTORY_PASSWORD);

const TABLES = ['marks', 'mark_replies', 'mark_reads'] as const;

/** Every mark table, to show that a refused request changed nothing. */
async function markRows(db: DataSource): Promise<Record<string, unknown[]>> {
  const out: Record<string, unknown[]> = {};
  for (const table of TABLES) out[table] = await db.query(`SELECT * FROM "${table}" ORDER BY id`);
  return out;
}

const markBody = (overrides: Record<string, unknown> = {}) => ({
  metric: 'weight',
  fromDate: '2026-11-20',
  toDate: '2026-11-26',
  note: 'Water load days: weight up as expected',
  ...overrides,
});

beforeEach(async () => {
  await t.reset();
  now = new Date('2026-12-01T10:00:00Z');
  const owner = await createOwner(t.dataSource);
  const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  const otherCoach = await createCoach(t.dataSource, { teamId: owner.teamId });
  const sharedAssistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  const athlete = await createAthlete(t.dataSource, { coach });
  const otherAthlete = await createAthlete(t.dataSource, { coach });
  await shareAthlete(t.dataSource, athlete.athlete, sharedAssistant);
  const outsiderOwner = await createOwner(t.dataSource);
  const outsiderCoach = await createCoach(t.dataSource, { teamId: outsiderOwner.teamId });
  const marks = new MarkRepository(t.dataSource.manager);
  const mark = await marks.create({
    athleteId: athlete.athlete.id,
    authorId: coach.id,
    metric: 'fluids',
    fromDate: '2026-11-10',
    toDate: '2026-11-10',
    note: 'Late fluids again',
    createdAt: new Date('2026-11-30T08:00:00Z'),
  });
  await marks.upsertRead(mark.id, coach.id, new Date('2026-11-30T08:00:00Z'));
  await marks.addReply({
    markId: mark.id,
    authorId: athlete.user.id,
    body: 'Training ran late',
    createdAt: new Date('2026-11-30T09:00:00Z'),
  });
  w = {
    owner,
    coach,
    otherCoach,
    sharedAssistant,
    assistant,
    athlete,
    otherAthlete,
    outsiderCoach,
    markId: mark.id,
  };
});

const marksPath = () => `/api/athletes/${w.athlete.athlete.id}/marks`;

async function listFor(agent: Agent, query = ''): Promise<MarkView[]> {
  const res = await agent.get(`${marksPath()}${query}`);
  expect(res.status).toBe(200);
  return res.body.data as MarkView[];
}

describe('a mark’s thread, both sides', () => {
  it('coach pins a range, the athlete sees it unread, reads and replies; the coach sees the reply', async () => {
    const coach = await as(w.coach);
    const athlete = await as(w.athlete.user);

    const created = await coach.post(marksPath()).send(markBody());
    expect(created.status).toBe(201);
    const createdAt = now.toISOString();
    const mark = created.body.data as MarkView;
    expect(mark).toMatchObject({
      athleteId: w.athlete.athlete.id,
      author: { id: w.coach.id, name: w.coach.name, role: 'coach' },
      metric: 'weight',
      fromDate: '2026-11-20',
      toDate: '2026-11-26',
      note: 'Water load days: weight up as expected',
      createdAt,
      replies: [],
      // Written by the coach: read for them.
      unread: false,
      readByOtherAt: null,
    });
    expect(created.body.abilities).toEqual({ update: true, delete: true, reply: true });

    tick();
    const seen = (await listFor(athlete)).find((m) => m.id === mark.id)!;
    // The author's read is the creation itself.
    expect(seen).toMatchObject({ unread: true, readByOtherAt: createdAt });

    const readAt = tick().toISOString();
    const read = await athlete.post(`/api/marks/${mark.id}/read`);
    expect(read.status).toBe(200);
    expect(read.body.data).toMatchObject({ unread: false });
    expect(read.body.abilities).toEqual({ update: false, delete: false, reply: true });
    expect((await listFor(coach)).find((m) => m.id === mark.id)).toMatchObject({
      unread: false,
      readByOtherAt: readAt,
    });

    const repliedAt = tick().toISOString();
    const reply = await athlete.post(`/api/marks/${mark.id}/replies`).send({ body: '  Felt flat too  ' });
    expect(reply.status).toBe(201);
    expect(reply.body.data).toMatchObject({
      unread: false,
      replies: [
        {
          author: { id: w.athlete.user.id, role: 'athlete' },
          body: 'Felt flat too',
          createdAt: repliedAt,
        },
      ],
    });

    tick();
    const coachView = (await listFor(coach)).find((m) => m.id === mark.id)!;
    // Replying marked the thread read for the athlete.
    expect(coachView).toMatchObject({ unread: true, readByOtherAt: repliedAt });
    const unread = await new MarkRepository(t.dataSource.manager).unreadRepliesByAthlete(w.coach.id, [
      w.athlete.athlete.id,
      w.otherAthlete.athlete.id,
    ]);
    // Both marks of the athlete hold an unread reply by the athlete; the other athlete has none.
    expect([...unread.entries()]).toEqual([
      [w.athlete.athlete.id, { count: 2, latestAt: new Date(repliedAt) }],
    ]);

    const coachReadAt = tick().toISOString();
    expect((await coach.post(`/api/marks/${mark.id}/read`)).status).toBe(200);
    tick();
    expect((await listFor(athlete)).find((m) => m.id === mark.id)).toMatchObject({
      unread: false,
      readByOtherAt: coachReadAt,
    });
    const after = await new MarkRepository(t.dataSource.manager).unreadRepliesByAthlete(w.coach.id, [
      w.athlete.athlete.id,
    ]);
    expect(after.get(w.athlete.athlete.id)).toEqual({ count: 1, latestAt: new Date('2026-11-30T09:00:00Z') });
  });

  it('staff see the athlete’s read; a staff reply is unread for the athlete; own replies never are', async () => {
    const assistant = await as(w.sharedAssistant);
    const list = await listFor(assistant);
    expect(list).toHaveLength(1);
    // Never read by the assistant: the coach's mark and the athlete's reply are both new to them.
    expect(list[0]).toMatchObject({ unread: true, readByOtherAt: null });

    tick();
    const reply = await assistant.post(`/api/marks/${w.markId}/replies`).send({ body: 'Noted, thanks' });
    expect(reply.status).toBe(201);
    expect(reply.body.data.unread).toBe(false);
    expect(reply.body.data.replies.map((r: { body: string }) => r.body)).toEqual([
      'Training ran late',
      'Noted, thanks',
    ]);

    tick();
    const athleteList = await listFor(await as(w.athlete.user));
    // The athlete never read the thread and staff replied since.
    expect(athleteList[0]).toMatchObject({ unread: true, readByOtherAt: '2026-11-30T08:00:00.000Z' });
  });

  it('an edit makes the mark unread again for the athlete', async () => {
    const athlete = await as(w.athlete.user);
    tick();
    expect((await athlete.post(`/api/marks/${w.markId}/read`)).body.data.unread).toBe(false);
    tick();
    const coach = await as(w.coach);
    const edited = await coach.patch(`/api/marks/${w.markId}`).send({ note: 'Late fluids, third time' });
    expect(edited.status).toBe(200);
    expect(edited.body.data).toMatchObject({ note: 'Late fluids, third time', updatedAt: now.toISOString() });
    tick();
    expect((await listFor(athlete))[0]).toMatchObject({ note: 'Late fluids, third time', unread: true });
  });

  it('lists the marks overlapping a range, newest first, with the list abilities', async () => {
    const coach = await as(w.coach);
    for (const [fromDate, toDate] of [
      ['2026-10-01', '2026-10-05'],
      ['2026-11-01', '2026-11-30'],
    ] as const) {
      tick();
      expect((await coach.post(marksPath()).send(markBody({ fromDate, toDate }))).status).toBe(201);
    }
    const all = await coach.get(marksPath());
    expect(all.body.abilities).toEqual({ create: true, reply: true });
    expect((all.body.data as MarkView[]).map((m) => m.fromDate)).toEqual([
      '2026-11-01',
      '2026-10-01',
      '2026-11-10',
    ]);
    expect((await listFor(coach, '?from=2026-10-05&to=2026-10-31')).map((m) => m.fromDate)).toEqual([
      '2026-10-01',
    ]);
    expect((await listFor(coach, '?from=2026-11-11')).map((m) => m.fromDate)).toEqual(['2026-11-01']);
    expect((await listFor(coach, '?to=2026-10-31')).map((m) => m.fromDate)).toEqual(['2026-10-01']);

    const athleteList = await (await as(w.athlete.user)).get(marksPath());
    expect(athleteList.body.abilities).toEqual({ create: false, reply: true });
  });
});

describe('author only', () => {
  it('only the author edits or deletes; other staff who can read get 403 and nothing changes', async () => {
    for (const who of [w.sharedAssistant, w.owner, w.athlete.user]) {
      const agent = await as(who);
      const before = await markRows(t.dataSource);
      expect((await agent.patch(`/api/marks/${w.markId}`).send({ note: 'Changed' })).status).toBe(403);
      expect((await agent.delete(`/api/marks/${w.markId}`)).status).toBe(403);
      expect(await markRows(t.dataSource)).toEqual(before);
    }
  });

  it('the author deletes the mark with its replies and reads', async () => {
    const coach = await as(w.coach);
    expect((await coach.delete(`/api/marks/${w.markId}`)).status).toBe(204);
    const rows = await markRows(t.dataSource);
    expect(rows).toEqual({ marks: [], mark_replies: [], mark_reads: [] });
    expect((await coach.delete(`/api/marks/${w.markId}`)).status).toBe(404);
  });

  it('an assistant pins a mark on a shared athlete and edits their own', async () => {
    const assistant = await as(w.sharedAssistant);
    const created = await assistant
      .post(marksPath())
      .send(markBody({ metric: 'energy', note: 'Energy low' }));
    expect(created.status).toBe(201);
    expect(created.body.data.author).toMatchObject({ id: w.sharedAssistant.id, role: 'assistant' });
    const id = created.body.data.id as string;
    expect((await assistant.patch(`/api/marks/${id}`).send({ note: 'Energy low all week' })).status).toBe(
      200,
    );
    const coach = await as(w.coach);
    expect((await coach.patch(`/api/marks/${id}`).send({ note: 'Mine now' })).status).toBe(403);
  });
});

describe('validation', () => {
  it('names the field', async () => {
    const coach = await as(w.coach);
    const before = await markRows(t.dataSource);
    const cases: [Record<string, unknown>, string][] = [
      [markBody({ fromDate: '2026-11-20', toDate: '2026-11-19' }), 'toDate'],
      [markBody({ note: '   ' }), 'note'],
      [markBody({ note: 'x'.repeat(2001) }), 'note'],
      [markBody({ metric: 'mood' }), 'metric'],
      [markBody({ fromDate: '2026-02-30' }), 'fromDate'],
      // 401 days, one more than a mark may span.
      [markBody({ fromDate: '2025-10-26', toDate: '2026-11-30' }), 'toDate'],
    ];
    for (const [body, field] of cases) {
      const res = await coach.post(marksPath()).send(body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
      expect(Object.keys(res.body.error.fields), JSON.stringify(body)).toEqual([field]);
    }
    // 400 days exactly is allowed.
    const longest = await coach
      .post(marksPath())
      .send(markBody({ fromDate: '2025-10-27', toDate: '2026-11-30' }));
    expect(longest.status).toBe(201);
    await coach.delete(`/api/marks/${longest.body.data.id}`);

    expect((await coach.patch(`/api/marks/${w.markId}`).send({ note: '' })).body.error.fields).toHaveProperty(
      'note',
    );
    const reply = await coach.post(`/api/marks/${w.markId}/replies`).send({ body: ' ' });
    expect(reply.status).toBe(400);
    expect(reply.body.error.fields).toHaveProperty('body');
    const list = await coach.get(`${marksPath()}?from=2026-11-20&to=2026-11-19`);
    expect(list.status).toBe(400);
    expect(list.body.error.fields).toHaveProperty('to');
    expect(await markRows(t.dataSource)).toEqual(before);
  });
});

describe('who may not', () => {
  /** Every mark route, each with a body that would succeed for an allowed actor. */
  const routes = (): { name: string; send: (a: Agent) => Promise<{ status: number }> }[] => [
    { name: 'GET marks', send: (a) => a.get(marksPath()) },
    { name: 'POST mark', send: (a) => a.post(marksPath()).send(markBody()) },
    { name: 'PATCH mark', send: (a) => a.patch(`/api/marks/${w.markId}`).send({ note: 'Changed' }) },
    { name: 'DELETE mark', send: (a) => a.delete(`/api/marks/${w.markId}`) },
    { name: 'POST reply', send: (a) => a.post(`/api/marks/${w.markId}/replies`).send({ body: 'Hi' }) },
    { name: 'POST read', send: (a) => a.post(`/api/marks/${w.markId}/read`) },
  ];

  it.each([
    ['a coach of another team', (x: World) => x.outsiderCoach],
    ['an assistant without the share', (x: World) => x.assistant],
    ['a coach of the team who is neither assigned nor shared', (x: World) => x.otherCoach],
    ['another athlete of the team', (x: World) => x.otherAthlete.user],
  ])('%s gets 404 on every route and no row changes', async (_name, who) => {
    const agent = await as(who(w));
    const before = await markRows(t.dataSource);
    for (const route of routes()) expect((await route.send(agent)).status, route.name).toBe(404);
    expect(await markRows(t.dataSource)).toEqual(before);
  });

  it('the athlete cannot pin marks (403), and nothing changes', async () => {
    const agent = await as(w.athlete.user);
    const before = await markRows(t.dataSource);
    expect((await agent.post(marksPath()).send(markBody())).status).toBe(403);
    expect(await markRows(t.dataSource)).toEqual(before);
  });

  it('a mark of another athlete is 404 through the athlete’s own id; unknown ids are 404', async () => {
    const agent = await as(w.otherAthlete.user);
    const res = await agent.get(`/api/athletes/${w.otherAthlete.athlete.id}/marks`);
    expect(res.status).toBe(200);
    expect(res.body.data).toEqual([]);
    const coach = await as(w.coach);
    expect((await coach.post('/api/marks/00000000-0000-4000-8000-000000000000/read')).status).toBe(404);
    expect((await coach.post('/api/marks/not-a-uuid/read')).status).toBe(404);
  });
});

describe('review state', () => {
  it('keeps one row per athlete and reviewer, moving forward only', async () => {
    const reviews = new AthleteReviewRepository(t.dataSource.manager);
    const first = new Date('2026-12-01T10:00:00Z');
    expect(await reviews.upsertReview(w.athlete.athlete.id, w.coach.id, first)).toEqual(first);
    const later = new Date('2026-12-02T10:00:00Z');
    expect(await reviews.upsertReview(w.athlete.athlete.id, w.coach.id, later)).toEqual(later);
    // A slower request with an older instant never moves it back.
    expect(await reviews.upsertReview(w.athlete.athlete.id, w.coach.id, first)).toEqual(later);
    await reviews.upsertReview(w.otherAthlete.athlete.id, w.sharedAssistant.id, first);
    const map = await reviews.lastReviewedByAthlete(w.coach.id, [
      w.athlete.athlete.id,
      w.otherAthlete.athlete.id,
    ]);
    expect([...map.entries()]).toEqual([[w.athlete.athlete.id, later]]);
    expect(await reviews.lastReviewedByAthlete(w.coach.id, [])).toEqual(new Map());
  });
});
