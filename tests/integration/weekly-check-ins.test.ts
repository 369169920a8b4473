import {
  reviewQueueItem,
  weeklyCheckInView,
  type CheckInQuestion,
  type WeeklyCheckInView,
} from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { newId } from './check-ins-helpers.js';
import { planContent } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { insertVersion } from './trend-helpers.js';

// Tuesday 1 December 2026, 10:00 UTC. The tests move it where they need to.
const START = new Date('2026-12-01T10:00:00Z');
let now = START;

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

type Agent = Awaited<ReturnType<typeof signedIn>>;
const as = (user: { email: string }): Promise<Agent> => signedIn(t.app, user.email, FACTORY_PASSWORD);

const QUESTIONS: CheckInQuestion[] = [
  { id: newId(), kind: 'scale', prompt: 'How hard did training feel?' },
  { id: newId(), kind: 'yes_no', prompt: 'Every session done?' },
  { id: newId(), kind: 'text', prompt: 'What got in the way?' },
];

interface World {
  owner: User;
  coach: User;
  sharedAssistant: User;
  assistant: User;
  outsider: User;
  /** UTC, check-in weekday Monday: due yesterday (30 Nov), covering 23–29 Nov. */
  athlete: CreatedAthlete;
  otherAthlete: CreatedAthlete;
}
let w: World;

beforeEach(async () => {
  await t.reset();
  now = START;
  const owner = await createOwner(t.dataSource);
  const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  const sharedAssistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  const athlete = await createAthlete(t.dataSource, {
    coach,
    user: { name: 'Wren Weekly', timeZone: 'UTC' },
    athlete: { checkInWeekday: 'mon' },
  });
  const otherAthlete = await createAthlete(t.dataSource, { coach, user: { timeZone: 'UTC' } });
  await shareAthlete(t.dataSource, athlete.athlete, sharedAssistant);
  const outsiderOwner = await createOwner(t.dataSource);
  const outsider = await createCoach(t.dataSource, { teamId: outsiderOwner.teamId });
  w = { owner, coach, sharedAssistant, assistant, outsider, athlete, otherAthlete };
  const res = await (await as(coach)).put('/api/team/check-in-questions').send({ questions: QUESTIONS });
  expect(res.status).toBe(200);
});

const weeklyPath = (a: CreatedAthlete = w.athlete) => `/api/athletes/${a.athlete.id}/weekly-check-ins`;

async function current(agent: Agent, a: CreatedAthlete = w.athlete) {
  const res = await agent.get(`${weeklyPath(a)}/current`);
  expect(res.status).toBe(200);
  return { view: weeklyCheckInView.strict().parse(res.body.data), abilities: res.body.abilities };
}

const submission = (overrides: Record<string, unknown> = {}) => ({
  dueDate: '2026-11-30',
  answers: [
    { questionId: QUESTIONS[0]!.id, value: 4 },
    { questionId: QUESTIONS[1]!.id, value: true },
    { questionId: QUESTIONS[2]!.id, value: 'A late work trip' },
  ],
  questionsForCoach: 'Can the rest day move to Wednesday?',
  ...overrides,
});

async function submit(agent: Agent, body = submission()): Promise<WeeklyCheckInView> {
  const res = await agent.post(weeklyPath()).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return weeklyCheckInView.strict().parse(res.body.data);
}

