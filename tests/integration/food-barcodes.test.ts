import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { startFoodProductsFake, type FoodProductsFake } from '../../scripts/src/lib/food-products-fake.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach } from '../factories/users.js';
import { countRows } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

/**
 * POST /api/athletes/:athleteId/foods/barcode against the food-products fake (invented products,
 * scripts/src/lib/food-products-fake.ts), asked through the database's Node SDK.
 */
const OATS = '2004821000018';
const BAR = '2004821000032';
const WATER = '2004821000049';
/** Valid check digit, not in the fake. */
const UNKNOWN = '2004821000056';

let fake: FoodProductsFake;
let t: TestApp;
beforeAll(async () => {
  fake = await startFoodProductsFake({ port: 0 });
  t = await buildTestApp({ foodProductsUrl: fake.url });
});
afterAll(async () => {
  await t.close();
  await fake.close();
});

let coach: User;
let athlete: CreatedAthlete;
beforeEach(async () => {
  await t.reset();
  fake.requests.length = 0;
  coach = await createCoach(t.dataSource);
  athlete = await createAthlete(t.dataSource, { coach });
});

const lookup = (a: CreatedAthlete) => `/api/athletes/${a.athlete.id}/foods/barcode`;
const asAthlete = () => signedIn(t.app, athlete.user.email, FACTORY_PASSWORD);

describe('barcode lookup', () => {
  it('makes a found product the athlete’s personal food with the label’s figures per 100 g', async () => {
    const agent = await asAthlete();
    const res = await agent.post(lookup(athlete)).send({ barcode: OATS });
    expect(res.status).toBe(201);
    expect(res.body.data.created).toBe(true);
    // The fake's label: 390 kcal, P 13, C 60, F 7, fibre 10, sodium 0.4 g per 100 g.
    expect(res.body.data.food).toMatchObject({
      name: 'Harbourline oat clusters',
      source: 'personal',
      barcode: OATS,
      per100g: {
        proteinG: 13,
        carbohydrateG: 60,
        fatG: 7,
        fibreG: 10,
        sodiumMg: 400,
        listedEnergyKcal: null,
      },
    });
    expect(res.body.data.labelCheck).toMatchObject({ printedKcal: 390, atwaterKcal: 375, warning: null });
    // The product is now one of the athlete's foods.
    const search = await agent.get('/api/foods').query({ q: 'oat clusters' });
    expect(search.body.data[0]).toMatchObject({ id: res.body.data.food.id, source: 'personal' });
  });

  it('sends the barcode and nothing about the athlete', async () => {
    const agent = await asAthlete();
    await agent.post(lookup(athlete)).send({ barcode: OATS });
    expect(fake.requests).toHaveLength(1);
    const [sent] = fake.requests;
    expect(sent).toMatchObject({ method: 'GET', url: `/api/v2/product/${OATS}` });
    const everything = JSON.stringify(sent).toLowerCase();
    expect(sent!.headers.cookie).toBeUndefined();
    expect(sent!.headers.authorization).toBeUndefined();
    for (const secret of [
      athlete.user.email,
      athlete.user.name,
      athlete.user.id,
      athlete.athlete.id,
      coach.id,
      'dm_session',
    ]) {
      expect(everything).not.toContain(secret.toLowerCase());
    }
  });

  it('answers 200 with the food the athlete already has, without asking again', async () => {
    const agent = await asAthlete();
    const first = await agent.post(lookup(athlete)).send({ barcode: OATS });
    const again = await agent.post(lookup(athlete)).send({ barcode: OATS });
    expect(again.status).toBe(200);
    expect(again.body.data).toMatchObject({ created: false, food: { id: first.body.data.food.id } });
    expect(fake.requests).toHaveLength(1);
    expect(await countRows(t.dataSource, 'foods')).toBe(1);
  });

  it('carries the label check’s warning for a product whose printed energy is off', async () => {
    const res = await (await asAthlete()).post(lookup(athlete)).send({ barcode: BAR });
    expect(res.status).toBe(201);
    // 450 kcal printed; 4·30 + 4·35 + 9·12 = 368 kcal (FAO 2003 FNP 77) → +22 %.
    expect(res.body.data.labelCheck.warning).toMatch(/22 % more than the 368 kcal/);
  });

  it('answers an unknown barcode with "not found, enter the label" and adds nothing', async () => {
    const res = await (await asAthlete()).post(lookup(athlete)).send({ barcode: UNKNOWN });
    expect(res.status).toBe(404);
    expect(res.body.error).toMatchObject({ code: 'barcode_not_found' });
    expect(res.body.error.message).toMatch(/No product with this barcode was found: enter the label/);
    expect(await countRows(t.dataSource, 'foods')).toBe(0);
  });

  it('answers a product listed without figures the same way, saying why', async () => {
    const res = await (await asAthlete()).post(lookup(athlete)).send({ barcode: WATER });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/without nutrition figures: enter the label/);
  });

  it('refuses a typed number whose check digit does not match, naming the field, before any lookup', async () => {
    const res = await (await asAthlete()).post(lookup(athlete)).send({ barcode: '2004821000019' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.barcode).toMatch(/last digit/);
    expect(fake.requests).toHaveLength(0);
  });

  it('lets only the athlete look up (their coach 403)', async () => {
    const agent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    expect((await agent.post(lookup(athlete)).send({ barcode: OATS })).status).toBe(403);
    expect(fake.requests).toHaveLength(0);
  });
});

describe('barcode lookup while the food-products database is down', () => {
  it('answers 503 with a clear message and adds nothing', async () => {
    const gone = await startFoodProductsFake({ port: 0 });
    const url = gone.url;
    await gone.close();
    const down = await buildTestApp({ foodProductsUrl: url });
    try {
      const agent = await signedIn(down.app, athlete.user.email, FACTORY_PASSWORD);
      const res = await agent.post(lookup(athlete)).send({ barcode: OATS });
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('food_products_unavailable');
      expect(res.body.error.message).toMatch(/not answering right now: enter the label/);
      expect(await countRows(t.dataSource, 'foods')).toBe(0);
    } finally {
      await down.close();
    }
  });

  it('answers 503 the same way when no database is set', async () => {
    const unset = await buildTestApp({ foodProductsUrl: undefined });
    try {
      const agent = await signedIn(unset.app, athlete.user.email, FACTORY_PASSWORD);
      const res = await agent.post(lookup(athlete)).send({ barcode: OATS });
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('food_products_unavailable');
    } finally {
      await unset.close();
    }
  });
});
