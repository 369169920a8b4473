import { randomUUID } from 'node:crypto';
import { dayView, mealPlanFit, type PlannedMeal } from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { planContent, versionBody } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// Tuesday 1 December 2026, 11:00 in Madrid (UTC+1); Monday 30 November is yesterday.
const TODAY = '2026-12-01';
const YESTERDAY = '2026-11-30';
const TOMORROW = '2026-12-02';
let now = new Date('2026-12-01T10:00:00Z');

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
/** Invented team foods with round figures, so every figure below is worked out by hand. */
let powder: string;
let flour: string;

// Atwater's general factors (4/4/9 kcal per g; FAO 2003, Food and Nutrition Paper 77) give the team
// foods' energy: 80 g protein → 320 kcal; 80 g carbohydrate → 320 kcal.
const createFood = async (
  name: string,
  macros: { proteinG: number; carbohydrateG: number; fatG: number },
) => {
  const res = await coachAgent.post('/api/foods').send({ name, ...macros });
  expect(res.status).toBe(201);
  return res.body.data.id as string;
};

const BREAKFAST = '00000000-0000-4000-8000-0000000000b1';
const LUNCH = '00000000-0000-4000-8000-0000000000c1';

/** A planned food; the per-100 g values sent are wrong on purpose: the server sets them. */
const planned = (foodId: string, quantityG: number) => ({
  foodId,
  name: 'sent by the client',
  quantityG,
  per100g: { energyKcal: 1, proteinG: 1, carbohydrateG: 1, fatG: 1, sodiumMg: null },
});

function meals(breakfastPowderG: number): PlannedMeal[] {
  return [
    { id: LUNCH, name: 'Lunch', time: '13:00', foods: [planned(flour, 200)] },
    { id: BREAKFAST, name: 'Breakfast', time: '08:00', foods: [planned(powder, breakfastPowderG)] },
  ];
}

beforeEach(async () => {
  now = new Date('2026-12-01T10:00:00Z');
  await t.reset();
  owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Madrid' } });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  athleteAgent = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
  powder = await createFood('Test protein powder', { proteinG: 80, carbohydrateG: 0, fatG: 0 });
  flour = await createFood('Test rice flour', { proteinG: 0, carbohydrateG: 80, fatG: 0 });
});

const dayOf = async (agent: typeof coachAgent, date: string) => {
  const res = await agent.get(`${base}/days/${date}`);
  expect(res.status).toBe(200);
  return dayView.parse(res.body.data);
};

/** Every day type plans the same meals (the factory plan has training and rest days). */
const withMeals = (m: PlannedMeal[]) => planContent({ training: { meals: m }, rest: { meals: m } });

describe('meal plans in a plan version', () => {
  it('keeps the food list’s names and figures, and the day carries its meals with their totals', async () => {
    const res = await coachAgent
      .post(`${base}/plan/versions`)
      .send(versionBody(TODAY, withMeals(meals(100))));
    expect(res.status).toBe(201);
    const stored = res.body.data.content.dayTypes[0].targets.meals;
    expect(stored[1].foods[0]).toMatchObject({
      name: 'Test protein powder',
      per100g: { energyKcal: 320, proteinG: 80, carbohydrateG: 0, fatG: 0 },
    });

    const day = await dayOf(athleteAgent, TODAY);
    // Sorted by clock time. Breakfast: 100 g powder → 320 kcal, 80 g protein; lunch: 200 g flour →
    // 640 kcal, 160 g carbohydrate; the day 960 kcal.
    expect(day.mealPlan?.meals.map((m) => [m.name, m.totals.energyKcal, m.loggedEntryId])).toEqual([
      ['Breakfast', 320, null],
      ['Lunch', 640, null],
    ]);
    expect(day.mealPlan?.totals).toMatchObject({ energyKcal: 960, proteinG: 80, carbohydrateG: 160 });
    expect(day.mealPlan?.adherence).toMatchObject({ planned: 2, logged: 0, state: 'in_progress' });
    expect(day.targets?.targets.meals?.length).toBe(2);
  });

  it('refuses a food the team does not have, naming the field, and saves nothing', async () => {
    const content = withMeals([{ ...meals(100)[0]!, foods: [planned(randomUUID(), 50)] }]);
    const res = await coachAgent.post(`${base}/plan/versions`).send(versionBody(TODAY, content));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      'content.dayTypes.0.targets.meals.0.foods.0.foodId': 'Choose a food from the list',
    });
    const [row] = await t.dataSource.query<{ n: number }[]>('SELECT count(*)::int AS n FROM plan_versions');
    expect(row?.n).toBe(0);
  });

  it('a past day keeps the meal plan of the version in force then', async () => {
    now = new Date('2026-11-29T10:00:00Z');
    expect(
      (await coachAgent.post(`${base}/plan/versions`).send(versionBody('2026-11-29', withMeals(meals(100)))))
        .status,
    ).toBe(201);
    now = new Date('2026-12-01T10:00:00Z');
    expect(
      (await coachAgent.post(`${base}/plan/versions`).send(versionBody(TODAY, withMeals(meals(50))))).status,
    ).toBe(201);
    const yesterday = await dayOf(coachAgent, YESTERDAY);
    const today = await dayOf(coachAgent, TODAY);
    expect(yesterday.mealPlan?.meals[0]?.foods[0]?.quantityG).toBe(100);
    expect(today.mealPlan?.meals[0]?.foods[0]?.quantityG).toBe(50);
  });
});

