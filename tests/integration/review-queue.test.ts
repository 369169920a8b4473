import { markReviewedResponse, reviewQueueItem, type ReviewQueueItem } from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { MarkRepository } from '../../api/src/repositories/mark.repository.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { newId } from './check-ins-helpers.js';
import { planContent, safeTargets } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { insertVersion, shift } from './trend-helpers.js';

/**
 * The queue compares the viewer's review time (the app's clock) with when rows were written (the
 * database's clock), so this file runs on the real clock. The athletes live in a fixed-offset zone
 * where it is about noon now, so no step of the file can cross the athletes' midnight.
 */
const offset = 12 - new Date().getUTCHours();
const ZONE = offset === 0 ? 'UTC' : offset > 0 ? `Etc/GMT-${offset}` : `Etc/GMT+${-offset}`;
const TODAY = new Date(Date.now() + offset * 3_600_000).toISOString().slice(0, 10);
const YESTERDAY = shift(TODAY, -1);

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(() => t.close());

let owner: User;
let coach: User;
let coachAgent: Awaited<ReturnType<typeof signedIn>>;
type Who = 'drop' | 'symptom' | 'missing' | 'drift' | 'countdown' | 'reply' | 'quiet';
const people = {} as Record<Who, CreatedAthlete>;

const athlete = (name: string, overrides: Parameters<typeof createAthlete>[1]['athlete'] = {}) =>
  createAthlete(t.dataSource, { coach, user: { name, timeZone: ZONE }, athlete: overrides });

/** A weigh-in of `kg` on each of the days `from`…`to` days ago (0 = today). */
async function weighDaily(a: CreatedAthlete, fromDaysAgo: number, toDaysAgo: number, kg: number) {
  await t.dataSource.query(
    `INSERT INTO weigh_ins (athlete_id, local_date, local_time, logged_at, weight_kg, entered_value, entered_unit,
                            protocol_confirmed)
     SELECT $1, $2::date - k, '07:00', ($2::date - k) + time '07:00', $3, $3, 'kg', true
       FROM generate_series($4::int, $5::int) AS k`,
    [a.athlete.id, TODAY, kg, toDaysAgo, fromDaysAgo],
  );
}

async function weighIn(a: CreatedAthlete, date: string, kg: number) {
  await t.dataSource.query(
    `INSERT INTO weigh_ins (athlete_id, local_date, local_time, logged_at, weight_kg, entered_value, entered_unit,
                            protocol_confirmed)
     VALUES ($1, $2, '07:00', $2::date + time '07:00', $3, $3, 'kg', true)`,
    [a.athlete.id, date, kg],
  );
}

/** A meal of these grams (energy by the Atwater general factors 4/4/9). */
async function meal(a: CreatedAthlete, date: string, proteinG: number, carbohydrateG: number, fatG: number) {
  await t.dataSource.query(
    `INSERT INTO meal_entries (athlete_id, local_date, local_time, logged_at, client_id, name, source, protein_g,
                               carbohydrate_g, fat_g, energy_kcal)
     VALUES ($1, $2, '12:00', $2::date + time '12:00', gen_random_uuid(), 'Meal', 'macros', $3, $4, $5, $6)`,
    [a.athlete.id, date, proteinG, carbohydrateG, fatG, 4 * proteinG + 4 * carbohydrateG + 9 * fatG],
  );
}

async function queue(agent = coachAgent): Promise<ReviewQueueItem[]> {
  const res = await agent.get('/api/review-queue');
  expect(res.status).toBe(200);
  return (res.body.data as unknown[]).map((i) => reviewQueueItem.strict().parse(i));
}
const names = (items: ReviewQueueItem[]) => items.map((i) => i.name);
const texts = (items: ReviewQueueItem[], name: string) =>
  items.find((i) => i.name === name)?.reasons.map((r) => r.text);

async function reviewed(id: string, agent = coachAgent) {
  return agent.post(`/api/review-queue/${id}/reviewed`).send({});
}

async function reply(on: CreatedAthlete, body: string) {
  const marks = new MarkRepository(t.dataSource.manager);
  const mark = await marks.create({
    athleteId: on.athlete.id,
    authorId: coach.id,
    metric: 'weight',
    fromDate: shift(TODAY, -3),
    toDate: YESTERDAY,
    note: 'How did the week feel?',
  });
  await marks.addReply({ markId: mark.id, authorId: on.user.id, body });
}