describe('the due date', () => {
  it("is the latest check-in weekday on or before the athlete's own today", async () => {
    // 11:30 UTC on Tuesday is 00:30 on Wednesday in Auckland (UTC+13), 01:30 on Tuesday in Honolulu.
    now = new Date('2026-12-01T11:30:00Z');
    const auckland = await createAthlete(t.dataSource, {
      coach: w.coach,
      user: { timeZone: 'Pacific/Auckland' },
      athlete: { checkInWeekday: 'wed' },
    });
    const honolulu = await createAthlete(t.dataSource, {
      coach: w.coach,
      user: { timeZone: 'Pacific/Honolulu' },
      athlete: { checkInWeekday: 'wed' },
    });
    const coach = await as(w.coach);
    const a = (await current(coach, auckland)).view;
    expect(a).toMatchObject({ dueDate: '2026-12-02', status: 'due', id: null });
    expect(a.figures).toMatchObject({ weekStart: '2026-11-25', weekEnd: '2026-12-01' });
    expect((await current(coach, honolulu)).view.dueDate).toBe('2026-11-25');

    // An hour earlier it is still Tuesday in Auckland: last week's Wednesday.
    now = new Date('2026-12-01T10:30:00Z');
    expect((await current(coach, auckland)).view.dueDate).toBe('2026-11-25');
  });

  it('moves with the check-in weekday (staff who work on the plan)', async () => {
    const coach = await as(w.coach);
    const res = await coach
      .patch(`/api/athletes/${w.athlete.athlete.id}/check-in-day`)
      .send({ weekday: 'tue' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      weekday: 'tue',
      current: { dueDate: '2026-12-01', status: 'due' },
    });

    const bad = await coach
      .patch(`/api/athletes/${w.athlete.athlete.id}/check-in-day`)
      .send({ weekday: 'xyz' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ weekday: 'Choose a weekday' });
    const own = await (
      await as(w.athlete.user)
    )
      .patch(`/api/athletes/${w.athlete.athlete.id}/check-in-day`)
      .send({ weekday: 'fri' });
    expect(own.status).toBe(403);
  });
});

describe('figures of the week', () => {
  it('sums up the 7 days before the due date against the week before', async () => {
    const id = w.athlete.athlete.id;
    await insertVersion(t.dataSource, {
      athleteId: id,
      coachId: w.coach.id,
      effectiveFrom: '2026-11-01',
      content: planContent(),
    });
    const weigh = (date: string, kg: number) =>
      t.dataSource.query(
        `INSERT INTO weigh_ins (athlete_id, local_date, local_time, logged_at, weight_kg, entered_value,
                                entered_unit, protocol_confirmed)
         VALUES ($1, $2, '07:00', $2::date + time '07:00', $3, $3, 'kg', true)`,
        [id, date, kg],
      );
    // The week (23–29 Nov) and the one before (16–22 Nov), 4 weigh-ins each (a 7-day mean needs at
    // least 4, PRODUCT.md); 15 Nov and 30 Nov are outside both.
    for (const [date, kg] of [
      ['2026-11-15', 90],
      ['2026-11-16', 80.8],
      ['2026-11-17', 80.6],
      ['2026-11-20', 80.4],
      ['2026-11-22', 80.2],
      ['2026-11-23', 80],
      ['2026-11-25', 79.8],
      ['2026-11-27', 79.7],
      ['2026-11-29', 79.5],
      ['2026-11-30', 70],
    ] as const) {
      await weigh(date, kg);
    }
    const evening = (date: string, steps: number, sleep: number, energy: number) =>
      t.dataSource.query(
        `INSERT INTO evening_logs (athlete_id, local_date, steps, sleep_hours, ratings)
         VALUES ($1, $2, $3, $4, $5)`,
        [id, date, steps, sleep, JSON.stringify({ energy, mood: 5 })],
      );
    await evening('2026-11-24', 10000, 7, 4);
    await evening('2026-11-26', 8000, 8, 2);
    await evening('2026-11-30', 1000, 3, 1);
    const photo = (date: string, pose: string) =>
      t.dataSource.query(
        `INSERT INTO condition_photos (athlete_id, local_date, pose, width, height, thumb_key, display_key,
                                       content_type, bytes, content_hash)
         VALUES ($1, $2, $3, 10, 10, 't', 'd', 'image/webp', 10, repeat('a', 64)) RETURNING id`,
        [id, date, pose],
      ) as Promise<{ id: string }[]>;
    const [inWeek] = await photo('2026-11-28', 'Front relaxed');
    await photo('2026-11-30', 'Front relaxed');

    const coach = await as(w.coach);
    const { view } = await current(coach);
    expect(view.figures).toMatchObject({
      weekStart: '2026-11-23',
      weekEnd: '2026-11-29',
      meanWeightKg: 79.75,
      previousMeanWeightKg: 80.5,
      changeKg: -0.75,
      weighIns: 4,
      stepsMean: 9000,
      sleepHoursMean: 7.5,
      photoIds: [inWeek!.id],
    });
    expect(view.figures.ratings).toMatchObject({ energy: 3, mood: 5, hunger: null });

    // Adherence comes from the analysis module: the trend's week of 23 Nov (a Monday) is the same week.
    const trend = await coach.get(`/api/athletes/${id}/trend?from=2026-11-23&to=2026-11-29`);
    expect(trend.status).toBe(200);
    // The 14-day rate of the week (16–29 Nov) is the trend's own 14-day rate for a range ending then.
    expect(view.figures.rate).toEqual(trend.body.data.rate);
    expect(view.figures.rate).toMatchObject({ from: '2026-11-16', to: '2026-11-29', points: 8 });
    const week = (
      trend.body.data.adherence as {
        weekStart: string;
        metric: string;
        adherence: number | null;
        loggedShare: number | null;
      }[]
    ).filter((r) => r.weekStart === '2026-11-23');
    expect(view.figures.adherence.map((a) => a.metric).sort()).toEqual(week.map((r) => r.metric).sort());
    for (const row of week) {
      const mine = view.figures.adherence.find((a) => a.metric === row.metric)!;
      expect(mine.loggedShare).toBeCloseTo(row.loggedShare!, 3);
      if (row.adherence === null) expect(mine.adherence).toBeNull();
      else expect(mine.adherence).toBeCloseTo(row.adherence, 3);
    }
    expect(view.figures.adherence.find((a) => a.metric === 'steps')).toMatchObject({ loggedShare: 0.286 });

    // Submitting stores the same figures.
    const stored = await submit(await as(w.athlete.user));
    expect(stored.figures).toEqual(view.figures);
  });
});

