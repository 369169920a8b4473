import { fluidView, mealView, weighInView } from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { Food } from '../../api/src/entities/food.entity.js';
import { countRows, fluidBody, foodsMealBody, macroMealBody, weighInBody } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { countStatements } from './trend-helpers.js';

// 20:00 on 1 December 2026 in UTC: "today" for the athlete below.
const now = new Date('2026-12-01T20:00:00Z');
const TODAY = '2026-12-01';

/**
 * The most SQL statements a check-in write may send: the session with its user (1), the athlete
 * with what the policy needs (1), the write (1), plus a food lookup for a meal from the team's
 * foods and one spare. Counted on the query runner, so BEGIN and COMMIT count too.
 */
const MAX_STATEMENTS = 5;

/**
 * A meal of foods writes its items beside its row, in one transaction: BEGIN, the meal, one insert
 * of all its items and COMMIT, with one read of the team's foods among them, whatever their number:
 * 7 at most (a meal of one food took 5 before meals held several foods).
 */
const MAX_FOODS_MEAL_STATEMENTS = 7;

let t: TestApp;
let me: CreatedAthlete;
let agent: Awaited<ReturnType<typeof signedIn>>;
let base: string;

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
  base = `/api/athletes/${me.athlete.id}/days/${TODAY}`;
});

/** The statements one request sends, and its response. */
async function measured(send: () => Promise<{ status: number; body: { data: unknown } }>) {
  let res: { status: number; body: { data: unknown } } | undefined;
  const statements = await countStatements(t.dataSource, async () => {
    res = await send();
  });
  return { res: res!, statements };
}

describe('a check-in write', () => {
  it('creates a fluid entry in at most 5 statements and answers with the entry', async () => {
    const body = fluidBody({ volume: 750 });
    const { res, statements } = await measured(() => agent.post(`${base}/fluids`).send(body));
    expect(res.status).toBe(201);
    expect(statements.length, statements.join('\n')).toBeLessThanOrEqual(MAX_STATEMENTS);
    expect(fluidView.strict().parse(res.body.data)).toMatchObject({
      clientId: body.clientId,
      volumeMl: 750,
      time: '08:00',
    });
    expect(await countRows(t.dataSource, 'fluid_entries')).toBe(1);
  });

  it('answers a repeated client id with the first entry, still within 5 statements', async () => {
    const body = fluidBody();
    const first = await agent.post(`${base}/fluids`).send(body).expect(201);
    const { res, statements } = await measured(() =>
      agent.post(`${base}/fluids`).send({ ...body, volume: 900 }),
    );
    expect(res.status).toBe(200);
    expect(res.body.data).toEqual(first.body.data);
    expect(statements.length, statements.join('\n')).toBeLessThanOrEqual(MAX_STATEMENTS);
    expect(await countRows(t.dataSource, 'fluid_entries')).toBe(1);
  });

  it('creates and then replaces the weigh-in in at most 5 statements each', async () => {
    const created = await measured(() => agent.put(`${base}/weigh-in`).send(weighInBody({ weight: 72.4 })));
    expect(created.res.status).toBe(200);
    expect(created.statements.length, created.statements.join('\n')).toBeLessThanOrEqual(MAX_STATEMENTS);
    expect(weighInView.strict().parse(created.res.body.data)).toMatchObject({ weightKg: 72.4 });

    const replaced = await measured(() =>
      agent.put(`${base}/weigh-in`).send(weighInBody({ weight: 160, unit: 'lb', time: '07:30' })),
    );
    expect(replaced.res.status).toBe(200);
    expect(replaced.statements.length, replaced.statements.join('\n')).toBeLessThanOrEqual(MAX_STATEMENTS);
    // 160 lb × 0.45359237 kg/lb (the international pound, 1959 agreement; NIST SP 811 B.8).
    expect((replaced.res.body.data as { weightKg: number }).weightKg).toBeCloseTo(72.5747792, 6);
    expect(replaced.res.body.data).toMatchObject({ entered: { value: 160, unit: 'lb' }, time: '07:30' });
    expect(await countRows(t.dataSource, 'weigh_ins')).toBe(1);
  });

  it('creates a meal of typed macros in at most 5 statements, a meal of foods in at most 7', async () => {
    const typed = await measured(() => agent.post(`${base}/meals`).send(macroMealBody()));
    expect(typed.res.status).toBe(201);
    expect(typed.statements.length, typed.statements.join('\n')).toBeLessThanOrEqual(MAX_STATEMENTS);
    // 40 g protein × 4 + 60 g carbohydrate × 4 + 15 g fat × 9 = 535 kcal (Atwater general factors,
    // FAO Food and Nutrition Paper 77, 2003).
    expect(mealView.strict().parse(typed.res.body.data).energyKcal).toBeCloseTo(535, 9);

    const teamFood = await t.dataSource.getRepository(Food).save({
      teamId: me.athlete.teamId,
      name: 'Overnight oats',
      proteinG: 10,
      carbohydrateG: 50,
      fatG: 5,
      fibreG: null,
      alcoholG: null,
      sodiumMg: null,
      createdById: null,
    });
    const items = [
      { foodId: 'ifct:A001', quantityG: 150 },
      { foodId: 'dm:egg-whole-raw', portions: 2, portionUnit: 'large' },
      { foodId: teamFood.id, quantityG: 200 },
    ];
    const food = await measured(() => agent.post(`${base}/meals`).send(foodsMealBody(items)));
    expect(food.res.status).toBe(201);
    expect(food.statements.length, food.statements.join('\n')).toBeLessThanOrEqual(MAX_FOODS_MEAL_STATEMENTS);
    expect(
      mealView
        .strict()
        .parse(food.res.body.data)
        .items.map((i) => [i.foodId, i.quantityG]),
    ).toEqual([
      ['ifct:A001', 150],
      ['dm:egg-whole-raw', 100],
      [teamFood.id, 200],
    ]);
    expect(await countRows(t.dataSource, 'meal_entries')).toBe(2);
    expect(await countRows(t.dataSource, 'meal_entry_items')).toBe(3);
  });

  it('no longer recomputes the day view: no plan or flag is read by a fluid create', async () => {
    const { statements } = await measured(() => agent.post(`${base}/fluids`).send(fluidBody()));
    expect(statements.join('\n')).not.toMatch(/plan_versions|athlete_flags|weigh_ins|meal_entries/);
  });
});
