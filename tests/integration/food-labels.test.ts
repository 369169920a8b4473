import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Food } from '../../api/src/entities/food.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { countRows, foodMealBody } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

/** Team and personal foods from a nutrition label: POST /api/foods/label, POST /api/athletes/:id/foods. */
const now = new Date('2026-12-01T20:00:00Z');
const TODAY = '2026-12-01';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

let owner: User;
let coach: User;
let assistant: User;
let athlete: CreatedAthlete;
let otherAthlete: CreatedAthlete;
let outsider: User;
beforeEach(async () => {
  await t.reset();
  owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  athlete = await createAthlete(t.dataSource, { coach });
  otherAthlete = await createAthlete(t.dataSource, { coach });
  outsider = await createCoach(t.dataSource);
});

const as = (user: User) => signedIn(t.app, user.email, FACTORY_PASSWORD);
const personalPath = (a: CreatedAthlete) => `/api/athletes/${a.athlete.id}/foods`;

// Invented muesli label. Per 100 g: 390 kcal, P 13, C 60, F 7, fibre 10, sodium 400 mg; Atwater
// (FAO 2003 FNP 77, fibre 2 kcal/g): 4·13 + 4·60 + 9·7 + 2·10 = 375 kcal → +4 %, within 10 %.
const per100g = {
  name: 'Harbour muesli',
  basis: 'per100g',
  energy: 390,
  energyUnit: 'kcal',
  proteinG: 13,
  carbohydrateG: 60,
  fatG: 7,
  fibreG: 10,
  sodiumMg: 400,
};
// The same label's 30 g serving column, energy in kJ: 117 kcal × 4.184 = 489.528 kJ (Handbook 74).
const perServing = {
  name: 'Harbour muesli',
  basis: 'perServing',
  servingSize: 30,
  servingUnit: 'g',
  energy: 489.528,
  energyUnit: 'kJ',
  proteinG: 3.9,
  carbohydrateG: 18,
  fatG: 2.1,
  fibreG: 3,
  sodiumMg: 120,
};

async function storedRow(id: string): Promise<Food> {
  return t.dataSource.getRepository(Food).findOneByOrFail({ id });
}

describe('label foods: per 100 g and per serving', () => {
  it('stores the same per-100 g values whichever column of the label was copied', async () => {
    const agent = await as(coach);
    const a = await agent.post('/api/foods/label').send(per100g);
    const b = await agent.post('/api/foods/label').send(perServing);
    expect(a.status).toBe(201);
    expect(b.status).toBe(201);
    const [rowA, rowB] = [await storedRow(a.body.data.food.id), await storedRow(b.body.data.food.id)];
    for (const key of [
      'proteinG',
      'carbohydrateG',
      'fatG',
      'fibreG',
      'sodiumMg',
      'labelEnergyKcal',
    ] as const) {
      expect(rowB[key], key).toBeCloseTo(rowA[key] as number, 9);
    }
    expect(rowA).toMatchObject({ proteinG: 13, carbohydrateG: 60, fatG: 7, fibreG: 10, sodiumMg: 400 });
    expect(rowA.labelEnergyKcal).toBe(390);
    expect(rowA.athleteId).toBeNull();
    // Energy shown is the Atwater rule of every food (4·13 + 4·60 + 9·7 = 355 kcal, fibre uncounted);
    // the label check counts fibre: 375 kcal against the printed 390, +4 %, no warning.
    expect(a.body.data.food).toMatchObject({ source: 'team', barcode: null });
    expect(a.body.data.food.per100g).toMatchObject({ energyKcal: 355, listedEnergyKcal: null });
    expect(a.body.data.labelCheck).toMatchObject({ printedKcal: 390, atwaterKcal: 375, warning: null });
    expect(a.body.data.labelCheck.differencePct).toBeCloseTo(4, 9);
  });

  it('reads a serving in mL at 1 g/mL, or at the density given', async () => {
    const agent = await as(athlete.user);
    // 250 mL of a drink, 4 g protein, 10 g sugar, 2.5 g fat, 80 kcal → per 100 g 1.6 / 4 / 1 / 32.
    const drink = {
      name: 'Cocoa drink',
      basis: 'perServing',
      servingSize: 250,
      servingUnit: 'ml',
      energy: 80,
      energyUnit: 'kcal',
      proteinG: 4,
      carbohydrateG: 10,
      fatG: 2.5,
    };
    const plain = await agent.post(personalPath(athlete)).send(drink);
    const dense = await agent.post(personalPath(athlete)).send({ ...drink, densityGPerMl: 1.25 });
    expect((await storedRow(plain.body.data.food.id)).proteinG).toBeCloseTo(1.6, 9);
    // 250 mL × 1.25 g/mL = 312.5 g → 4 / 312.5 × 100 = 1.28 g per 100 g.
    expect((await storedRow(dense.body.data.food.id)).proteinG).toBeCloseTo(1.28, 9);
  });

  it('warns, and still saves, when the printed energy is more than 10 % off the macros', async () => {
    const agent = await as(coach);
    // 450 kcal printed; 4·30 + 4·35 + 9·12 = 368 kcal → +22.3 %.
    const res = await agent.post('/api/foods/label').send({
      ...per100g,
      name: 'Caramel bar',
      energy: 450,
      proteinG: 30,
      carbohydrateG: 35,
      fatG: 12,
      fibreG: null,
    });
    expect(res.status).toBe(201);
    expect(res.body.data.labelCheck.atwaterKcal).toBe(368);
    expect(res.body.data.labelCheck.differencePct).toBeCloseTo(22.283, 2);
    expect(res.body.data.labelCheck.warning).toMatch(/450 kcal per 100 g, 22 % more than the 368 kcal/);
    expect(res.body.data.food.per100g.listedEnergyKcal).toBe(450);
  });
});

