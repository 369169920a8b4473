import { dayView, type PlanContent, type TrendView } from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { eveningBody, fluidBody, macroMealBody, newId, weighInBody } from './check-ins-helpers.js';
import { planContent, safeTargets } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { countStatements, insertVersion, readTrend, shift } from './trend-helpers.js';

// Tuesday 1 December 2026, 11:00 in Madrid: day 14 of the dataset below.
const TODAY = '2026-12-01';
const DAY1 = '2026-11-18';
const now = new Date('2026-12-01T10:00:00Z');

/** REFERENCES.md §8, the invented 14-day dataset (kg), days 1–14 = 18 Nov … 1 Dec. */
const WEIGHTS = [80.0, 80.4, 79.6, 79.9, 79.5, 79.8, 79.2, 79.4, 79.0, 79.3, 78.8, 79.1, 78.6, 78.9];
/** REFERENCES.md §8: EWMA α = 0.1 (Walker, The Hacker's Diet), days 1–14. */
const EWMA = [
  80.0, 80.04, 79.996, 79.9864, 79.93776, 79.923984, 79.851586, 79.806427, 79.725784, 79.683206, 79.594885,
  79.545397, 79.450857, 79.395771,
];
/** REFERENCES.md §8: SMA7, days 7–14; days 4–6 are @stdlib/stats-incr-mmean's partial means (≥ 4 points). */
const MEAN7: (number | null)[] = [
  null,
  null,
  null,
  79.975,
  79.88,
  79.866667,
  79.771429,
  79.685714,
  79.485714,
  79.442857,
  79.285714,
  79.228571,
  79.057143,
  79.014286,
];

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

let owner: User;
let coach: User;
let me: CreatedAthlete;
let coachAgent: Awaited<ReturnType<typeof signedIn>>;
let athleteAgent: Awaited<ReturnType<typeof signedIn>>;
let base: string;

beforeEach(async () => {
  await t.reset();
  owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, {
    coach,
    user: { timeZone: 'Europe/Madrid' },
    athlete: { eventDate: '2026-12-15', goal: 'lose' },
  });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  athleteAgent = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
});

async function weighIns(weights: readonly (readonly [string, number])[]) {
  for (const [date, weight] of weights) {
    const res = await athleteAgent.put(`${base}/days/${date}/weigh-in`).send(weighInBody({ weight }));
    expect(res.status).toBe(200);
  }
}
const dataset = () => weighIns(WEIGHTS.map((w, i) => [shift(DAY1, i), w] as const));

async function trend(from: string, to: string, agent = coachAgent): Promise<TrendView> {
  const res = await agent.get(`${base}/trend?from=${from}&to=${to}`);
  expect(res.status).toBe(200);
  return readTrend(res.body);
}

