/**
 * Making weight end to end: the weigh-in's record, the projection against the class limit on the
 * cut page, the roster and the review queue, cut plans with their acknowledgements, and the
 * coach's e-mail the first time the projection is over the limit. Real PostgreSQL, pinned clock.
 */
import {
  CUT_SOURCES,
  cutSettingsView,
  cutView,
  cutWarningView,
  rehearsalView,
  rosterRow,
  reviewQueueItem,
  STOP_SIGNS_TEXT,
  type RecoveryView,
} from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { symptomBody, weighInBody } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { shift } from './trend-helpers.js';

let now = new Date('2026-12-01T20:00:00Z');
const TODAY = '2026-12-01';
/** Ten days ahead: a weigh-in the day before a competition on 12 December. */
const WEIGH_IN = '2026-12-11';

let t: TestApp;
let coach: User;
let coachAgent: Awaited<ReturnType<typeof signedIn>>;
let athleteAgent: Awaited<ReturnType<typeof signedIn>>;
let a: CreatedAthlete;

beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

/**
 * Weigh-ins falling 0.04 kg a day, 64.8 kg on 18 Nov to 64.32 kg on 30 Nov: a perfect line, so the
 * projection (least squares over the 14 days to today) lands on it at the weigh-in, 23 days after
 * 18 Nov: 64.8 − 0.04 × 23 = 63.88 kg, 0.88 kg over a 63.0 kg limit.
 */
async function weighLine(athleteId: string) {
  await t.dataSource.query(
    `INSERT INTO weigh_ins (athlete_id, local_date, local_time, logged_at, weight_kg, entered_value, entered_unit,
                            protocol_confirmed)
     SELECT $1, $2::date + k, '07:00', ($2::date + k) + time '07:00', 64.8 - 0.04 * k, 64.8 - 0.04 * k, 'kg', true
       FROM generate_series(0, 12) AS k`,
    [athleteId, '2026-11-18'],
  );
}

beforeEach(async () => {
  now = new Date('2026-12-01T20:00:00Z');
  await t.reset();
  coach = await createCoach(t.dataSource);
  a = await createAthlete(t.dataSource, {
    coach,
    athlete: {
      eventType: 'weigh_in',
      eventDate: WEIGH_IN,
      eventTime: '18:00',
      eventTimeZone: 'Pacific/Auckland',
      division: '63 kg',
      weighInLimitKg: 63,
    },
  });
  await weighLine(a.athlete.id);
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  athleteAgent = await signedIn(t.app, a.user.email, FACTORY_PASSWORD);
});

const cutUrl = () => `/api/athletes/${a.athlete.id}/cut`;

describe('the projection against the weigh-in limit', () => {
  it('reads "projected over" on the cut page, for the coach and the athlete alike', async () => {
    for (const agent of [coachAgent, athleteAgent]) {
      const res = await agent.get(cutUrl());
      expect(res.status).toBe(200);
      const view = cutView.parse(res.body.data);
      expect(view.weighIn).toMatchObject({ date: WEIGH_IN, limitKg: 63 });
      expect(view.gap!.over).toBe(true);
      expect(view.gap!.projectedKg).toBeCloseTo(63.88, 6);
      expect(view.gap!.overKg).toBeCloseTo(0.88, 6);
      expect(view.gap!.daysLeft).toBe(10);
      expect(view.gap!.summary).toMatch(
        /^Projected 0\.9 kg over the 63\.0 kg limit in 10 days; needs \d\.\d %\/week more$/,
      );
      expect(view.thresholdPct).toBe(5);
      expect(view.caution).toMatch(/physician/);
    }
  });

  it('puts the athlete on the roster with the gap and in the review queue as over the limit', async () => {
    const roster = await coachAgent.get('/api/roster');
    const row = rosterRow.parse(
      roster.body.data.find((r: { athleteId: string }) => r.athleteId === a.athlete.id),
    );
    expect(row.figures.weighInGap).toMatchObject({ over: true, daysLeft: 10 });
    expect(row.figures.weighInGap!.overKg).toBeCloseTo(0.88, 6);

    const queue = await coachAgent.get('/api/review-queue');
    const item = reviewQueueItem.parse(
      queue.body.data.find((i: { athleteId: string }) => i.athleteId === a.athlete.id),
    );
    // 0.88 / 63 = 1.40 % of the limit.
    expect(item.reasons).toContainEqual({
      kind: 'over_limit',
      text: 'Projected 0.9 kg (1.4 %) over the weigh-in limit, 10 days left',
      date: WEIGH_IN,
    });
  });

  it('e-mails the coach once when a logged weigh-in leaves the projection over the limit', async () => {
    const log = () =>
      athleteAgent
        .put(`/api/athletes/${a.athlete.id}/days/${TODAY}/weigh-in`)
        .send(weighInBody({ weight: 64.1 }));
    expect((await log()).status).toBe(200);
    expect((await log()).status).toBe(200);
    const rows: { kind: string }[] = await t.dataSource.query(
      `SELECT kind FROM outbox_messages WHERE to_address = $1`,
      [coach.email],
    );
    expect(rows.map((r) => r.kind)).toEqual(['over_limit']);
  });

  it('has no gap for an athlete whose event is not a weigh-in', async () => {
    const other = await createAthlete(t.dataSource, { coach, athlete: { eventType: 'show' } });
    await weighLine(other.athlete.id);
    const view = cutView.parse((await coachAgent.get(`/api/athletes/${other.athlete.id}/cut`)).body.data);
    expect(view).toMatchObject({ weighIn: null, gap: null, plan: null });
  });
});