describe('too few weigh-ins', () => {
  const weigh = (date: string, kg: number) =>
    t.dataSource.query(
      `INSERT INTO weigh_ins (athlete_id, local_date, local_time, logged_at, weight_kg, entered_value,
                              entered_unit, protocol_confirmed)
       VALUES ($1, $2, '07:00', $2::date + time '07:00', $3, $3, 'kg', true)`,
      [w.athlete.athlete.id, date, kg],
    );

  it('reports no mean and no change from fewer than 4 weigh-ins in a week (PRODUCT.md: the 7-day mean needs 4)', async () => {
    // 3 in the week (23–29 Nov) and 2 in the week before.
    for (const [date, kg] of [
      ['2026-11-17', 80.6],
      ['2026-11-20', 80.4],
      ['2026-11-23', 80],
      ['2026-11-25', 79.8],
      ['2026-11-29', 79.6],
    ] as const) {
      await weigh(date, kg);
    }
    const { view } = await current(await as(w.coach));
    expect(view.figures).toMatchObject({
      meanWeightKg: null,
      previousMeanWeightKg: null,
      changeKg: null,
      weighIns: 3,
      // 5 weigh-ins in 14 days: no 14-day rate either (it needs 7).
      rate: null,
    });

    // A fourth weigh-in gives the week its mean; the week before still has none, so no change.
    await weigh('2026-11-28', 79.4);
    const again = (await current(await as(w.coach))).view.figures;
    // (80 + 79.8 + 79.4 + 79.6) / 4 = 79.7.
    expect(again).toMatchObject({
      meanWeightKg: 79.7,
      previousMeanWeightKg: null,
      changeKg: null,
      weighIns: 4,
    });
  });
});