beforeEach(async () => {
  await t.reset();
  owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);

  // Safety: 80.0 → 78.16 kg overnight is 2.3 % (ACSM 2007: ≥ 2 % within 48 h).
  people.drop = await athlete('Gus Drop');
  // Thirteen steady days before it keep the 14-day rate inside 1 %/week.
  await weighDaily(people.drop, 13, 1, 80);
  await weighIn(people.drop, TODAY, 78.16);

  // Safety: an urgent symptom report today (through the API, which also raises the flag row).
  people.symptom = await athlete('Sam Symptom');
  await weighDaily(people.symptom, 7, 0, 70);
  const sam = await signedIn(t.app, people.symptom.user.email, FACTORY_PASSWORD);
  const report = await sam
    .post(`/api/athletes/${people.symptom.athlete.id}/days/${TODAY}/symptoms`)
    .send({ clientId: newId(), time: '09:00', symptoms: ['dizziness'] });
  expect(report.status).toBe(201);

  // Missed check-ins: last weigh-in (and anything at all) four days ago.
  people.missing = await athlete('Mo Missing');
  await weighDaily(people.missing, 10, 4, 75);

  // Drift: 3000 kcal (150 g protein, 465 g carbohydrate, 60 g fat) on the last two days against a
  // 2000 kcal training day (1900 on Sunday), ±5 %.
  people.drift = await athlete('Di Drifting');
  await insertVersion(t.dataSource, {
    athleteId: people.drift.athlete.id,
    coachId: coach.id,
    effectiveFrom: shift(TODAY, -30),
    content: planContent(),
  });
  await weighDaily(people.drift, 7, 1, 65);
  await meal(people.drift, shift(TODAY, -3), 150, 215, 60);
  await meal(people.drift, shift(TODAY, -2), 150, 465, 60);
  await meal(people.drift, YESTERDAY, 150, 465, 60);

  // A countdown day today, and nothing else to say.
  people.countdown = await athlete('Cy Countdown', { eventDate: shift(TODAY, 3) });
  await insertVersion(t.dataSource, {
    athleteId: people.countdown.athlete.id,
    coachId: coach.id,
    effectiveFrom: shift(TODAY, -30),
    content: planContent({
      dates: [{ date: TODAY, label: 'Water load', countdownOffset: -3, targets: safeTargets() }],
      countdown: {
        templateId: null,
        templateName: 'Show week',
        eventDate: shift(TODAY, 3),
        eventType: 'show',
      },
    }),
  });
  await weighDaily(people.countdown, 7, 0, 60);

  // An unread reply to the coach's mark.
  people.reply = await athlete('Rae Reply');
  await weighDaily(people.reply, 7, 1, 68);
  await reply(people.reply, 'Tough, but fine.');

  // All in order: not in the queue.
  people.quiet = await athlete('Quinn Quiet');
  await weighDaily(people.quiet, 7, 0, 72);
});