describe('label foods: refusals name the field', () => {
  it.each([
    ['a per-serving label without its serving', 'servingSize', { ...perServing, servingSize: undefined }],
    ['a per-serving label without g or mL', 'servingUnit', { ...perServing, servingUnit: null }],
    ['macros heavier than the serving', 'servingSize', { ...perServing, servingSize: 10 }],
    ['macros over 100 g per 100 g', 'carbohydrateG', { ...per100g, carbohydrateG: 95 }],
    ['a negative protein', 'proteinG', { ...per100g, proteinG: -1 }],
    ['an unknown energy unit', 'energyUnit', { ...per100g, energyUnit: 'cal' }],
    ['no basis', 'basis', { ...per100g, basis: undefined }],
    ['a one-letter name', 'name', { ...per100g, name: 'x' }],
  ])('%s → 400 on %s', async (_what, field, body) => {
    const agent = await as(coach);
    const before = await countRows(t.dataSource, 'foods');
    const res = await agent.post('/api/foods/label').send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields)).toContain(field);
    expect(await countRows(t.dataSource, 'foods')).toBe(before);
  });
});

describe('label foods: who adds and who sees them', () => {
  it('lets staff who create foods add team foods; assistants and athletes get 403 and nothing is added', async () => {
    expect((await (await as(owner)).post('/api/foods/label').send(per100g)).status).toBe(201);
    for (const user of [assistant, athlete.user]) {
      const res = await (await as(user)).post('/api/foods/label').send(per100g);
      expect(res.status, user.email).toBe(403);
    }
    expect(await countRows(t.dataSource, 'foods')).toBe(1);
  });

  it('lets only the athlete add their personal foods (coach 403, others 404), nothing added', async () => {
    const res = await (await as(athlete.user)).post(personalPath(athlete)).send(per100g);
    expect(res.status).toBe(201);
    expect(res.body.data.food.source).toBe('personal');
    expect((await storedRow(res.body.data.food.id)).athleteId).toBe(athlete.athlete.id);
    expect((await (await as(coach)).post(personalPath(athlete)).send(per100g)).status).toBe(403);
    for (const user of [otherAthlete.user, assistant, outsider]) {
      expect((await (await as(user)).post(personalPath(athlete)).send(per100g)).status, user.email).toBe(404);
    }
    expect(await countRows(t.dataSource, 'foods')).toBe(1);
  });

  it('shows a personal food by id only to its athlete and their coaches; other ids answer 404', async () => {
    const mine = await (await as(athlete.user)).post(personalPath(athlete)).send(per100g);
    const team = await (await as(coach)).post('/api/foods/label').send(per100g);
    const personalId = mine.body.data.food.id as string;
    const teamId = team.body.data.food.id as string;
    for (const user of [athlete.user, coach, owner]) {
      const res = await (await as(user)).get(`/api/foods/${personalId}`);
      expect(res.status, user.email).toBe(200);
      expect(res.body.data).toMatchObject({ id: personalId, source: 'personal' });
    }
    for (const user of [otherAthlete.user, assistant, outsider]) {
      const res = await (await as(user)).get(`/api/foods/${personalId}`);
      expect(res.status, user.email).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await (await as(otherAthlete.user)).get(`/api/foods/${teamId}`)).status).toBe(200);
    expect((await (await as(outsider)).get(`/api/foods/${teamId}`)).status).toBe(404);
  });

  it('finds personal foods in the athlete’s own search only', async () => {
    await (await as(athlete.user)).post(personalPath(athlete)).send({ ...per100g, name: 'Zest crackers' });
    const q = { q: 'zest crackers' };
    const own = await (await as(athlete.user)).get('/api/foods').query(q);
    expect(own.body.data.map((f: { name: string }) => f.name)).toEqual(['Zest crackers']);
    const other = await (await as(otherAthlete.user)).get('/api/foods').query(q);
    expect(other.body.data).toEqual([]);
    const staff = await (await as(coach)).get('/api/foods').query(q);
    expect(staff.body.data).toEqual([]);
  });

  it('logs a meal from the athlete’s own personal food, never from another athlete’s', async () => {
    const mine = await (await as(athlete.user)).post(personalPath(athlete)).send(per100g);
    const theirs = await (await as(otherAthlete.user)).post(personalPath(otherAthlete)).send(per100g);
    const agent = await as(athlete.user);
    const meals = `/api/athletes/${athlete.athlete.id}/days/${TODAY}/meals`;
    const ok = await agent.post(meals).send(foodMealBody(mine.body.data.food.id, 50));
    expect(ok.status).toBe(201);
    // 50 g of 13 g protein per 100 g.
    expect(ok.body.data.proteinG).toBeCloseTo(6.5, 9);
    const refused = await agent.post(meals).send(foodMealBody(theirs.body.data.food.id, 50));
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields).toEqual({ 'items.0.foodId': 'Choose a food from the list' });
  });
});