describe('nothing is due before joining', () => {
  it('tells a new athlete their first due date instead of a check-in for the week before they joined', async () => {
    // Joined today (Tuesday 1 Dec) five minutes ago; check-in day Monday, so 30 Nov is the latest one.
    const joined = new Date(START.getTime() - 5 * 60_000);
    const fresh = await createAthlete(t.dataSource, {
      coach: w.coach,
      user: { name: 'Nia New', timeZone: 'UTC' },
      athlete: { checkInWeekday: 'mon', intakeCompletedAt: joined },
    });
    const me = await as(fresh.user);
    const { view, abilities } = await current(me, fresh);
    expect(view).toMatchObject({
      dueDate: '2026-11-30',
      status: 'not_due',
      firstDueDate: '2026-12-07',
      id: null,
    });
    expect(abilities.submit).toBe(false);
    const refused = await me
      .post(weeklyPath(fresh))
      .send({ dueDate: '2026-11-30', answers: [], questionsForCoach: null });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.dueDate).toMatch(/first check-in is due on 2026-12-07/);
    expect(await t.dataSource.query('SELECT id FROM weekly_check_ins')).toEqual([]);

    // A check-in due on the day of joining covers the week before it: not due either.
    await t.dataSource.query(`UPDATE athletes SET check_in_weekday = 'tue' WHERE id = $1`, [
      fresh.athlete.id,
    ]);
    expect((await current(me, fresh)).view).toMatchObject({
      dueDate: '2026-12-01',
      status: 'not_due',
      firstDueDate: '2026-12-08',
    });

    // The queue does not call it missing the next day, and nothing in it predates joining.
    now = new Date('2026-12-02T10:00:00Z');
    const queue = await (await as(w.coach)).get('/api/review-queue');
    expect(queue.status).toBe(200);
    const item = (queue.body.data as unknown[])
      .map((i) => reviewQueueItem.strict().parse(i))
      .find((i) => i.athleteId === fresh.athlete.id)!;
    expect(item.reasons.map((r) => r.text)).not.toContainEqual(expect.stringMatching(/^Weekly check-in/));
    expect(new Date(item.since).getTime()).toBeGreaterThanOrEqual(joined.getTime());

    // A week on, the first one is due as usual.
    now = new Date('2026-12-08T10:00:00Z');
    expect((await current(me, fresh)).view).toMatchObject({
      dueDate: '2026-12-08',
      status: 'due',
      firstDueDate: null,
    });
  });

  it("dates a new athlete's queue items from when they joined, not the start of their day", async () => {
    // Joined at 09:55 UTC; "no weigh-in logged yet" arises at the start of the day (00:00) otherwise.
    const joined = new Date(START.getTime() - 5 * 60_000);
    const fresh = await createAthlete(t.dataSource, {
      coach: w.coach,
      user: { name: 'Nia New', timeZone: 'UTC' },
      athlete: { intakeCompletedAt: joined },
    });
    const queue = await (await as(w.coach)).get('/api/review-queue');
    const item = (queue.body.data as unknown[])
      .map((i) => reviewQueueItem.strict().parse(i))
      .find((i) => i.athleteId === fresh.athlete.id)!;
    expect(item.reasons.map((r) => r.text)).toContain('No weigh-in logged yet');
    expect(item.since).toBe(joined.toISOString());
  });
});

describe('any week due so far', () => {
  it('answers the week of a due date with its range and figures: due, missed, stored; a later date is refused', async () => {
    const coach = await as(w.coach);
    const week = (dueDate: string, agent = coach) => agent.get(`${weeklyPath()}/week/${dueDate}`);
    const due = await week('2026-11-30');
    expect(due.status).toBe(200);
    expect(weeklyCheckInView.strict().parse(due.body.data)).toMatchObject({
      status: 'due',
      figures: { weekStart: '2026-11-23', weekEnd: '2026-11-29' },
    });
    expect((await week('2026-11-23')).body.data).toMatchObject({
      status: 'missed',
      figures: { weekStart: '2026-11-16', weekEnd: '2026-11-22' },
    });
    await submit(await as(w.athlete.user));
    expect((await week('2026-11-30')).body.data).toMatchObject({ status: 'submitted', firstDueDate: null });

    const later = await week('2026-12-07');
    expect(later.status).toBe(400);
    expect(later.body.error.fields).toHaveProperty('dueDate');
    // Before the entry window (shared dateWindow: 5 years back from the athlete's today).
    const ancient = await week('2020-11-30');
    expect(ancient.status).toBe(400);
    expect(ancient.body.error.fields).toEqual({
      dueDate: 'No earlier than 2021-12-01 (5 years back)',
    });
    // Not a date at all: a path that names nothing (404, as every path parameter here).
    expect((await week('2026-02-30')).status).toBe(404);
    expect((await week('2026-11-30', await as(w.outsider))).status).toBe(404);
  });
});