describe('the review queue', () => {
  it('puts safety first, then missed check-ins, then drift and the countdown, then replies, each with why', async () => {
    const items = await queue();
    expect(names(items)).toEqual([
      'Gus Drop',
      'Sam Symptom',
      'Mo Missing',
      // Both arose at the start of today (a day's drift is judged when it closes): by name.
      'Cy Countdown',
      'Di Drifting',
      'Rae Reply',
    ]);
    expect(items.map((i) => i.priority)).toEqual([1, 1, 2, 3, 3, 4]);
    expect(texts(items, 'Gus Drop')).toEqual(['Weight down 2.3 % from the day before (ACSM 2007 guard)']);
    // The flag row the urgent report raised is the same news: said once.
    expect(texts(items, 'Sam Symptom')).toEqual(['Reported dizziness (urgent: told to stop and seek care)']);
    expect(texts(items, 'Mo Missing')).toEqual(['No weigh-in for 3 days', 'Nothing logged yesterday']);
    expect(texts(items, 'Di Drifting')).toContain('Energy off plan 2 of the last 3 days');
    expect(items.find((i) => i.name === 'Di Drifting')!.reasons.every((r) => r.kind === 'drift')).toBe(true);
    expect(items.find((i) => i.name === 'Cy Countdown')).toMatchObject({
      countdownLabel: 'E-3',
      daysToEvent: 3,
      reasons: [{ kind: 'countdown', text: 'E-3 of the show countdown', date: TODAY }],
    });
    expect(texts(items, 'Rae Reply')).toEqual(['1 unread reply']);
    expect(items.every((i) => i.lastReviewedAt === null)).toBe(true);
  });

  it('agrees with the roster on who has a safety flag (one rule): a drop and a symptom, not missed weigh-ins', async () => {
    const roster = await coachAgent.get('/api/roster');
    expect(roster.status).toBe(200);
    const rows = roster.body.data as { name: string; figures: { flags: string[]; safetyFlag: boolean } }[];
    const flagged = rows.filter((r) => r.figures.safetyFlag).map((r) => r.name);
    const safety = (await queue()).filter((i) => i.priority === 1).map((i) => i.name);
    expect(flagged.sort()).toEqual(['Gus Drop', 'Sam Symptom']);
    expect(safety.sort()).toEqual(flagged);
    // Missed weigh-ins are a flag on the roster but a missed check-in in the queue, not a safety flag.
    expect(rows.find((r) => r.name === 'Mo Missing')!.figures).toMatchObject({
      flags: ['missed_weigh_ins'],
      safetyFlag: false,
    });
  });

  it('drops a reviewed athlete until something new happens', async () => {
    const res = await reviewed(people.symptom.athlete.id);
    expect(res.status).toBe(200);
    const body = markReviewedResponse.parse(res.body.data);
    expect(body.athleteId).toBe(people.symptom.athlete.id);
    expect(names(await queue())).not.toContain('Sam Symptom');

    // A new report after the review brings them back, with only the new news.
    const sam = await signedIn(t.app, people.symptom.user.email, FACTORY_PASSWORD);
    await sam
      .post(`/api/athletes/${people.symptom.athlete.id}/days/${TODAY}/symptoms`)
      .send({ clientId: newId(), time: '10:00', symptoms: ['headache'] });
    const back = (await queue()).find((i) => i.name === 'Sam Symptom')!;
    expect(back.reasons.map((r) => r.text)).toEqual(['Reported headache']);
    expect(back.lastReviewedAt).toBe(body.reviewedAt);

    // Missed check-ins clear for the day; replies until the next one.
    await reviewed(people.missing.athlete.id);
    await reviewed(people.reply.athlete.id);
    expect(names(await queue())).not.toContain('Mo Missing');
    expect(names(await queue())).not.toContain('Rae Reply');
    await reply(people.reply, 'One more thing.');
    // Reviewing does not read the threads (opening the mark does): both replies are still unread.
    expect(texts(await queue(), 'Rae Reply')).toEqual(['2 unread replies']);
  });

  it('keeps a countdown athlete in the queue while the countdown lasts, reviewed or not', async () => {
    await reviewed(people.countdown.athlete.id);
    const item = (await queue()).find((i) => i.name === 'Cy Countdown')!;
    expect(item.reasons.map((r) => r.kind)).toEqual(['countdown']);
    expect(item.lastReviewedAt).not.toBeNull();
  });

  it('keeps each viewer’s reviews to themselves', async () => {
    await reviewed(people.drop.athlete.id);
    expect(names(await queue())).not.toContain('Gus Drop');
    const ownerAgent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect(names(await queue(ownerAgent))).toContain('Gus Drop');
  });
});

describe('access', () => {
  it('shows staff only the athletes they may see; refuses athletes', async () => {
    const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
    await shareAthlete(t.dataSource, people.drop.athlete, assistant);
    const assistantAgent = await signedIn(t.app, assistant.email, FACTORY_PASSWORD);
    expect(names(await queue(assistantAgent))).toEqual(['Gus Drop']);

    const outsider = await signedIn(t.app, (await createOwner(t.dataSource)).email, FACTORY_PASSWORD);
    expect(await queue(outsider)).toEqual([]);

    const athleteAgent = await signedIn(t.app, people.quiet.user.email, FACTORY_PASSWORD);
    expect((await athleteAgent.get('/api/review-queue')).status).toBe(403);
  });

  it('marks reviewed only for staff who can read the athlete (404), never the athlete (403)', async () => {
    const id = people.drop.athlete.id;
    const unshared = await signedIn(
      t.app,
      (await createAssistant(t.dataSource, { teamId: owner.teamId })).email,
      FACTORY_PASSWORD,
    );
    const outsider = await signedIn(t.app, (await createOwner(t.dataSource)).email, FACTORY_PASSWORD);
    const self = await signedIn(t.app, people.drop.user.email, FACTORY_PASSWORD);
    expect((await reviewed(id, unshared)).status).toBe(404);
    expect((await reviewed(id, outsider)).status).toBe(404);
    expect((await reviewed(newId())).status).toBe(404);
    expect((await reviewed(id, self)).status).toBe(403);
    const [row] = await t.dataSource.query<{ n: number }[]>('SELECT count(*)::int AS n FROM athlete_reviews');
    expect(row!.n).toBe(0);
    expect(names(await queue())).toContain('Gus Drop');
  });
});
