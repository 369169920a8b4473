import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Athlete } from '../../api/src/entities/athlete.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { countRows, fluidBody, macroMealBody, weighInBody } from './check-ins-helpers.js';
import { planContent, safeTargets } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { insertVersion } from './trend-helpers.js';

// Tuesday 1 December 2026, 11:00 in Madrid.
const now = new Date('2026-12-01T10:00:00Z');

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

let coach: User;
let owner: User;
let me: CreatedAthlete;
let coachAgent: Awaited<ReturnType<typeof signedIn>>;
let athleteAgent: Awaited<ReturnType<typeof signedIn>>;
let base: string;

beforeEach(async () => {
  await t.reset();
  owner = await createOwner(t.dataSource);
  // The coach reads in lb and fl oz; the athlete logs in kg and mL.
  coach = await createCoach(t.dataSource, { teamId: owner.teamId, weightUnit: 'lb', volumeUnit: 'floz' });
  me = await createAthlete(t.dataSource, {
    coach,
    user: { timeZone: 'Europe/Madrid', name: 'Ana "Bea", Costa' },
    athlete: { goal: 'lose' },
  });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  athleteAgent = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
  await insertVersion(t.dataSource, {
    athleteId: me.athlete.id,
    coachId: coach.id,
    effectiveFrom: '2026-11-01',
    content: planContent({
      dates: [
        {
          date: '2026-11-29',
          label: 'Cut-off practice',
          countdownOffset: null,
          targets: safeTargets({ fluidCutoff: { time: '18:00', allowanceMl: 250 } }),
        },
      ],
    }),
  });
  for (const [date, weight] of [
    ['2026-11-28', 80],
    ['2026-11-30', 79.5],
  ] as const) {
    expect(
      (await athleteAgent.put(`${base}/days/${date}/weigh-in`).send(weighInBody({ weight }))).status,
    ).toBe(200);
  }
  // 30 Nov: 40·4 + 60·4 + 15·9 = 535 kcal (Atwater) and 500 mL of water.
  expect((await athleteAgent.post(`${base}/days/2026-11-30/meals`).send(macroMealBody())).status).toBe(201);
  expect((await athleteAgent.post(`${base}/days/2026-11-30/fluids`).send(fluidBody())).status).toBe(201);
});

type Row = Record<string, string>;
async function csv(agent: typeof coachAgent, from = '2026-11-28', to = '2026-11-30') {
  const res = await agent.get(`${base}/days.csv?from=${from}&to=${to}`);
  expect(res.status).toBe(200);
  return { res, rows: parse(res.text, { columns: true, bom: true }) as Row[] };
}