describe('submitting and replying', () => {
  it('creates, updates until answered, then refuses with 409', async () => {
    const me = await as(w.athlete.user);
    const due = await current(me);
    expect(due.view).toMatchObject({ id: null, status: 'due', dueDate: '2026-11-30', questions: QUESTIONS });
    expect(due.abilities).toMatchObject({ submit: true, reply: false });

    const first = await submit(me);
    expect(first).toMatchObject({ status: 'submitted', submittedAt: START.toISOString(), reply: null });
    expect(first.id).not.toBeNull();
    // Staff hear of it once per due date.
    const mails = () =>
      t.dataSource.query(`SELECT to_address FROM outbox_messages WHERE kind = 'weekly_check_in_received'`);
    const recipients = async () =>
      ((await mails()) as { to_address: string }[]).map((m) => m.to_address).sort();
    // The assigned coach and the staff member the athlete is shared with.
    expect(await recipients()).toEqual([w.coach.email, w.sharedAssistant.email].sort());

    now = new Date('2026-12-01T12:00:00Z');
    const second = await submit(
      me,
      submission({ answers: [{ questionId: QUESTIONS[0]!.id, value: 2 }], questionsForCoach: null }),
    );
    expect(second).toMatchObject({
      id: first.id,
      answers: [{ questionId: QUESTIONS[0]!.id, value: 2 }],
      questionsForCoach: null,
      submittedAt: START.toISOString(),
    });
    const rows = await t.dataSource.query(`SELECT id FROM weekly_check_ins`);
    expect(rows).toHaveLength(1);
    expect(await recipients()).toHaveLength(2);

    const coach = await as(w.coach);
    const one = await coach.get(`/api/weekly-check-ins/${first.id}`);
    expect(one.status).toBe(200);
    expect(one.body.abilities).toMatchObject({ reply: true, submit: false });

    const reply = await coach
      .post(`/api/weekly-check-ins/${first.id}/reply`)
      .send({ body: 'Yes, Wednesday works. Keep the steps up.' });
    expect(reply.status, JSON.stringify(reply.body)).toBe(200);
    const answered = weeklyCheckInView.strict().parse(reply.body.data);
    expect(answered).toMatchObject({
      status: 'answered',
      reply: {
        body: 'Yes, Wednesday works. Keep the steps up.',
        by: { id: w.coach.id, name: w.coach.name },
        planVersionId: null,
      },
    });
    expect(reply.body.abilities).toMatchObject({ reply: false });

    // The athlete sees the reply and can no longer change the check-in.
    const seen = await current(me);
    expect(seen.view.status).toBe('answered');
    expect(seen.abilities.submit).toBe(false);
    const late = await me.post(weeklyPath()).send(submission());
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('conflict');
    const again = await coach.post(`/api/weekly-check-ins/${first.id}/reply`).send({ body: 'Once more' });
    expect(again.status).toBe(409);
    expect(await recipients()).toHaveLength(2);

    const list = await me.get(weeklyPath());
    expect(list.status).toBe(200);
    expect(list.body.data.map((v: WeeklyCheckInView) => v.id)).toEqual([first.id]);
  });

  it('lists newest first', async () => {
    const me = await as(w.athlete.user);
    await submit(me);
    now = new Date('2026-12-08T10:00:00Z');
    const next = await submit(me, submission({ dueDate: '2026-12-07' }));
    const list = await me.get(weeklyPath());
    expect(list.body.data.map((v: WeeklyCheckInView) => v.dueDate)).toEqual(['2026-12-07', '2026-11-30']);
    expect(list.body.data[0].id).toBe(next.id);
  });

  it('names the field of a wrong due date or answer', async () => {
    const me = await as(w.athlete.user);
    const wrongDate = await me.post(weeklyPath()).send(submission({ dueDate: '2026-11-23' }));
    expect(wrongDate.status).toBe(400);
    expect(wrongDate.body.error.fields).toEqual({ dueDate: 'Only the check-in due on 2026-11-30 is open' });
    // The same entry window as every other entry date, and a real date.
    const ancient = await me.post(weeklyPath()).send(submission({ dueDate: '2019-01-07' }));
    expect(ancient.status).toBe(400);
    expect(ancient.body.error.fields).toEqual({
      dueDate: 'No earlier than 2021-12-01 (5 years back)',
    });
    for (const dueDate of ['2026-02-30', '0000-01-01', '2026-12-07']) {
      const bad = await me.post(weeklyPath()).send(submission({ dueDate }));
      expect(bad.status, dueDate).toBe(400);
      expect(Object.keys(bad.body.error.fields), dueDate).toEqual(['dueDate']);
    }

    const unknown = await me
      .post(weeklyPath())
      .send(submission({ answers: [{ questionId: newId(), value: 3 }] }));
    expect(unknown.status).toBe(400);
    expect(Object.keys(unknown.body.error.fields)).toEqual(['answers.0.questionId']);

    const kind = await me
      .post(weeklyPath())
      .send(submission({ answers: [{ questionId: QUESTIONS[1]!.id, value: 'maybe' }] }));
    expect(kind.status).toBe(400);
    expect(kind.body.error.fields).toEqual({ 'answers.0.value': 'Choose yes or no' });
    expect(await t.dataSource.query(`SELECT id FROM weekly_check_ins`)).toEqual([]);
  });

  it('links a plan version of the athlete to the reply, and refuses another athlete’s', async () => {
    const me = await as(w.athlete.user);
    const { id } = await submit(me);
    await insertVersion(t.dataSource, {
      athleteId: w.otherAthlete.athlete.id,
      coachId: w.coach.id,
      effectiveFrom: '2026-12-01',
      content: planContent(),
    });
    await insertVersion(t.dataSource, {
      athleteId: w.athlete.athlete.id,
      coachId: w.coach.id,
      effectiveFrom: '2026-12-01',
      content: planContent(),
    });
    const versions: { id: string; athlete_id: string }[] = await t.dataSource.query(
      `SELECT id, athlete_id FROM plan_versions`,
    );
    const theirs = versions.find((v) => v.athlete_id === w.otherAthlete.athlete.id)!.id;
    const mine = versions.find((v) => v.athlete_id === w.athlete.athlete.id)!.id;
    const assistant = await as(w.sharedAssistant);
    const wrong = await assistant
      .post(`/api/weekly-check-ins/${id}/reply`)
      .send({ body: 'New plan from Wednesday', planVersionId: theirs });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toEqual({ planVersionId: 'Not a plan version of this athlete' });
    const ok = await assistant
      .post(`/api/weekly-check-ins/${id}/reply`)
      .send({ body: 'New plan from Wednesday', planVersionId: mine });
    expect(ok.status).toBe(200);
    expect(ok.body.data.reply).toMatchObject({ planVersionId: mine, by: { id: w.sharedAssistant.id } });
  });
});