describe('trend, rate and projection', () => {
  it('matches REFERENCES §8: EWMA, 7-day mean, least-squares rate and R²', async () => {
    await dataset();
    const view = await trend(DAY1, TODAY);
    expect(view).toMatchObject({ athleteId: me.athlete.id, from: DAY1, to: TODAY, today: TODAY });
    expect(view.days.map((d) => d.date)).toEqual(WEIGHTS.map((_, i) => shift(DAY1, i)));
    view.days.forEach((d, i) => {
      expect(d.weightKg).toBe(WEIGHTS[i]);
      // Walker, The Hacker's Diet (REFERENCES §8 EWMA row, 6 decimals).
      expect(d.trendKg).toBeCloseTo(EWMA[i]!, 6);
      if (MEAN7[i] === null) expect(d.mean7Kg).toBeNull();
      else expect(d.mean7Kg).toBeCloseTo(MEAN7[i]!, 6);
    });
    // REFERENCES §8 least squares with x = 1…14; simple-statistics 7.12.1 gives the same slope and R².
    expect(view.rate).not.toBeNull();
    expect(view.rate!.kgPerWeek).toBeCloseTo(-0.761538, 6);
    expect(view.rate!.percentPerWeek).toBeCloseTo(-0.9592, 4);
    expect(view.rate!.r2).toBeCloseTo(0.799155, 6);
    expect(view.rate).toMatchObject({ points: 14, from: DAY1, to: TODAY });
    // Dieting (goal lose): 0.5–1 % a week (Helms 2014).
    expect(view.rate!.band).toMatchObject({ minPct: -1, maxPct: -0.5 });
    expect(view.flags).toEqual([]);
  });

  it('projects the line to the event date with an 80 % prediction interval', async () => {
    await dataset();
    const view = await trend(DAY1, TODAY);
    // x₀ = 28 (15 Dec): ŷ = 80.208791 − 0.10879121 · 28 (REFERENCES §8 intercept and slope).
    const kg = 80.208791 - 0.10879121 * 28;
    // Half-width t(0.9, 12) · s · √(1 + 1/n + (x₀ − x̄)²/Sxx); t(0.9, 12) = 1.3562 from a standard t
    // table; s² = SSE/(n − 2) with SSE = (1 − R²)·Syy; Sxx = n(n² − 1)/12 = 227.5.
    const meanY = WEIGHTS.reduce((s, w) => s + w, 0) / 14;
    const syy = WEIGHTS.reduce((s, w) => s + (w - meanY) ** 2, 0);
    const s = Math.sqrt(((1 - 0.7991552649) * syy) / 12);
    const half = 1.3562 * s * Math.sqrt(1 + 1 / 14 + (28 - 7.5) ** 2 / 227.5);
    expect(view.eventDate).toBe('2026-12-15');
    expect(view.projection).toMatchObject({ date: '2026-12-15', level: 0.8 });
    expect(view.projection!.kg).toBeCloseTo(kg, 4);
    expect(view.projection!.lowKg).toBeCloseTo(kg - half, 2);
    expect(view.projection!.highKg).toBeCloseTo(kg + half, 2);
  });

  it('carries the trend over a missing day (weightKg null, no invented point)', async () => {
    await weighIns([
      ['2026-11-28', 80.0],
      ['2026-11-29', 80.4],
      ['2026-12-01', 79.6],
    ]);
    const view = await trend('2026-11-27', TODAY);
    const byDate = new Map(view.days.map((d) => [d.date, d]));
    expect(byDate.get('2026-11-27')).toMatchObject({ weightKg: null, trendKg: null });
    expect(byDate.get('2026-11-30')!.weightKg).toBeNull();
    expect(byDate.get('2026-11-30')!.trendKg).toBeCloseTo(80.04, 9);
    // One step for the next weigh-in: 80.04 + 0.1 · (79.6 − 80.04) = 79.996 (REFERENCES §8 day 3).
    expect(byDate.get(TODAY)!.trendKg).toBeCloseTo(79.996, 9);
    // Too few weigh-ins for a rate (7 needed) or a projection.
    expect(view.rate).toBeNull();
    expect(view.projection).toBeNull();
  });

  it('warms the trend up from the first weigh-in, whatever the range asked for', async () => {
    await dataset();
    const late = await trend('2026-11-28', TODAY);
    expect(late.days[0]!.date).toBe('2026-11-28');
    // Day 11 of the dataset: the same trend as when the range starts on day 1.
    expect(late.days[0]!.trendKg).toBeCloseTo(EWMA[10]!, 6);
    expect(late.days.at(-1)!.trendKg).toBeCloseTo(EWMA[13]!, 6);
    expect(late.days[0]!.mean7Kg).toBeCloseTo(MEAN7[10]!, 6);
  });

  it('starts from the trend of weigh-ins long before the range', async () => {
    // The dataset on 1–14 Oct, then one weigh-in on 22 Nov; the range starts weeks later.
    await weighIns([...WEIGHTS.map((w, i) => [shift('2026-10-01', i), w] as const), ['2026-11-22', 79.0]]);
    const view = await trend('2026-11-20', '2026-11-25');
    expect(view.days[0]).toMatchObject({ weightKg: null, mean7Kg: null });
    expect(view.days[0]!.trendKg).toBeCloseTo(EWMA[13]!, 6);
    // 79.395771 + 0.1 · (79.0 − 79.395771) = 79.356194 (Walker, The Hacker's Diet).
    expect(view.days[2]!.trendKg).toBeCloseTo(79.356194, 6);
    expect(view.days.at(-1)!.trendKg).toBeCloseTo(79.356194, 6);
  });

  it('flags a drop of 2 % or more within 48 h (ACSM 2007) and a symptom report', async () => {
    await weighIns([
      ['2026-11-29', 80.0],
      ['2026-11-30', 78.3],
    ]);
    await athleteAgent
      .post(`${base}/days/2026-11-30/symptoms`)
      .send({ clientId: newId(), time: '10:00', symptoms: ['headache'] });
    const view = await trend('2026-11-29', TODAY);
    expect(view.flags.map((f) => [f.kind, f.date])).toEqual([
      ['acute_drop', '2026-11-30'],
      ['symptom', '2026-11-30'],
    ]);
  });

  it('flags 80 → 79.0 → 78.05 kg: 2.4 % within 48 h though each morning is below 2 % (ACSM 2007)', async () => {
    // ACSM 2007 position stand (Sawka et al., MSSE 39:377–390; REFERENCES.md §7 rule 2): ≥ 2 % of body
    // mass within 48 h. 80 → 78.05 kg is −1.95 kg = −2.44 % of 80 kg; the steps are −1.25 % and −1.20 %.
    await weighIns([
      ['2026-11-29', 80.0],
      ['2026-11-30', 79.0],
      ['2026-12-01', 78.05],
    ]);
    const view = await trend('2026-11-29', TODAY);
    expect(view.flags).toEqual([
      expect.objectContaining({
        kind: 'acute_drop',
        date: TODAY,
        drop: { fromDate: '2026-11-29', fromKg: 80, toKg: 78.05, percent: expect.closeTo(2.4375, 6) },
      }),
    ]);
    // The review queue reads the flag's own figures.
    const queue = await coachAgent.get('/api/review-queue');
    const item = (queue.body.data as { athleteId: string; reasons: { kind: string; text: string }[] }[]).find(
      (i) => i.athleteId === me.athlete.id,
    );
    expect(item?.reasons).toContainEqual({
      kind: 'safety',
      text: 'Weight down 2.4 % in 2 days (ACSM 2007 guard)',
      date: TODAY,
    });
  });

  it('gives a zero-spread series an undefined R² and an interval no narrower than the scale allows', async () => {
    // Seven identical weigh-ins (24–30 Nov), event 100 days after the last: R² is 0/0 (null), and the
    // 80 % interval uses s ≥ 0.1 kg/√12 (uniform quantisation noise, Widrow & Kollár 2008): with
    // x̄ = 10, Sxx = 28, x₀ = 113 (14-day window ending today, 1 Dec = x 14), half-width
    // t(0.9, 5) · 0.028868 · √(1 + 1/7 + 103²/28) with t(0.90, 5) = 1.476 (standard t table, from memory).
    await weighIns(Array.from({ length: 7 }, (_, i) => [shift('2026-11-24', i), 69.4] as const));
    await t.dataSource.query(`UPDATE athletes SET event_date = $2 WHERE id = $1`, [
      me.athlete.id,
      shift('2026-11-30', 100),
    ]);
    const view = await trend('2026-11-24', TODAY);
    expect(view.rate).toMatchObject({ r2: null, points: 7 });
    expect(view.rate!.kgPerWeek).toBeCloseTo(0, 9);
    const p = view.projection!;
    expect(p.kg).toBeCloseTo(69.4, 6);
    const half = 1.476 * 0.028868 * Math.sqrt(1 + 1 / 7 + 103 ** 2 / 28);
    expect(p.highKg - p.kg).toBeCloseTo(half, 2);
    expect(p.lowKg.toFixed(2)).not.toBe(p.highKg.toFixed(2));
  });
});