describe('POST /api/meal-plans/fit', () => {
  const fitBody = (targets: Record<string, number | null>, foods: string[][]) => ({
    targets: { energyKcal: null, proteinG: null, carbohydrateG: null, fatG: null, ...targets },
    tolerances: { energyPct: 5, proteinG: 10, carbohydrateG: 15, fatG: 7 },
    meals: foods.map((ids, i) => ({
      id: i === 0 ? BREAKFAST : LUNCH,
      foods: ids.map((foodId) => ({ foodId, minG: 0, maxG: 400, stepG: 5 })),
    })),
  });

  it('proposes the exact fit worked out by hand', async () => {
    // 80 g protein → 100 g powder; 160 g carbohydrate → 200 g flour; 320 + 640 = 960 kcal.
    const res = await coachAgent
      .post('/api/meal-plans/fit')
      .send(fitBody({ energyKcal: 960, proteinG: 80, carbohydrateG: 160 }, [[powder], [flour]]));
    expect(res.status).toBe(200);
    const fit = mealPlanFit.parse(res.body.data);
    expect(fit.fits).toBe(true);
    expect(fit.meals).toEqual([
      { id: BREAKFAST, foods: [{ foodId: powder, quantityG: 100 }] },
      { id: LUNCH, foods: [{ foodId: flour, quantityG: 200 }] },
    ]);
    expect(fit.unmet).toEqual([]);
  });

  it('says which target cannot be met and by how much', async () => {
    // Flour alone: no protein at any quantity; 150 g short of 150 g, 140 g beyond ±10 g.
    const res = await coachAgent
      .post('/api/meal-plans/fit')
      .send(fitBody({ energyKcal: 1280, proteinG: 150 }, [[flour]]));
    expect(res.status).toBe(200);
    expect(res.body.data.fits).toBe(false);
    expect(res.body.data.unmet).toEqual([
      'Protein cannot be met with these foods and bounds: at best 150 g short of 150 g, 140 g beyond the tolerance of ±10 g',
    ]);
  });

  it('400 names an unknown food; an athlete and an assistant are refused', async () => {
    const unknown = await coachAgent
      .post('/api/meal-plans/fit')
      .send(fitBody({ energyKcal: 500 }, [[randomUUID()]]));
    expect(unknown.status).toBe(400);
    expect(Object.keys(unknown.body.error.fields)).toEqual(['meals.0.foods.0.foodId']);
    const asAthlete = await athleteAgent
      .post('/api/meal-plans/fit')
      .send(fitBody({ energyKcal: 500 }, [[flour]]));
    expect(asAthlete.status).toBe(403);
    const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
    const assistantAgent = await signedIn(t.app, assistant.email, FACTORY_PASSWORD);
    const asAssistant = await assistantAgent
      .post('/api/meal-plans/fit')
      .send(fitBody({ energyKcal: 500 }, [[flour]]));
    expect(asAssistant.status).toBe(403);
  });
});