const record = {
  weighInLimitKg: 63,
  weighInTiming: 'day_before',
  weighInTime: '18:00',
  competitionTime: '10:00',
  usualWeightKg: 66.5,
  classBelowKg: 57,
  classAboveKg: 70,
};

describe('the weigh-in record', () => {
  it('stores timing, competition time, usual weight and classes; the window is 16 h on the venue clock', async () => {
    const res = await coachAgent.put(`/api/athletes/${a.athlete.id}/weigh-in`).send(record);
    expect(res.status).toBe(200);
    expect(cutView.parse(res.body.data).weighIn).toEqual({
      date: WEIGH_IN,
      limitKg: 63,
      timing: 'day_before',
      weighInTime: '18:00',
      competitionDate: '2026-12-12',
      competitionTime: '10:00',
      timeZone: 'Pacific/Auckland',
      recoveryWindowHours: 16,
      usualWeightKg: 66.5,
      classBelowKg: 57,
      classAboveKg: 70,
    });
  });

  it('refuses classes on the wrong side of the limit and a same-day competition before the weigh-in (400)', async () => {
    const res = await coachAgent
      .put(`/api/athletes/${a.athlete.id}/weigh-in`)
      .send({ ...record, classBelowKg: 63, weighInTiming: 'same_day', competitionTime: '17:00' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['classBelowKg', 'competitionTime']);
  });

  it('is the staff’s to set: the athlete gets 403 and nothing changes', async () => {
    const res = await athleteAgent.put(`/api/athletes/${a.athlete.id}/weigh-in`).send(record);
    expect(res.status).toBe(403);
    const [row] = await t.dataSource.query(`SELECT weigh_in_timing FROM athletes WHERE id = $1`, [
      a.athlete.id,
    ]);
    expect(row.weigh_in_timing).toBeNull();
  });

  it('answers 409 when the event is not a weigh-in', async () => {
    const other = await createAthlete(t.dataSource, { coach, athlete: { eventType: 'show' } });
    const res = await coachAgent.put(`/api/athletes/${other.athlete.id}/weigh-in`).send(record);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
  });
});

describe('cut plans', () => {
  // 27 Nov → 8 Dec (3 acute days before 11 Dec): 11 days; 66 → 64.5 kg linear.
  const body = (overrides: Record<string, unknown> = {}) => ({
    startDate: '2026-11-27',
    startKg: 66,
    preAcuteKg: 66.5,
    acuteDays: 3,
    path: 'linear',
    notes: 'Low-residue food for the last two days; sodium as usual',
    acknowledgedKeys: [],
    ...overrides,
  });

  it('refuses an unacknowledged acute share above 5 % (409, by key and whole), then stores the acknowledgement', async () => {
    // 66.5 → 63: 3.5 kg = 5.26 % of 66.5 kg; the chronic part 66.8 → 66.5 kg over 11 days is
    // 0.19 kg a week, no rate warning.
    const plan = body({ startKg: 66.8 });
    const refused = await coachAgent.post(`/api/athletes/${a.athlete.id}/cut-plans`).send(plan);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('guardrails_unacknowledged');
    expect(Object.keys(refused.body.error.fields)).toEqual(['acute_share']);
    // The warning whole, as the server judged it: an acute share above the team's 5 % is strong.
    const judged = cutWarningView.array().parse(refused.body.error.warnings);
    expect(judged.map((w) => [w.key, w.severity, w.message])).toEqual([
      ['acute_share', 'strong', refused.body.error.fields.acute_share],
    ]);
    expect(judged[0]!.source).toMatch(/\S/);
    expect(await t.dataSource.query('SELECT id FROM cut_plans')).toEqual([]);

    const saved = await coachAgent
      .post(`/api/athletes/${a.athlete.id}/cut-plans`)
      .send({ ...plan, acknowledgedKeys: ['acute_share'] });
    expect(saved.status).toBe(201);
    const view = cutView.parse(saved.body.data);
    expect(view.plan).toMatchObject({ preAcuteDate: '2026-12-08', acuteDays: 3, path: 'linear' });
    expect(view.plan!.acknowledgements.map((x) => x.key)).toEqual(['acute_share']);
    // Today (1 Dec) is day 4 of 11: 66.8 − 0.3 × 4/11 = 66.6909 kg.
    expect(view.figures!.todayKg).toBeCloseTo(66.6909, 4);
    expect(view.figures!.stage).toBe('chronic');
    expect(view.figures!.acute.pct).toBeCloseTo(5.2632, 4);
    expect(view.figures!.stopSigns).toBeNull();

    // The athlete reads the same plan and figures.
    const mine = cutView.parse((await athleteAgent.get(cutUrl())).body.data);
    expect(mine.figures!.todayKg).toBeCloseTo(66.6909, 4);
  });

  it('asks a second acknowledgement above 7 % and shows the athlete the stop signs', async () => {
    // 68 → 63: 5/68 = 7.35 %; chronic 68.5 → 68 over 11 days.
    const plan = body({ startKg: 68.5, preAcuteKg: 68 });
    const once = await coachAgent
      .post(`/api/athletes/${a.athlete.id}/cut-plans`)
      .send({ ...plan, acknowledgedKeys: ['acute_share'] });
    expect(once.status).toBe(409);
    expect(Object.keys(once.body.error.fields)).toEqual(['acute_share_severe']);
    // Judged severe by the server, with its source and the signs the athlete will be shown.
    const [severe] = cutWarningView.array().parse(once.body.error.warnings);
    expect(severe).toMatchObject({
      key: 'acute_share_severe',
      severity: 'severe',
      source: CUT_SOURCES.acuteShareSevere,
    });
    expect(severe!.stopSigns).toBe(STOP_SIGNS_TEXT);
    const twice = await coachAgent
      .post(`/api/athletes/${a.athlete.id}/cut-plans`)
      .send({ ...plan, acknowledgedKeys: ['acute_share', 'acute_share_severe'] });
    expect(twice.status).toBe(201);
    const mine = cutView.parse((await athleteAgent.get(cutUrl())).body.data);
    expect(mine.figures!.stopSigns).toMatch(/seek medical care/);
  });

  it('follows the team threshold', async () => {
    const owner = await createOwner(t.dataSource, { teamId: coach.teamId });
    const ownerAgent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect((await ownerAgent.put('/api/team/cut-settings').send({ acuteSharePct: 6 })).status).toBe(200);
    const res = await coachAgent
      .post(`/api/athletes/${a.athlete.id}/cut-plans`)
      .send(body({ startKg: 66.8 }));
    expect(res.status).toBe(201);
    expect(cutView.parse(res.body.data).figures!.thresholdPct).toBe(6);
  });

  it('refuses a start inside the acute days and a pre-acute weight above the start (400 naming the field)', async () => {
    const late = await coachAgent
      .post(`/api/athletes/${a.athlete.id}/cut-plans`)
      .send(body({ startDate: shift(WEIGH_IN, -2) }));
    expect(late.status).toBe(400);
    expect(Object.keys(late.body.error.fields)).toEqual(['startDate']);
    const up = await coachAgent.post(`/api/athletes/${a.athlete.id}/cut-plans`).send(body());
    expect(up.status).toBe(400);
    expect(Object.keys(up.body.error.fields)).toEqual(['preAcuteKg']);
  });

  it('is the staff’s to save: the athlete gets 403 and no plan is written', async () => {
    const res = await athleteAgent
      .post(`/api/athletes/${a.athlete.id}/cut-plans`)
      .send(body({ startKg: 66.8, acknowledgedKeys: ['acute_share'] }));
    expect(res.status).toBe(403);
    expect(await t.dataSource.query('SELECT id FROM cut_plans')).toEqual([]);
  });
});

describe('practice runs (rehearsals)', () => {
  /**
   * A practice weigh-in on 14 Nov after 2 acute days (the start morning 12 Nov), read to 16 Nov;
   * weights invented and worked by hand:
   *   12 Nov 66.0 start · 13 Nov 65.1, lost 0.9 = 0.9/66.0 = 1.363636 % · 14 Nov 64.2, lost 0.9 =
   *   0.9/65.1 = 1.382488 %; start to weigh-in 1.8 kg = 1.8/66 = 2.727273 % ·
   *   15 Nov 65.4, 1.2 kg back = 1.2/64.2 = 1.869159 %, 66.6667 % of the loss ·
   *   16 Nov 65.8, 1.6 kg back = 2.492212 %, 88.8889 % of the loss.
   * The plan: 67 → 66 kg from 1 Nov, 3 kg (3/66 = 4.545455 %) planned for the last days, no warning.
   */
  const rehearsalBody = {
    startDate: '2026-11-01',
    startKg: 67,
    preAcuteKg: 66,
    acuteDays: 2,
    path: 'linear',
    notes: 'Low-residue food for two days; fluid to thirst the last evening',
    acknowledgedKeys: [],
    practiceWeighInDate: '2026-11-14',
  };
  const weights: [string, number][] = [
    ['2026-11-11', 66.2],
    ['2026-11-12', 66.0],
    ['2026-11-13', 65.1],
    ['2026-11-14', 64.2],
    ['2026-11-15', 65.4],
    ['2026-11-16', 65.8],
  ];
  const plans = () => `/api/athletes/${a.athlete.id}/cut-plans`;

  async function rehearse() {
    for (const [date, weight] of weights) {
      const res = await athleteAgent
        .put(`/api/athletes/${a.athlete.id}/days/${date}/weigh-in`)
        .send(weighInBody({ weight }));
      expect(res.status).toBe(200);
    }
    const symptom = await athleteAgent
      .post(`/api/athletes/${a.athlete.id}/days/2026-11-14/symptoms`)
      .send(symptomBody(['headache', 'dark_urine'], { time: '19:40' }));
    expect(symptom.status).toBe(201);
    const res = await coachAgent.post(plans()).send(rehearsalBody);
    expect(res.status).toBe(201);
    return cutView.parse(res.body.data);
  }

  it('keeps a rehearsal out of force and shows its record: loss a day, total, regain, symptoms', async () => {
    const view = await rehearse();
    expect(view.plan).toBeNull();
    const r = view.rehearsal!;
    expect(r).toMatchObject({ weighInDate: '2026-11-14', preAcuteDate: '2026-11-12', limitKg: 63 });
    expect(r.planned.acuteKg).toBeCloseTo(3, 10);
    expect(r.planned.acutePct).toBeCloseTo(4.545455, 5);
    expect(r.planned.steps).toBe(rehearsalBody.notes);
    expect(r.days.map((d) => [d.date, d.stage, d.kg])).toEqual([
      ['2026-11-12', 'start', 66.0],
      ['2026-11-13', 'acute', 65.1],
      ['2026-11-14', 'weigh_in', 64.2],
      ['2026-11-15', 'after', 65.4],
      ['2026-11-16', 'after', 65.8],
    ]);
    expect(r.days[1]!.lostKg).toBeCloseTo(0.9, 6);
    expect(r.days[1]!.lostPct).toBeCloseTo(1.363636, 5);
    expect(r.days[2]!.lostPct).toBeCloseTo(1.382488, 5);
    expect(r.achieved!.kg).toBeCloseTo(1.8, 6);
    expect(r.achieved!.pct).toBeCloseTo(2.727273, 5);
    expect(r.regained.map((g) => [g.date, Number(g.kg.toFixed(6)), Number(g.pct.toFixed(5))])).toEqual([
      ['2026-11-15', 1.2, 1.86916],
      ['2026-11-16', 1.6, 2.49221],
    ]);
    expect(r.regained[0]!.shareOfLossPct).toBeCloseTo(66.6667, 3);
    expect(r.days[2]!.symptoms).toEqual([
      { time: '19:40', labels: ['Headache', 'Very dark urine'], urgent: false },
    ]);
    expect(r.underWay).toBe(false);
    // The athlete reads the same record.
    const mine = cutView.parse((await athleteAgent.get(cutUrl())).body.data);
    expect(mine.rehearsal!.achieved!.kg).toBeCloseTo(1.8, 6);
  });

  it('is under way on its days, and takes no note for a day still ahead', async () => {
    const { rehearsal } = await rehearse();
    // Back on 13 Nov, the one acute day between the start and the practice weigh-in.
    now = new Date('2026-11-13T10:00:00Z');
    const view = cutView.parse((await athleteAgent.get(cutUrl())).body.data);
    expect(view.rehearsal!.underWay).toBe(true);
    const ahead = await athleteAgent
      .put(`${plans()}/${rehearsal!.planId}/note`)
      .send({ date: '2026-11-14', note: 'Not yet' });
    expect(ahead.status).toBe(400);
    expect(Object.keys(ahead.body.error.fields)).toEqual(['date']);
  });

  it('stays beside the next cut’s plan, which is the one in force', async () => {
    await rehearse();
    const next = await coachAgent.post(plans()).send({
      ...rehearsalBody,
      practiceWeighInDate: null,
      startDate: '2026-11-27',
      startKg: 66.8,
      preAcuteKg: 66.5,
      acuteDays: 3,
      acknowledgedKeys: ['acute_share'],
    });
    expect(next.status).toBe(201);
    const view = cutView.parse(next.body.data);
    expect(view.plan).toMatchObject({ rehearsal: false, weighInDate: WEIGH_IN });
    expect(view.rehearsal!.weighInDate).toBe('2026-11-14');
  });

  it('takes a day note from the coach and from the athlete, one a day, and removes an empty one', async () => {
    const { rehearsal } = await rehearse();
    const url = `${plans()}/${rehearsal!.planId}/note`;
    expect((await coachAgent.put(url).send({ date: '2026-11-13', note: 'Low-residue food' })).status).toBe(
      200,
    );
    const res = await athleteAgent.put(url).send({ date: '2026-11-14', note: 'Practice weigh-in at 18:00' });
    expect(res.status).toBe(200);
    const notes = rehearsalView
      .parse(res.body.data)
      .days.map((d) => [d.date, d.note?.text ?? null, d.note?.by ?? null]);
    expect(notes.slice(1, 3)).toEqual([
      ['2026-11-13', 'Low-residue food', coach.name],
      ['2026-11-14', 'Practice weigh-in at 18:00', a.user.name],
    ]);
    const again = await coachAgent.put(url).send({ date: '2026-11-14', note: 'Weighed in at 18:05' });
    expect(rehearsalView.parse(again.body.data).days[2]!.note).toMatchObject({
      text: 'Weighed in at 18:05',
      by: coach.name,
    });
    const cleared = await athleteAgent.put(url).send({ date: '2026-11-14', note: null });
    expect(rehearsalView.parse(cleared.body.data).days[2]!.note).toBeNull();
    expect(await t.dataSource.query('SELECT local_date FROM cut_rehearsal_notes')).toHaveLength(1);
  });

  it('answers 400 naming the field: a practice weigh-in not before the real one, a bad date, a day outside, a long note', async () => {
    const late = await coachAgent.post(plans()).send({ ...rehearsalBody, practiceWeighInDate: WEIGH_IN });
    expect(late.status).toBe(400);
    expect(Object.keys(late.body.error.fields)).toEqual(['practiceWeighInDate']);
    const bad = await coachAgent.post(plans()).send({ ...rehearsalBody, practiceWeighInDate: '2026-13-01' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['practiceWeighInDate']);
    expect(await t.dataSource.query('SELECT id FROM cut_plans')).toEqual([]);

    const { rehearsal } = await rehearse();
    const url = `${plans()}/${rehearsal!.planId}/note`;
    for (const [body, field] of [
      [{ date: '2026-11-20', note: 'x' }, 'date'],
      [{ date: '14 Nov', note: 'x' }, 'date'],
      [{ note: 'x' }, 'date'],
      [{ date: '2026-11-13', note: 'x'.repeat(1001) }, 'note'],
    ] as const) {
      const res = await coachAgent.put(url).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
      expect(Object.keys(res.body.error.fields)).toEqual([field]);
    }
    expect(await t.dataSource.query('SELECT id FROM cut_rehearsal_notes')).toEqual([]);
  });

  it('answers 404 for a plan that is not this athlete’s rehearsal, and to staff outside the athlete’s circle', async () => {
    const { rehearsal } = await rehearse();
    const inForce = await coachAgent.post(plans()).send({
      ...rehearsalBody,
      practiceWeighInDate: null,
      startDate: '2026-11-27',
      startKg: 66.8,
      preAcuteKg: 66.5,
      acuteDays: 3,
      acknowledgedKeys: ['acute_share'],
    });
    const planId = cutView.parse(inForce.body.data).plan!.id;
    const note = { date: '2026-11-13', note: 'x' };
    expect((await coachAgent.put(`${plans()}/${planId}/note`).send(note)).status).toBe(404);
    const stranger = await createCoach(t.dataSource, { teamId: coach.teamId });
    const strangerAgent = await signedIn(t.app, stranger.email, FACTORY_PASSWORD);
    expect((await strangerAgent.put(`${plans()}/${rehearsal!.planId}/note`).send(note)).status).toBe(404);
    expect(await t.dataSource.query('SELECT id FROM cut_rehearsal_notes')).toEqual([]);
  });
});

describe('the recovery checklist on the weigh-in day', () => {
  it('counts fluid and carbohydrate from the kg lost, each slot on the athlete’s clock', async () => {
    await coachAgent.put(`/api/athletes/${a.athlete.id}/weigh-in`).send(record);
    const saved = await coachAgent.post(`/api/athletes/${a.athlete.id}/cut-plans`).send({
      startDate: '2026-11-27',
      startKg: 66.8,
      preAcuteKg: 66.5,
      acuteDays: 3,
      path: 'linear',
      notes: null,
      acknowledgedKeys: ['acute_share'],
    });
    expect(saved.status).toBe(201);
    expect(cutView.parse(saved.body.data).recovery).toBeNull();

    now = new Date('2026-12-11T12:00:00Z');
    const view = cutView.parse((await athleteAgent.get(cutUrl())).body.data);
    const r = view.recovery!;
    // 66.5 − 63 = 3.5 kg lost; × 1.5 L = 5.25 L (Sawka 2007). 16 h window: 4 h × 1.0–1.2 g/kg +
    // 12 h × 5–10 g/kg / 24 = 6.5–9.8 g/kg × 63 kg = 409.5–617.4 g.
    expect(r.basis).toBe('plan');
    expect(r.kgLost).toBeCloseTo(3.5, 10);
    expect(r.windowHours).toBe(16);
    expect(r.fluidL).toBeCloseTo(5.25, 10);
    expect(r.carbohydrateG.min).toBeCloseTo(409.5, 8);
    expect(r.carbohydrateG.max).toBeCloseTo(617.4, 8);
    // 18:00 in Auckland on 11 Dec (UTC+13, daylight time) is 05:00 UTC, the athlete's clock.
    expect(r.slots).toHaveLength(16);
    expect(r.slots[0]).toMatchObject({ date: '2026-12-11', time: '05:00' });
    expect(r.slots[15]).toMatchObject({ date: '2026-12-11', time: '20:00' });
  });
});

describe('ticking the recovery checklist', () => {
  /** The plan of the test above (3.5 kg lost, 16 slots), then the weigh-in day at 12:00 UTC. */
  async function weighInDay() {
    await coachAgent.put(`/api/athletes/${a.athlete.id}/weigh-in`).send(record);
    await coachAgent.post(`/api/athletes/${a.athlete.id}/cut-plans`).send({
      startDate: '2026-11-27',
      startKg: 66.8,
      preAcuteKg: 66.5,
      acuteDays: 3,
      path: 'linear',
      notes: null,
      acknowledgedKeys: ['acute_share'],
    });
    now = new Date('2026-12-11T12:00:00Z');
    return cutView.parse((await athleteAgent.get(cutUrl())).body.data).recovery!;
  }
  const day = (date: string) => `/api/athletes/${a.athlete.id}/days/${date}`;
  const fluidBody = (slot: RecoveryView['slots'][number], time = '12:00') => ({
    clientId: slot.fluid.clientId,
    time,
    volume: slot.fluid.volumeMl,
    unit: 'ml',
    kind: 'other',
    sodiumMg: slot.fluid.sodiumMg,
  });

  it('gives each item a fixed client id and the amount it logs (5.25 L / 16 slots → 330 mL)', async () => {
    const r = await weighInDay();
    // 0.33 L × 20 mmol/L × 22.99 mg/mmol (Sawka 2007, from memory) = 151.7 → 152 mg sodium.
    expect(r.slots[0]!.fluid).toMatchObject({ volumeMl: 330, sodiumMg: 152, logged: null });
    // First hour: 1.0 g/kg × 63 kg = 63 g, the band's floor (Burke 2011, from memory).
    expect(r.slots[0]!.carbohydrate).toMatchObject({ carbohydrateG: 63, logged: null });
    const ids = r.slots.flatMap((s) => [s.fluid.clientId, s.carbohydrate.clientId]);
    expect(new Set(ids).size).toBe(32);
    const again = cutView.parse((await coachAgent.get(cutUrl())).body.data).recovery!;
    expect(again.slots.map((s) => s.fluid.clientId)).toEqual(r.slots.map((s) => s.fluid.clientId));
  });

  it('logs a fluid entry once however often it is ticked; the coach sees it done; unticking removes it', async () => {
    const slot = (await weighInDay()).slots[0]!;
    const first = await athleteAgent.post(`${day('2026-12-11')}/fluids`).send(fluidBody(slot));
    expect(first.status).toBe(201);
    const repeat = await athleteAgent.post(`${day('2026-12-11')}/fluids`).send(fluidBody(slot, '12:01'));
    expect(repeat.status).toBe(200);
    expect(repeat.body.data.id).toBe(first.body.data.id);
    expect(await t.dataSource.query('SELECT volume_ml, sodium_mg FROM fluid_entries')).toEqual([
      { volume_ml: 330, sodium_mg: 152 },
    ]);

    const seen = await coachAgent.get(cutUrl());
    expect(seen.body.abilities).toEqual({ plan: true, log: false, noteRehearsal: true });
    expect(cutView.parse(seen.body.data).recovery!.slots[0]!.fluid.logged).toEqual({
      entryId: first.body.data.id,
      date: '2026-12-11',
      time: '12:00',
    });
    const dayView = await coachAgent.get(day('2026-12-11'));
    expect(dayView.body.data.fluidTotalMl).toBe(330);
    // The drink's sodium is the day's (no meal carries any).
    expect(dayView.body.data.totals.sodiumMg).toBe(152);
    expect(dayView.body.data.fluids[0].sodiumMg).toBe(152);

    expect(
      (await athleteAgent.delete(`/api/athletes/${a.athlete.id}/fluids/${first.body.data.id}`)).status,
    ).toBe(204);
    const after = cutView.parse((await athleteAgent.get(cutUrl())).body.data).recovery!;
    expect(after.slots[0]!.fluid.logged).toBeNull();
    // Ticked again with the same client id: a new entry.
    expect((await athleteAgent.post(`${day('2026-12-11')}/fluids`).send(fluidBody(slot))).status).toBe(201);
  });

  it('logs the carbohydrate item as a meal of its grams', async () => {
    const slot = (await weighInDay()).slots[1]!;
    const res = await athleteAgent.post(`${day('2026-12-11')}/meals`).send({
      clientId: slot.carbohydrate.clientId,
      time: '12:00',
      name: slot.carbohydrate.mealName,
      source: 'macros',
      proteinG: 0,
      carbohydrateG: slot.carbohydrate.carbohydrateG,
      fatG: 0,
    });
    expect(res.status).toBe(201);
    const r = cutView.parse((await athleteAgent.get(cutUrl())).body.data).recovery!;
    expect(r.slots[1]!.carbohydrate.logged).toMatchObject({ entryId: res.body.data.id, time: '12:00' });
    expect(r.slots[1]!.fluid.logged).toBeNull();
    // 63 g × 4 kcal/g (Atwater).
    expect((await athleteAgent.get(day('2026-12-11'))).body.data.totals.energyKcal).toBeCloseTo(252, 6);
    // With a meal carrying 300 mg sodium and slot 0's drink (152 mg), the trend's day reads 452 mg
    // (the day view and the trend sum the drinks' sodium alike).
    await athleteAgent.post(`${day('2026-12-11')}/meals`).send({
      clientId: '3b0f3a52-7c55-4f43-9a39-5d1f0e6c2a11',
      time: '11:00',
      name: 'Salted rice',
      source: 'macros',
      proteinG: 4,
      carbohydrateG: 40,
      fatG: 1,
      sodiumMg: 300,
    });
    await athleteAgent.post(`${day('2026-12-11')}/fluids`).send(fluidBody(r.slots[0]!));
    const trend = await athleteAgent.get(`/api/athletes/${a.athlete.id}/trend?from=2026-12-11&to=2026-12-11`);
    // The trend sends its days as columns: index 0 is 11 Dec.
    expect(trend.body.data.days.actuals.sodiumMg).toEqual([452]);
    expect(trend.body.data.days.actuals.fluidMl).toEqual([330]);
    expect((await athleteAgent.get(day('2026-12-11'))).body.data.totals.sodiumMg).toBe(452);
  });

  it('is the athlete’s own log: the coach gets 403, another athlete 404, and nothing is written', async () => {
    const slot = (await weighInDay()).slots[0]!;
    const other = await createAthlete(t.dataSource, { coach });
    const otherAgent = await signedIn(t.app, other.user.email, FACTORY_PASSWORD);
    expect((await coachAgent.post(`${day('2026-12-11')}/fluids`).send(fluidBody(slot))).status).toBe(403);
    expect((await otherAgent.post(`${day('2026-12-11')}/fluids`).send(fluidBody(slot))).status).toBe(404);
    expect(await t.dataSource.query('SELECT id FROM fluid_entries')).toEqual([]);
    const ticked = await athleteAgent.post(`${day('2026-12-11')}/fluids`).send(fluidBody(slot));
    const url = `/api/athletes/${a.athlete.id}/fluids/${ticked.body.data.id}`;
    expect((await coachAgent.delete(url)).status).toBe(403);
    expect((await otherAgent.delete(url)).status).toBe(404);
    expect(await t.dataSource.query('SELECT count(*)::int AS n FROM fluid_entries')).toEqual([{ n: 1 }]);
  });
});

describe('the team’s acute-share threshold', () => {
  it('answers the default 5 % with its source and what 7 % means; the owner sets it, a coach reads it', async () => {
    const read = await coachAgent.get('/api/team/cut-settings');
    expect(read.status).toBe(200);
    expect(read.body.abilities).toEqual({ manage: false });
    expect(cutSettingsView.parse(read.body.data)).toMatchObject({
      acuteSharePct: 5,
      defaultPct: 5,
      severePct: 7,
    });
    expect(read.body.data.source).toMatch(/Barley et al\. 2018/);
    expect(read.body.data.severeSource).toMatch(/common practice, no source/);
    expect((await coachAgent.put('/api/team/cut-settings').send({ acuteSharePct: 6 })).status).toBe(403);

    const owner = await createOwner(t.dataSource, { teamId: coach.teamId });
    const ownerAgent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const bad = await ownerAgent.put('/api/team/cut-settings').send({ acuteSharePct: 12 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['acuteSharePct']);
    const set = await ownerAgent.put('/api/team/cut-settings').send({ acuteSharePct: 4.5 });
    expect(set.body.data).toMatchObject({ acuteSharePct: 4.5, defaultPct: 5 });
    expect((await ownerAgent.get('/api/team/cut-settings')).body.abilities).toEqual({ manage: true });
    expect((await athleteAgent.get('/api/team/cut-settings')).status).toBe(403);
  });
});