describe('rate guidance in a countdown', () => {
  /** A plan from 1 Nov with today (1 Dec) as E-4 of a show week ending 5 Dec. */
  const countdownPlan = () =>
    planContent({
      dates: [{ date: TODAY, label: 'Deplete', countdownOffset: -4, targets: safeTargets() }],
      countdown: { templateId: null, templateName: 'Show week', eventDate: '2026-12-05', eventType: 'show' },
    });

  it('withholds the band, says why and raises no rate flag, in the trend and on the roster', async () => {
    await insertVersion(t.dataSource, {
      athleteId: me.athlete.id,
      coachId: coach.id,
      effectiveFrom: '2026-11-01',
      content: countdownPlan(),
    });
    // −0.2 kg a day from 80 kg: about −1.8 %/week, far beyond 1.4 %/week (Garthe 2011) were it judged.
    await weighIns(WEIGHTS.map((_, i) => [shift(DAY1, i), Math.round((80 - 0.2 * i) * 10) / 10] as const));
    const view = await trend(DAY1, TODAY);
    expect(view.rate!.percentPerWeek).toBeLessThan(-1.4);
    expect(view.rate).toMatchObject({
      band: null,
      paused: true,
      bandNote: 'Rate guidance paused during the countdown (water and glycogen change on purpose).',
    });
    expect(view.flags.filter((f) => f.kind === 'rate_beyond' || f.kind === 'rate_far_beyond')).toEqual([]);

    const roster = await coachAgent.get('/api/roster');
    const row = (roster.body.data as { athleteId: string; figures: Record<string, unknown> }[]).find(
      (r) => r.athleteId === me.athlete.id,
    )!;
    expect(row.figures).toMatchObject({
      phase: 'countdown',
      rateBand: null,
      rateBandNote: 'Rate guidance paused during the countdown (water and glycogen change on purpose).',
      flags: [],
      safetyFlag: false,
    });
  });

  it('judges the same loss outside a countdown (Garthe 2011)', async () => {
    await weighIns(WEIGHTS.map((_, i) => [shift(DAY1, i), Math.round((80 - 0.2 * i) * 10) / 10] as const));
    const view = await trend(DAY1, TODAY);
    expect(view.rate).toMatchObject({ paused: false, bandNote: null, band: { minPct: -1, maxPct: -0.5 } });
    expect(view.flags.map((f) => f.kind)).toEqual(['rate_far_beyond']);
  });
});

