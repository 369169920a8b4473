import { LIMITS, dayView, mealView } from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Food } from '../../api/src/entities/food.entity.js';
import { AthleteRepository } from '../../api/src/repositories/athlete.repository.js';
import { logMealFromItems } from '../../api/src/services/meal-log.service.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { countRows, foodsMealBody, newId } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// 20:00 on 1 December 2026 in UTC: "today" for the athlete below.
const now = new Date('2026-12-01T20:00:00Z');
const TODAY = '2026-12-01';

let t: TestApp;
let me: CreatedAthlete;
let agent: Awaited<ReturnType<typeof signedIn>>;
let base: string;
let mix: Food;

beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

beforeEach(async () => {
  await t.reset();
  const owner = await createOwner(t.dataSource);
  const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, { coach, user: { timeZone: 'UTC' } });
  agent = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
  // Per 100 g: 30 g protein, 50 g carbohydrate, 14 g fat, 2 g alcohol; 500 g of it is
  // REFERENCES.md §1 check 2 (150 g P + 250 g C + 70 g F + 10 g alcohol → 2300 kcal, Atwater
  // general factors: FAO 2003 FNP 77; Merrill & Watt, USDA Handbook 74).
  mix = await t.dataSource.getRepository(Food).save({
    teamId: me.athlete.teamId,
    name: 'Check-two mix',
    proteinG: 30,
    carbohydrateG: 50,
    fatG: 14,
    fibreG: null,
    alcoholG: 2,
    sodiumMg: 100,
    createdById: coach.id,
  });
});

const day = async () => (await agent.get(`${base}/days/${TODAY}`).expect(200)).body.data;
const post = (body: object) => agent.post(`${base}/days/${TODAY}/meals`).send(body);