describe('access', () => {
  it('hides the check-ins from other teams, unshared staff and other athletes; only the athlete submits; athletes never reply', async () => {
    const me = await as(w.athlete.user);
    const { id } = await submit(me);
    for (const user of [w.outsider, w.assistant, w.otherAthlete.user]) {
      const agent = await as(user);
      expect((await agent.get(weeklyPath())).status).toBe(404);
      expect((await agent.get(`${weeklyPath()}/current`)).status).toBe(404);
      expect((await agent.get(`/api/weekly-check-ins/${id}`)).status).toBe(404);
      expect((await agent.post(`/api/weekly-check-ins/${id}/reply`).send({ body: 'Hi' })).status).toBe(404);
      expect((await agent.post(weeklyPath()).send(submission())).status).toBe(404);
    }
    const reply = await me.post(`/api/weekly-check-ins/${id}/reply`).send({ body: 'Answering myself' });
    expect(reply.status).toBe(403);
    const staffSubmit = await (await as(w.coach)).post(weeklyPath()).send(submission());
    expect(staffSubmit.status).toBe(403);
    const row: { reply_body: string | null }[] = await t.dataSource.query(
      `SELECT reply_body FROM weekly_check_ins`,
    );
    expect(row).toEqual([{ reply_body: null }]);
  });

  it('refuses a submission once the coaching has ended', async () => {
    await t.dataSource.query(`UPDATE athletes SET status = 'ended' WHERE id = $1`, [w.athlete.athlete.id]);
    const me = await as(w.athlete.user);
    expect((await me.post(weeklyPath()).send(submission())).status).toBe(403);
    expect((await current(me)).abilities.submit).toBe(false);
  });
});