/** A plan from 1 Nov: the helpers' training/rest week, an 18:00 cut-off on 27 Nov and E-3 on 2 Dec. */
function testPlan(): PlanContent {
  return planContent({
    dates: [
      {
        date: '2026-11-27',
        label: 'Cut-off practice',
        countdownOffset: null,
        targets: safeTargets({ fluidCutoff: { time: '18:00', allowanceMl: 250 } }),
      },
      { date: '2026-12-02', label: 'Water load', countdownOffset: -3, targets: safeTargets() },
    ],
    countdown: {
      templateId: null,
      templateName: 'Test show week',
      eventDate: '2026-12-05',
      eventType: 'show',
    },
  });
}

describe('targets, drift and cut-off breaches', () => {
  beforeEach(async () => {
    await insertVersion(t.dataSource, {
      athleteId: me.athlete.id,
      coachId: coach.id,
      effectiveFrom: '2026-11-01',
      content: testPlan(),
    });
  });

  it('judges each metric with a target, in the trend and in the day view alike', async () => {
    const day = `${base}/days/2026-11-30`;
    // 150·4 + 215·4 + 60·9 = 2000 kcal (Atwater general factors, FAO 2003 FNP 77): the training day's energy.
    await athleteAgent
      .post(`${day}/meals`)
      .send(macroMealBody({ proteinG: 150, carbohydrateG: 215, fatG: 60, sodiumMg: 2300 }));
    await athleteAgent.post(`${day}/fluids`).send(fluidBody({ volume: 2600 }));
    await athleteAgent.put(`${day}/evening`).send(eveningBody({ steps: 9500, cardioMinutes: 30 }));

    const view = await trend('2026-11-29', '2026-12-03');
    const byDate = new Map(view.days.map((d) => [d.date, d]));
    const monday = byDate.get('2026-11-30')!;
    expect(monday.targets).toMatchObject({ energyKcal: 2000, waterMl: 3000, versionNumber: 1 });
    expect(monday.actuals).toMatchObject({ energyKcal: 2000, fluidMl: 2600, sodiumMg: 2300, steps: 9500 });
    // Energy ±5 %, protein ±10 g, carbohydrate ±15 g, fat ±7 g, water ±10 %, sodium ±15 % (the plan's
    // default tolerances, common practice, no source); steps and cardio are minimums with 10 % short
    // still on plan (common practice, no source).
    expect(Object.fromEntries(monday.drift.map((e) => [e.metric, e.state]))).toEqual({
      energy: 'on_plan',
      protein: 'on_plan',
      carbohydrate: 'on_plan',
      fat: 'on_plan',
      // 2600 against 3000 ± 300: within twice the tolerance.
      water: 'drifting',
      sodium: 'on_plan',
      steps: 'on_plan',
      // 30 min against at least 20: over a minimum is on plan.
      cardio: 'on_plan',
    });
    expect(monday.drift.find((e) => e.metric === 'water')).toMatchObject({
      target: 3000,
      actual: 2600,
      diff: -400,
      tolerance: 300,
    });
    expect(monday.breach).toBeNull();

    // Sunday is the rest day (1900 kcal) and nothing was logged: every metric not logged.
    const sunday = byDate.get('2026-11-29')!;
    expect(sunday.targets!.energyKcal).toBe(1900);
    expect(new Set(sunday.drift.map((e) => e.state))).toEqual(new Set(['not_logged']));
    // A day after today has targets but no drift yet; the countdown day carries its label.
    expect(byDate.get('2026-12-02')).toMatchObject({ drift: [], countdown: { offset: -3, dayLabel: 'E-3' } });
    expect(byDate.get('2026-12-03')!.targets).not.toBeNull();

    // Today (1 Dec) is in progress: so far on every metric, whatever is logged, and counted nowhere.
    expect(new Set(byDate.get('2026-12-01')!.drift.map((e) => e.state))).toEqual(new Set(['in_progress']));
    // The week of 30 Nov: one finished day so far, energy logged and on plan. The range ends on
    // Thursday 3 Dec, so the week shows as its real span: 30 Nov – 3 Dec, partial.
    expect(view.adherence.find((a) => a.weekStart === '2026-11-30' && a.metric === 'energy')).toEqual({
      weekStart: '2026-11-30',
      from: '2026-11-30',
      to: '2026-12-03',
      days: 4,
      partial: true,
      metric: 'energy',
      targetDays: 1,
      loggedDays: 1,
      onPlanDays: 1,
      adherence: 1,
      loggedShare: 1,
    });
    // And the week before starts with the range on Sunday 29 Nov: one day of it.
    expect(view.adherence.find((a) => a.weekStart === '2026-11-23' && a.metric === 'energy')).toMatchObject({
      from: '2026-11-29',
      to: '2026-11-29',
      days: 1,
      partial: true,
      targetDays: 1,
    });

    const res = await coachAgent.get(`${base}/days/2026-11-30`);
    const dv = dayView.parse(res.body.data);
    expect(dv.drift).toEqual(monday.drift);
    expect(dv.breach).toBeNull();
  });

  it('reports fluids after the cut-off beyond the allowance as a breach', async () => {
    const day = `${base}/days/2026-11-27`;
    await athleteAgent.post(`${day}/fluids`).send(fluidBody({ time: '17:00', volume: 1000 }));
    await athleteAgent.post(`${day}/fluids`).send(fluidBody({ time: '19:30', volume: 500 }));
    const view = await trend('2026-11-26', '2026-11-28');
    const breach = { cutoff: '18:00', allowanceMl: 250, afterCutoffMl: 500, excessMl: 250 };
    expect(view.days.map((d) => d.breach)).toEqual([null, breach, null]);
    const dv = dayView.parse((await coachAgent.get(`${base}/days/2026-11-27`)).body.data);
    expect(dv.breach).toEqual(breach);
    // The cut-off is an at-most target: beyond the allowance is off plan (no tolerance on top of it).
    expect(dv.cutoff).toEqual({ ...breach, kind: 'at_most', state: 'off_plan' });
  });
});

