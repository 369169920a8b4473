import { dayView, templateView } from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { fluidBody, macroMealBody, weighInBody } from './check-ins-helpers.js';
import { planContent, safeTargets, supplement, templateBody, versionBody } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// Tuesday 1 December 2026, 18:00 in Madrid (CET, UTC+1). The show is on Thursday 3 December at
// 09:00 in Auckland (NZDT, UTC+13): today is E-2 on the athlete's calendar.
const TODAY = '2026-12-01';
const EVENT = '2026-12-03';
const now = new Date('2026-12-01T17:00:00Z');

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

type Agent = Awaited<ReturnType<typeof signedIn>>;
let me: CreatedAthlete;
let coachAgent: Agent;
let athlete: Agent;
let base: string;

beforeEach(async () => {
  await t.reset();
  const owner = await createOwner(t.dataSource);
  const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, {
    coach,
    user: { timeZone: 'Europe/Madrid' },
    athlete: { eventDate: EVENT, eventTime: '09:00', eventTimeZone: 'Pacific/Auckland' },
  });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  athlete = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
});

const caffeine = { ...supplement('Caffeine', []), dose: 200, unit: 'mg', minutesBeforeEvent: [180] };

/** A template whose E-2 has "all food before 13:00" (150 kcal after) and E-0 "only sips" and caffeine 3 h before. */
async function applyTimedTemplate() {
  const body = templateBody({
    days: [
      {
        offset: -2,
        label: 'Food early',
        targets: safeTargets({ foodCutoff: { time: '13:00', allowanceKcal: 150 } }),
      },
      {
        offset: 0,
        label: 'Show day',
        targets: safeTargets({ fluidCap: { maxMl: 250, after: null }, supplements: [caffeine] }),
      },
    ],
  });
  const created = await coachAgent.post('/api/countdown-templates').send(body);
  expect(created.status).toBe(201);
  const template = templateView.parse(created.body.data);
  expect(template.days[1]!.targets.supplements[0]!.minutesBeforeEvent).toEqual([180]);
  const first = await coachAgent
    .post(`${base}/plan/countdown`)
    .send({ templateId: template.id, eventDate: EVENT });
  expect(first.status).toBe(409);
  // The fluid cap is a fluid restriction: a strong warning to acknowledge like a cut-off.
  const keys = Object.keys(first.body.error.fields);
  expect(keys).toContain(`fluid_restriction:date:${EVENT}`);
  const res = await coachAgent
    .post(`${base}/plan/countdown`)
    .send({ templateId: template.id, eventDate: EVENT, acknowledgedKeys: keys });
  expect(res.status).toBe(201);
}

describe('countdown timing targets', () => {
  it('flags food logged after the food cut-off beyond the allowance, by the same rule as fluids', async () => {
    await athlete.put(`${base}/days/${TODAY}/weigh-in`).send(weighInBody({ weight: 60 }));
    await applyTimedTemplate();
    const d = `${base}/days/${TODAY}`;
    // 12:30 is before the cut-off; 13:00 itself is still in time; 15:00 is after: 40·4 + 60·4 + 15·9 = 535 kcal.
    expect((await athlete.post(`${d}/meals`).send(macroMealBody({ time: '12:30' }))).status).toBe(201);
    expect((await athlete.post(`${d}/meals`).send(macroMealBody({ time: '13:00' }))).status).toBe(201);
    expect((await athlete.post(`${d}/meals`).send(macroMealBody({ time: '15:00' }))).status).toBe(201);
    const day = dayView.parse((await coachAgent.get(d)).body.data);
    expect(day.targets!.targets.foodCutoff).toEqual({ time: '13:00', allowanceKcal: 150 });
    expect(day.timingBreaches).toEqual([
      { kind: 'food_cutoff', after: '13:00', unit: 'kcal', allowance: 150, logged: 535, excess: 385 },
    ]);
  });

  it('places "3 h before the event" in Auckland on the Madrid clock, and caps fluids on the event day', async () => {
    await athlete.put(`${base}/days/${TODAY}/weigh-in`).send(weighInBody({ weight: 60 }));
    await applyTimedTemplate();
    const e0 = dayView.parse((await athlete.get(`${base}/days/${EVENT}`)).body.data);
    expect(e0.targets!.targets.fluidCap).toEqual({ maxMl: 250, after: null });
    // 09:00 NZDT on 3 Dec = 20:00 UTC on 2 Dec; 3 h before = 17:00 UTC = 18:00 CET on 2 Dec (IANA tz database).
    expect(e0.targets!.targets.eventTimed).toEqual([
      {
        itemId: caffeine.id,
        item: 'Caffeine',
        dose: 200,
        unit: 'mg',
        minutesBefore: 180,
        at: { date: '2026-12-02', time: '18:00' },
      },
    ]);
    // Nothing is judged on a day still to come.
    expect(e0.timingBreaches).toEqual([]);
    // Today (no cap): fluids are not capped.
    await athlete.post(`${base}/days/${TODAY}/fluids`).send(fluidBody({ volume: 900, time: '09:00' }));
    const today = dayView.parse((await athlete.get(`${base}/days/${TODAY}`)).body.data);
    expect(today.timingBreaches).toEqual([]);
  });

  it('names the field when a timed item is malformed or set outside a countdown day', async () => {
    const noTime = templateBody({
      days: [{ offset: 0, label: null, targets: safeTargets({ supplements: [supplement('Caffeine', [])] }) }],
    });
    const res = await coachAgent.post('/api/countdown-templates').send(noTime);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      'days.0.targets.supplements.0.times': 'Add a clock time or a time before the event',
    });
    const tooEarly = templateBody({
      days: [
        {
          offset: 0,
          label: null,
          targets: safeTargets({
            supplements: [{ ...caffeine, minutesBeforeEvent: [3000] }],
            foodCutoff: { time: '25:00', allowanceKcal: -1 },
          }),
        },
      ],
    });
    const bad = await coachAgent.post('/api/countdown-templates').send(tooEarly);
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'days.0.targets.foodCutoff.allowanceKcal',
      'days.0.targets.foodCutoff.time',
      'days.0.targets.supplements.0.minutesBeforeEvent.0',
    ]);
    const pattern = await coachAgent
      .post(`${base}/plan/versions`)
      .send(versionBody(TODAY, planContent({ training: { supplements: [caffeine] } })));
    expect(pattern.status).toBe(400);
    expect(Object.keys(pattern.body.error.fields)).toEqual([
      'content.dayTypes.0.targets.supplements.0.minutesBeforeEvent',
    ]);
  });
});