describe('a meal of several foods', () => {
  it('stores each food as eaten and the meal as their sum, and the day view lists them', async () => {
    const res = await post(
      foodsMealBody([
        { foodId: mix.id, quantityG: 200 },
        { foodId: mix.id, quantityG: 300 },
        { foodId: 'dm:egg-whole-raw', portions: 2, portionUnit: 'large' },
      ]),
    );
    expect(res.status).toBe(201);
    const meal = mealView.strict().parse(res.body.data);
    expect(meal.source).toBe('foods');
    expect(meal.items.map((i) => i.quantityG)).toEqual([200, 300, 100]);
    expect(meal.items[0]).toMatchObject({ foodName: 'Check-two mix', portion: null, energyKcal: 920 });
    // Two large eggs: 2 × 50 g (the egg's portion weight) = 100 g.
    expect(meal.items[2]!.portion).toEqual({ count: 2, unit: 'large', label: 'large egg', grams: 50 });
    const egg = meal.items[2]!;
    // 500 g of the mix is check 2: 2300 kcal; the meal adds the eggs' own figures.
    expect(meal.items[0]!.energyKcal + meal.items[1]!.energyKcal).toBeCloseTo(2300, 9);
    expect(meal.energyKcal).toBeCloseTo(2300 + egg.energyKcal, 9);
    expect(meal.proteinG).toBeCloseTo(150 + egg.proteinG, 9);
    expect(meal.alcoholG).toBeCloseTo(10, 9);
    expect(meal.sodiumMg).toBeCloseTo(500 + egg.sodiumMg!, 9);

    const view = dayView.strict().parse(await day());
    expect(view.meals).toHaveLength(1);
    expect(view.meals[0]!.items).toEqual(meal.items);
    expect(view.totals.energyKcal).toBeCloseTo(meal.energyKcal, 9);
  });

  it('keeps what a meal stored when its team food changes later, also through an edit', async () => {
    const created = await post(foodsMealBody([{ foodId: mix.id, quantityG: 100 }]));
    const id = created.body.data.id;
    expect(created.body.data.energyKcal).toBeCloseTo(460, 9);
    await t.dataSource.getRepository(Food).update(mix.id, { proteinG: 90 });

    const renamed = await agent
      .patch(`${base}/meals/${id}`)
      .send({ name: 'Second breakfast', time: '10:00' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.data.energyKcal).toBeCloseTo(460, 9);
    // More of the same food, and a banana: the mix keeps its stored figures per 100 g.
    const more = await agent.patch(`${base}/meals/${id}`).send({
      items: [
        { foodId: mix.id, quantityG: 200 },
        { foodId: 'dm:banana', portions: 1, portionUnit: 'medium' },
      ],
    });
    expect(more.status).toBe(200);
    expect(more.body.data.items[0].energyKcal).toBeCloseTo(920, 9);
    expect(more.body.data.items[1].quantityG).toBe(118);
    expect(await countRows(t.dataSource, 'meal_entry_items')).toBe(2);

    // Switching to typed macros removes the items; deleting the meal leaves none behind.
    const typed = await agent
      .patch(`${base}/meals/${id}`)
      .send({ source: 'macros', proteinG: 10, carbohydrateG: 10, fatG: 0 });
    expect(typed.body.data).toMatchObject({ source: 'macros', items: [], energyKcal: 80 });
    expect(await countRows(t.dataSource, 'meal_entry_items')).toBe(0);
    const again = await post(foodsMealBody([{ foodId: 'dm:banana', quantityG: 100 }]));
    expect(await countRows(t.dataSource, 'meal_entry_items')).toBe(1);
    await agent.delete(`${base}/meals/${again.body.data.id}`).expect(204);
    expect(await countRows(t.dataSource, 'meal_entry_items')).toBe(0);
  });

  it('answers 400 naming the item and field, and stores nothing', async () => {
    const cases: [unknown[], Record<string, string> | string[]][] = [
      [[], ['items']],
      [
        Array.from({ length: LIMITS.mealItems.max + 1 }, () => ({ foodId: 'dm:banana', quantityG: 10 })),
        ['items'],
      ],
      [[{ foodId: 'dm:banana' }], { 'items.0.quantityG': 'Give grams or a number of portions' }],
      [
        [{ foodId: 'dm:banana', quantityG: 100, portions: 1, portionUnit: 'medium' }],
        { 'items.0.portions': 'Give grams or portions, not both' },
      ],
      [[{ foodId: 'dm:banana', portions: 1 }], { 'items.0.portionUnit': 'Choose a portion' }],
      [
        [
          { foodId: 'dm:banana', quantityG: 100 },
          { foodId: 'dm:banana', portions: 1, portionUnit: 'slice' },
        ],
        { 'items.1.portionUnit': 'Choose a portion this food has' },
      ],
      [[{ foodId: 'dm:no-such-food', quantityG: 100 }], { 'items.0.foodId': 'Choose a food from the list' }],
      [[{ foodId: 'dm:olive-oil', portions: 50, portionUnit: 'cup' }], ['items.0.portionUnit']],
      [[{ foodId: 'dm:rice-white-raw', portions: 50, portionUnit: 'cup' }], ['items.0.portions']],
    ];
    for (const [items, fields] of cases) {
      const res = await post(foodsMealBody(items as Record<string, unknown>[]));
      expect(res.status, JSON.stringify(items).slice(0, 80)).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
      if (Array.isArray(fields)) expect(Object.keys(res.body.error.fields)).toEqual(fields);
      else expect(res.body.error.fields).toEqual(fields);
    }
    expect(await countRows(t.dataSource, 'meal_entries')).toBe(0);
    expect(await countRows(t.dataSource, 'meal_entry_items')).toBe(0);
  });
});

describe('logMealFromItems (for other features)', () => {
  it('logs a meal of foods like the athlete would, once per client id', async () => {
    const athlete = (await new AthleteRepository(t.dataSource.manager).findWithPeople(me.athlete.id))!;
    const deps = { dataSource: t.dataSource, clock: () => now };
    const meal = {
      clientId: newId(),
      time: '12:00',
      name: 'Planned lunch',
      items: [
        { foodId: 'dm:rice-white-cooked', portions: 1, portionUnit: 'cup' },
        { foodId: 'dm:chicken-breast-cooked', quantityG: 150 },
      ],
    };
    const first = await logMealFromItems(deps, athlete, TODAY, meal);
    expect(first.created).toBe(true);
    expect(first.entry.items?.map((i) => [i.foodId, i.quantityG])).toEqual([
      ['dm:rice-white-cooked', 158],
      ['dm:chicken-breast-cooked', 150],
    ]);
    const again = await logMealFromItems(deps, athlete, TODAY, meal);
    expect(again).toMatchObject({ created: false, entry: { id: first.entry.id } });
    expect(again.entry.items).toHaveLength(2);
    expect((await day()).meals[0].items).toHaveLength(2);
    await expect(
      logMealFromItems(deps, athlete, TODAY, { ...meal, clientId: newId(), items: [] }),
    ).rejects.toThrow();
  });
});