describe('range limits and query count', () => {
  it('answers up to 1,100 days and refuses more, naming from', async () => {
    const from = shift(TODAY, -1099);
    expect((await coachAgent.get(`${base}/trend?from=${from}&to=${TODAY}`)).status).toBe(200);
    const tooLong = await coachAgent.get(`${base}/trend?from=${shift(from, -1)}&to=${TODAY}`);
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error).toMatchObject({
      code: 'validation_failed',
      fields: { from: expect.any(String) },
    });
    const backwards = await coachAgent.get(`${base}/trend?from=${TODAY}&to=${shift(TODAY, -1)}`);
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields).toHaveProperty('to');
    const bad = await coachAgent.get(`${base}/trend?from=2026-02-30&to=${TODAY}`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('from');
  });

  it('issues the same number of statements for two weeks and for three years', async () => {
    await insertVersion(t.dataSource, {
      athleteId: me.athlete.id,
      coachId: coach.id,
      effectiveFrom: '2024-01-01',
      content: testPlan(),
    });
    await dataset();
    const short = await countStatements(t.dataSource, () => trend(shift(TODAY, -13), TODAY));
    const long = await countStatements(t.dataSource, () => trend(shift(TODAY, -1099), TODAY));
    expect(long.length).toBe(short.length);
    // Sign-in check (session, user), the athlete and its shares, then the six history reads.
    expect(short.length).toBeGreaterThanOrEqual(6);
    expect(short.length).toBeLessThanOrEqual(12);
  });
});

