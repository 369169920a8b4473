import { bodyCompositionView, bodyMeasurementView } from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { weighInBody } from './check-ins-helpers.js';
import { planContent, versionBody } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// Tuesday 1 December 2026, noon UTC. The athlete turned 30 on 1 June 2026, so the reference
// sheet's "age 30" check values apply to every date below.
const now = new Date('2026-12-01T12:00:00Z');
const TODAY = '2026-12-01';
const [DAY1, DAY2, DAY3, DAY4] = ['2026-11-18', '2026-11-19', '2026-11-20', '2026-11-21'];

/**
 * JPW 1980 women 3-site, S = 60 mm, age 30 → Db 1.0440221, Siri 24.1279 % (REFERENCES.md §3,
 * secondary source). The trend on DAY4 (no weigh-in) is carried from DAY3: REFERENCES.md §8 EWMA
 * α 0.1 (Walker, The Hacker's Diet) of 80.0, 80.4, 79.6 → 79.996 kg. Masses worked by hand
 * (FM = W·%fat/100, FFM = W − FM): 79.996 × 0.241279 = 19.3014 kg fat, 60.6946 kg lean.
 */
const threeSite = {
  date: DAY4,
  method: 'skinfold_3',
  densityEquation: 'siri',
  skinfoldsMm: { triceps: 18, suprailiac: 16, thigh: 26 },
  measuredBy: 'Coach Rui',
};

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

let coach: User;
let me: CreatedAthlete;
let coachAgent: Awaited<ReturnType<typeof signedIn>>;
let athleteAgent: Awaited<ReturnType<typeof signedIn>>;
let base: string;

beforeEach(async () => {
  await t.reset();
  const owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, {
    coach,
    user: { timeZone: 'UTC' },
    athlete: { sex: 'female', birthDate: '1996-06-01', intakeWeightKg: 81.5 },
  });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  athleteAgent = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
});

async function weighIns() {
  for (const [date, weight] of [
    [DAY1, 80.0],
    [DAY2, 80.4],
    [DAY3, 79.6],
  ] as const) {
    const res = await athleteAgent.put(`${base}/days/${date}/weigh-in`).send(weighInBody({ weight }));
    expect(res.status).toBe(200);
  }
}

const rowCount = async () =>
  (await t.dataSource.query<{ n: number }[]>('SELECT count(*)::int AS n FROM body_measurements'))[0]!.n;