describe('logging a planned meal', () => {
  beforeEach(async () => {
    now = new Date('2026-11-29T10:00:00Z');
    const res = await coachAgent
      .post(`${base}/plan/versions`)
      .send(versionBody('2026-11-29', withMeals(meals(100))));
    expect(res.status).toBe(201);
    now = new Date('2026-12-01T10:00:00Z');
  });

  it('one request logs the meal as eaten; it counts toward the day and the meal plan', async () => {
    const clientId = randomUUID();
    const res = await athleteAgent
      .post(`${base}/days/${YESTERDAY}/planned-meals/${BREAKFAST}`)
      .send({ clientId });
    expect(res.status).toBe(201);
    // A meal of foods named after the planned meal, at its planned time, the foods as eaten.
    expect(res.body.data.items.map((i: { quantityG: number }) => i.quantityG)).toEqual([100]);
    expect(res.body.data).toMatchObject({
      source: 'foods',
      name: 'Breakfast',
      time: '08:00',
      energyKcal: 320,
      proteinG: 80,
      plannedMealId: BREAKFAST,
    });
    const again = await athleteAgent
      .post(`${base}/days/${YESTERDAY}/planned-meals/${BREAKFAST}`)
      .send({ clientId });
    expect(again.status).toBe(200);

    for (const agent of [athleteAgent, coachAgent]) {
      const day = await dayOf(agent, YESTERDAY);
      expect(day.totals.energyKcal).toBe(320);
      expect(day.drift.find((d) => d.metric === 'energy')?.actual).toBe(320);
      // One of two planned meals: the tolerance is a quarter of two (0.5 meal), one missed is within
      // twice it, so drifting.
      expect(day.mealPlan?.adherence).toMatchObject({ planned: 2, logged: 1, state: 'drifting' });
      expect(day.mealPlan?.meals[0]?.loggedEntryId).toBe(res.body.data.id);
    }
  });

  it('changed quantities and a swapped food are logged as sent', async () => {
    // 150 g flour instead of 200 g: 480 kcal, 120 g carbohydrate; plus 25 g powder: 80 kcal, 20 g protein.
    const res = await athleteAgent.post(`${base}/days/${YESTERDAY}/planned-meals/${LUNCH}`).send({
      clientId: randomUUID(),
      time: '13:30',
      foods: [
        { foodId: flour, quantityG: 150 },
        { foodId: powder, quantityG: 25 },
      ],
    });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ time: '13:30', energyKcal: 560, carbohydrateG: 120, proteinG: 20 });
    expect(res.body.data.items).toHaveLength(2);
  });

  it('logged today before its planned time, it takes the athlete’s clock now', async () => {
    const res = await athleteAgent
      .post(`${base}/days/${TODAY}/planned-meals/${LUNCH}`)
      .send({ clientId: randomUUID() });
    expect(res.status).toBe(201);
    expect(res.body.data.time).toBe('11:00');
  });

  it('404 for a meal the day does not plan; another athlete is refused; bad input names the field', async () => {
    expect(
      (
        await athleteAgent
          .post(`${base}/days/${YESTERDAY}/planned-meals/${randomUUID()}`)
          .send({ clientId: randomUUID() })
      ).status,
    ).toBe(404);
    const other = await createAthlete(t.dataSource, { coach });
    const otherAgent = await signedIn(t.app, other.user.email, FACTORY_PASSWORD);
    const refused = await otherAgent
      .post(`${base}/days/${YESTERDAY}/planned-meals/${BREAKFAST}`)
      .send({ clientId: randomUUID() });
    expect([403, 404]).toContain(refused.status);
    const bad = await athleteAgent
      .post(`${base}/days/${YESTERDAY}/planned-meals/${BREAKFAST}`)
      .send({ clientId: randomUUID(), foods: [{ foodId: flour, quantityG: 'lots' }] });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['foods.0.quantityG']);
    const [row] = await t.dataSource.query<{ n: number }[]>('SELECT count(*)::int AS n FROM meal_entries');
    expect(row?.n).toBe(0);
    // A day after today: nothing to log yet.
    const future = await athleteAgent
      .post(`${base}/days/${TOMORROW}/planned-meals/${BREAKFAST}`)
      .send({ clientId: randomUUID() });
    expect(future.status).toBe(400);
  });
});