describe('access', () => {
  it('answers the athlete, the assigned coach, the owner and shared staff; 404 for everyone else', async () => {
    const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
    const unshared = await createAssistant(t.dataSource, { teamId: owner.teamId });
    const other = await createAthlete(t.dataSource, { coach });
    const outsider = await createOwner(t.dataSource);
    await shareAthlete(t.dataSource, me.athlete, assistant);
    const url = `${base}/trend?from=2026-11-25&to=${TODAY}`;
    for (const user of [me.user, coach, owner, assistant]) {
      const agent = await signedIn(t.app, user.email, FACTORY_PASSWORD);
      expect((await agent.get(url)).status).toBe(200);
    }
    for (const user of [unshared, other.user, outsider]) {
      const agent = await signedIn(t.app, user.email, FACTORY_PASSWORD);
      const res = await agent.get(url);
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await coachAgent.get(`/api/athletes/${newId()}/trend?from=2026-11-25&to=${TODAY}`)).status).toBe(
      404,
    );
  });

  it('tells staff they may pin marks, and the athlete that they may not', async () => {
    const coachRes = await coachAgent.get(`${base}/trend?from=2026-11-25&to=${TODAY}`);
    expect(coachRes.body.abilities).toEqual({ annotate: true });
    const own = await athleteAgent.get(`${base}/trend?from=2026-11-25&to=${TODAY}`);
    expect(own.body.abilities).toEqual({ annotate: false });
  });
});

describe('conditional requests', () => {
  it('answers an unchanged range 304 with no body, and a changed one 200 with a new tag', async () => {
    await dataset();
    const url = `${base}/trend?from=${DAY1}&to=${TODAY}`;
    const first = await coachAgent.get(url);
    expect(first.status).toBe(200);
    const tag = first.headers.etag as string;
    expect(tag).toMatch(/^W\/".+"$/);
    // RFC 9110 §13.1.2: If-None-Match naming the current tag answers 304 Not Modified.
    const again = await coachAgent.get(url).set('If-None-Match', tag);
    expect(again.status).toBe(304);
    expect(again.text).toBe('');
    expect(again.headers['cache-control']).toBe('no-store');

    // Re-entering a weight changes the figures, hence the tag.
    await weighIns([[TODAY, 78.5]]);
    const changed = await coachAgent.get(url).set('If-None-Match', tag);
    expect(changed.status).toBe(200);
    expect(changed.headers.etag).not.toBe(tag);
    expect(readTrend(changed.body).days.at(-1)!.weightKg).toBe(78.5);
  });
});