describe('body measurements', () => {
  it("the coach enters skinfolds; % fat by JPW + Siri, masses from that day's trend weight", async () => {
    await weighIns();
    const created = await coachAgent.post(`${base}/body-measurements`).send(threeSite);
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const m = bodyMeasurementView.parse(created.body.data);
    expect(m.estimate?.sumMm).toBe(60);
    expect(m.estimate?.densityGPerMl).toBeCloseTo(1.0440221, 7);
    expect(m.estimate?.fatPercent).toBeCloseTo(24.1279, 4);
    expect(m.estimate?.equation).toBe('Jackson, Pollock & Ward 3-site, Siri');
    expect(m.trendWeightKg).toBeCloseTo(79.996, 6);
    expect(m.fatMassKg).toBeCloseTo(19.3014, 3);
    expect(m.leanMassKg).toBeCloseTo(60.6946, 3);
    expect(m.enteredBy.id).toBe(coach.id);
    expect(m.measuredBy).toBe('Coach Rui');

    const read = await athleteAgent.get(`${base}/body-composition`);
    expect(read.status).toBe(200);
    const view = bodyCompositionView.parse(read.body.data);
    expect(view.measurements.map((x) => x.id)).toEqual([m.id]);
    expect(view.latestLeanMass).toEqual({ kg: m.leanMassKg, date: DAY4, measurementId: m.id });
    expect(view.caution).toMatch(/±3–4 % fat points/);
    expect(read.body.abilities).toEqual({ measure: true });
  });

  it('Brozek on the same sum gives 23.5302 % (REFERENCES.md §3)', async () => {
    const res = await athleteAgent
      .post(`${base}/body-measurements`)
      .send({ ...threeSite, densityEquation: 'brozek', measuredBy: 'self' });
    expect(res.status).toBe(201);
    expect(res.body.data.estimate.fatPercent).toBeCloseTo(23.5302, 4);
    // No weigh-in yet: no trend weight, so no masses.
    expect(res.body.data).toMatchObject({ trendWeightKg: null, fatMassKg: null, leanMassKg: null });
  });

  it("names the sites this athlete's method lacks, and refuses a date after her today", async () => {
    const missing = await coachAgent
      .post(`${base}/body-measurements`)
      .send({ ...threeSite, skinfoldsMm: { chest: 10, abdomen: 20, thigh: 26 } });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.error.fields).sort()).toEqual([
      'skinfoldsMm.suprailiac',
      'skinfoldsMm.triceps',
    ]);
    const future = await coachAgent
      .post(`${base}/body-measurements`)
      .send({ ...threeSite, date: '2026-12-02' });
    expect(future.status).toBe(400);
    expect(Object.keys(future.body.error.fields)).toEqual(['date']);
    const tooThin = await coachAgent
      .post(`${base}/body-measurements`)
      .send({ ...threeSite, skinfoldsMm: { triceps: 0, suprailiac: 16, thigh: 26 } });
    expect(tooThin.status).toBe(400);
    expect(Object.keys(tooThin.body.error.fields)).toEqual(['skinfoldsMm.triceps']);
    expect(await rowCount()).toBe(0);
  });

  it('a coach of the team not assigned gets 404 and nothing is written', async () => {
    const other = await createCoach(t.dataSource, { teamId: coach.teamId });
    const agent = await signedIn(t.app, other.email, FACTORY_PASSWORD);
    expect((await agent.post(`${base}/body-measurements`).send(threeSite)).status).toBe(404);
    expect((await agent.get(`${base}/body-composition`)).status).toBe(404);
    expect(await rowCount()).toBe(0);
  });

  it('removes a measurement', async () => {
    const created = await coachAgent.post(`${base}/body-measurements`).send(threeSite);
    const del = await athleteAgent.delete(`${base}/body-measurements/${created.body.data.id}`);
    expect(del.status).toBe(204);
    expect(await rowCount()).toBe(0);
  });
});

describe('protein per kg of lean mass in the plan', () => {
  const leanPlan = () =>
    planContent({
      training: { energy: null, protein: { kind: 'g_per_kg_lean', perKg: 2.5 } },
    });

  it('is refused without a measurement, naming the field', async () => {
    const res = await coachAgent.post(`${base}/plan/versions`).send(versionBody(TODAY, leanPlan()));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['content.dayTypes.0.targets.protein']);
  });

  it('resolves to grams from the latest lean mass, with its basis (Helms 2014: 2.3–3.1 g/kg lean mass)', async () => {
    await weighIns();
    await coachAgent.post(`${base}/body-measurements`).send(threeSite);
    const saved = await coachAgent.post(`${base}/plan/versions`).send(versionBody(TODAY, leanPlan()));
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    // TODAY is a Tuesday: a training day. 2.5 g/kg × 60.6946 kg = 151.737 g (worked by hand).
    const day = await athleteAgent.get(`${base}/days/${TODAY}`);
    expect(day.status).toBe(200);
    const targets = day.body.data.targets.targets;
    expect(targets.proteinG).toBeCloseTo(151.737, 2);
    expect(targets.basis.protein).toBe(`2.5 g/kg × 60.7 kg lean mass, measured ${DAY4}`);
  });
});

describe('the intake weight', () => {
  it("is the plan's weight until the first weigh-in, then the trend is", async () => {
    const before = await coachAgent.get(`${base}/plan`);
    expect(before.body.data.baseline).toMatchObject({ weightKg: 81.5, weightFromIntake: true });
    await weighIns();
    const after = await coachAgent.get(`${base}/plan`);
    expect(after.body.data.baseline.weightKg).toBeCloseTo(79.996, 6);
    expect(after.body.data.baseline).not.toHaveProperty('weightFromIntake');
  });
});