describe('GET /api/athletes/:id/days.csv', () => {
  it('has a header row and one row per day in the viewer’s units, parsed back by csv-parse', async () => {
    const { res, rows } = await csv(coachAgent);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toBe(
      'attachment; filename="driftmark-ana-bea-costa-2026-11-28-to-2026-11-30.csv"',
    );
    // RFC 4180: CRLF after every record.
    expect(res.text.split('\r\n')).toHaveLength(5);
    expect(rows.map((r) => r.Date)).toEqual(['2026-11-28', '2026-11-29', '2026-11-30']);
    const [d28, d29, d30] = rows as [Row, Row, Row];
    expect(Object.keys(d28)).toEqual(
      expect.arrayContaining([
        'Weight (lb)',
        'Trend (lb)',
        'Fluids (fl oz)',
        'Target water (fl oz)',
        'Drift: Energy',
      ]),
    );
    // 80 kg / 0.45359237 = 176.37 lb; 79.5 kg = 175.27 lb.
    expect(d28['Weight (lb)']).toBe('176.37');
    expect(d29['Weight (lb)']).toBe('');
    expect(d29['Trend (lb)']).toBe('176.37');
    expect(d30['Weight (lb)']).toBe('175.27');
    // Trend 80 + 0.1·(79.5 − 80) = 79.95 kg = 176.26 lb.
    expect(d30['Trend (lb)']).toBe('176.26');
    expect(d30['Energy (kcal)']).toBe('535');
    expect(d30['Protein (g)']).toBe('40');
    // 500 mL / 29.5735 = 16.9 fl oz; target 3000 mL = 101.4 fl oz.
    expect(d30['Fluids (fl oz)']).toBe('16.9');
    expect(d30['Target water (fl oz)']).toBe('101.4');
    expect(d30['Target energy (kcal)']).toBe('2000');
    expect(d30['Plan version']).toBe('1');
    expect(d30['Drift: Energy']).toBe('Off plan');
    expect(d28['Drift: Energy']).toBe('Not logged');
    expect(d29['Fluid cut-off']).toBe('18:00');
    expect(d29['Cut-off allowance (fl oz)']).toBe('8.5');
  });

  it('gives the athlete their own units (kg, mL)', async () => {
    const { rows } = await csv(athleteAgent);
    expect(rows[0]!['Weight (kg)']).toBe('80');
    expect(rows[2]!['Fluids (mL)']).toBe('500');
  });

  it('answers 404 to staff who cannot read the athlete and 400 to a bad range', async () => {
    const stranger = await createAssistant(t.dataSource, { teamId: owner.teamId });
    const agent = await signedIn(t.app, stranger.email, FACTORY_PASSWORD);
    expect((await agent.get(`${base}/days.csv?from=2026-11-28&to=2026-11-30`)).status).toBe(404);
    expect((await coachAgent.get(`${base}/days.csv?from=2026-11-30&to=2026-11-28`)).status).toBe(400);
  });
});

describe('POST /api/athletes/:id/end-coaching', () => {
  it('ends the coaching: the athlete still reads and exports, logging is refused', async () => {
    const res = await coachAgent.post(`${base}/end-coaching`);
    expect(res.status).toBe(200);
    expect(res.body.data.status).toBe('ended');
    expect((await t.dataSource.getRepository(Athlete).findOneByOrFail({ id: me.athlete.id })).status).toBe(
      'ended',
    );

    const weighIns = await countRows(t.dataSource, 'weigh_ins');
    const refused = await athleteAgent.put(`${base}/days/2026-12-01/weigh-in`).send(weighInBody());
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/coaching has ended/i);
    expect(await countRows(t.dataSource, 'weigh_ins')).toBe(weighIns);

    const day = await athleteAgent.get(`${base}/days/2026-11-30`);
    expect(day.status).toBe(200);
    expect(day.body.abilities.log).toBe(false);
    const profile = await athleteAgent.get(base);
    expect(profile.body.abilities).toMatchObject({ log: false, endCoaching: false });
    expect((await csv(athleteAgent)).rows).toHaveLength(3);
    expect((await coachAgent.post(`${base}/end-coaching`)).status).toBe(409);
  });

  it('is refused to the athlete and to shared staff (403), unrelated staff get 404', async () => {
    const helper = await createAssistant(t.dataSource, { teamId: owner.teamId });
    await shareAthlete(t.dataSource, me.athlete, helper, coach);
    const helperAgent = await signedIn(t.app, helper.email, FACTORY_PASSWORD);
    expect((await helperAgent.post(`${base}/end-coaching`)).status).toBe(403);
    expect((await coachAgent.get(base)).body.abilities.endCoaching).toBe(true);
    const athleteTry = await athleteAgent.post(`${base}/end-coaching`);
    expect(athleteTry.status).toBe(403);
    const stranger = await createAssistant(t.dataSource, { teamId: owner.teamId });
    const agent = await signedIn(t.app, stranger.email, FACTORY_PASSWORD);
    expect((await agent.post(`${base}/end-coaching`)).status).toBe(404);
    expect((await t.dataSource.getRepository(Athlete).findOneByOrFail({ id: me.athlete.id })).status).toBe(
      'active',
    );
  });
});