describe('the team’s questions', () => {
  it('are read by the whole team and replaced by the owner or a coach only', async () => {
    const athlete = await as(w.athlete.user);
    const read = await athlete.get('/api/team/check-in-questions');
    expect(read.status).toBe(200);
    expect(read.body).toEqual({ data: QUESTIONS, abilities: { manage: false } });
    expect((await athlete.put('/api/team/check-in-questions').send({ questions: [] })).status).toBe(403);
    expect(
      (await (await as(w.assistant)).put('/api/team/check-in-questions').send({ questions: [] })).status,
    ).toBe(403);
    const owner = await as(w.owner);
    const replaced = await owner
      .put('/api/team/check-in-questions')
      .send({ questions: QUESTIONS.slice(0, 1) });
    expect(replaced.status).toBe(200);
    expect(replaced.body.data).toEqual(QUESTIONS.slice(0, 1));
    // Another team's list is its own.
    expect((await (await as(w.outsider)).get('/api/team/check-in-questions')).body.data).toEqual([]);
  });

  it('names the field of an invalid question', async () => {
    const coach = await as(w.coach);
    const put = (questions: unknown) => coach.put('/api/team/check-in-questions').send({ questions });
    const short = await put([{ ...QUESTIONS[0], prompt: 'ab' }]);
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toEqual({ 'questions.0.prompt': 'At least 3 characters' });
    const kind = await put([QUESTIONS[0], { ...QUESTIONS[1], kind: 'essay' }]);
    expect(kind.body.error.fields).toEqual({ 'questions.1.kind': 'Choose a kind' });
    const twice = await put([QUESTIONS[0], { ...QUESTIONS[1], id: QUESTIONS[0]!.id }]);
    expect(twice.status).toBe(400);
    expect(twice.body.error.fields).toEqual({ 'questions.1.id': 'Each question needs its own id' });
    const tooMany = await put(
      Array.from({ length: 13 }, (_, i) => ({ ...QUESTIONS[0], id: newId(), prompt: `Question ${i}` })),
    );
    expect(tooMany.body.error.fields).toEqual({ questions: 'At most 12 questions' });
    expect((await coach.get('/api/team/check-in-questions')).body.data).toEqual(QUESTIONS);
  });
});

describe('the review queue', () => {
  it('lists a check-in received and not answered (time since) and one due but missing', async () => {
    const coach = await as(w.coach);
    const queue = async () => {
      const res = await coach.get('/api/review-queue');
      expect(res.status).toBe(200);
      return (res.body.data as unknown[]).map((i) => reviewQueueItem.strict().parse(i));
    };
    const reasonsOf = (items: Awaited<ReturnType<typeof queue>>, athleteId: string) =>
      items.find((i) => i.athleteId === athleteId)?.reasons ?? [];

    // The other athlete's weekday is Monday too (the default): due yesterday, nothing sent.
    await submit(await as(w.athlete.user));
    now = new Date('2026-12-01T15:00:00Z');
    let items = await queue();
    expect(reasonsOf(items, w.athlete.athlete.id)).toContainEqual({
      kind: 'reply',
      text: 'Weekly check-in received 5 h ago, not answered yet',
      date: '2026-11-30',
    });
    expect(reasonsOf(items, w.otherAthlete.athlete.id)).toContainEqual({
      kind: 'missed',
      text: 'Weekly check-in not submitted (due 1 day ago)',
      date: '2026-11-30',
    });

    // A review leaves the unanswered check-in standing; the reply clears it.
    expect((await coach.post(`/api/review-queue/${w.athlete.athlete.id}/reviewed`).send({})).status).toBe(
      200,
    );
    items = await queue();
    expect(reasonsOf(items, w.athlete.athlete.id).map((r) => r.text)).toContain(
      'Weekly check-in received 5 h ago, not answered yet',
    );
    const [row] = await t.dataSource.query(`SELECT id FROM weekly_check_ins`);
    expect((await coach.post(`/api/weekly-check-ins/${row.id}/reply`).send({ body: 'Thanks!' })).status).toBe(
      200,
    );
    items = await queue();
    expect(reasonsOf(items, w.athlete.athlete.id).map((r) => r.text)).not.toContain(
      'Weekly check-in received 5 h ago, not answered yet',
    );

    // Without a question list the team does not run weekly check-ins: nothing counts as missing.
    await coach.put('/api/team/check-in-questions').send({ questions: [] });
    items = await queue();
    expect(reasonsOf(items, w.otherAthlete.athlete.id).map((r) => r.text)).not.toContain(
      'Weekly check-in not submitted (due 1 day ago)',
    );
  });
});
