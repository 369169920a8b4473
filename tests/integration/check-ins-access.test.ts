import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import {
  checkInRows,
  eveningBody,
  fluidBody,
  macroMealBody,
  supplementBody,
  symptomBody,
  weighInBody,
} from './check-ins-helpers.js';
import { browser, buildTestApp, signedIn, type TestApp } from './setup/app.js';

const now = new Date('2026-12-01T20:00:00Z');
const DAY = '2026-12-01';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

interface World {
  owner: User;
  coach: User;
  otherCoach: User;
  sharedAssistant: User;
  assistant: User;
  athlete: CreatedAthlete;
  otherAthlete: CreatedAthlete;
  outsiderCoach: User;
  outsiderOwner: User;
  /** Ids of one entry of each kind, logged by the athlete. */
  entries: Record<'fluids' | 'meals' | 'supplements' | 'symptoms', string>;
}

let w: World;
beforeEach(async () => {
  await t.reset();
  const owner = await createOwner(t.dataSource);
  const teamId = owner.teamId;
  const coach = await createCoach(t.dataSource, { teamId });
  const otherCoach = await createCoach(t.dataSource, { teamId });
  const sharedAssistant = await createAssistant(t.dataSource, { teamId });
  const assistant = await createAssistant(t.dataSource, { teamId });
  const athlete = await createAthlete(t.dataSource, { coach });
  const otherAthlete = await createAthlete(t.dataSource, { coach });
  await shareAthlete(t.dataSource, athlete.athlete, sharedAssistant, coach);
  const outsiderOwner = await createOwner(t.dataSource);
  const outsiderCoach = await createCoach(t.dataSource, { teamId: outsiderOwner.teamId });

  const self = await signedIn(t.app, athlete.user.email, FACTORY_PASSWORD);
  const base = `/api/athletes/${athlete.athlete.id}/days/${DAY}`;
  await self.put(`${base}/weigh-in`).send(weighInBody());
  await self.put(`${base}/evening`).send(eveningBody());
  const fluid = await self.post(`${base}/fluids`).send(fluidBody());
  const meal = await self.post(`${base}/meals`).send(macroMealBody());
  const supplement = await self.post(`${base}/supplements`).send(supplementBody());
  const symptom = await self.post(`${base}/symptoms`).send(symptomBody(['dizziness']));
  const entries = {
    fluids: fluid.body.data.id,
    meals: meal.body.data.id,
    supplements: supplement.body.data.id,
    symptoms: symptom.body.data.id,
  };
  w = {
    owner,
    coach,
    otherCoach,
    sharedAssistant,
    assistant,
    athlete,
    otherAthlete,
    outsiderCoach,
    outsiderOwner,
    entries,
  };
});

type Agent = Awaited<ReturnType<typeof signedIn>>;
const as = (user: User) => signedIn(t.app, user.email, FACTORY_PASSWORD);

/** Every check-in route on the athlete, as [label, request]. */
function reads(agent: Agent) {
  const a = `/api/athletes/${w.athlete.athlete.id}`;
  return [
    ['GET day', () => agent.get(`${a}/days/${DAY}`)],
    ['GET history', () => agent.get(`${a}/days?from=2026-11-01&to=${DAY}`)],
  ] as const;
}

function writes(agent: Agent) {
  const a = `/api/athletes/${w.athlete.athlete.id}`;
  const d = `${a}/days/${DAY}`;
  const e = w.entries;
  return [
    ['PUT weigh-in', () => agent.put(`${d}/weigh-in`).send(weighInBody({ weight: 60 }))],
    ['DELETE weigh-in', () => agent.delete(`${d}/weigh-in`)],
    ['PUT evening', () => agent.put(`${d}/evening`).send({ steps: 1 })],
    ['DELETE evening', () => agent.delete(`${d}/evening`)],
    ['POST fluid', () => agent.post(`${d}/fluids`).send(fluidBody())],
    ['PATCH fluid', () => agent.patch(`${a}/fluids/${e.fluids}`).send({ volume: 100 })],
    ['DELETE fluid', () => agent.delete(`${a}/fluids/${e.fluids}`)],
    ['POST meal', () => agent.post(`${d}/meals`).send(macroMealBody())],
    ['PATCH meal', () => agent.patch(`${a}/meals/${e.meals}`).send({ proteinG: 1 })],
    ['DELETE meal', () => agent.delete(`${a}/meals/${e.meals}`)],
    ['POST supplement', () => agent.post(`${d}/supplements`).send(supplementBody())],
    ['PATCH supplement', () => agent.patch(`${a}/supplements/${e.supplements}`).send({ dose: 1 })],
    ['DELETE supplement', () => agent.delete(`${a}/supplements/${e.supplements}`)],
    ['POST symptom', () => agent.post(`${d}/symptoms`).send(symptomBody(['fainting']))],
    ['PATCH symptom', () => agent.patch(`${a}/symptoms/${e.symptoms}`).send({ note: 'x' })],
    ['DELETE symptom', () => agent.delete(`${a}/symptoms/${e.symptoms}`)],
  ] as const;
}

describe('actors who may not read the athlete', () => {
  const cases: [string, (w: World) => User][] = [
    ['another athlete of the team', (w) => w.otherAthlete.user],
    ['a coach of the team who is neither assigned nor shared', (w) => w.otherCoach],
    ['an assistant without the share', (w) => w.assistant],
    ['a coach of another team', (w) => w.outsiderCoach],
    ['the owner of another team', (w) => w.outsiderOwner],
  ];

  it.each(cases)('%s gets 404 on every route and no row changes', async (_label, who) => {
    const before = await checkInRows(t.dataSource);
    const agent = await as(who(w));
    for (const [label, send] of [...reads(agent), ...writes(agent)]) {
      const res = await send();
      expect(res.status, label).toBe(404);
      expect(res.body.error.code, label).toBe('not_found');
    }
    expect(await checkInRows(t.dataSource)).toEqual(before);
  });

  it('signed out, every route answers 401', async () => {
    const agent = browser(t.app);
    for (const [label, send] of [...reads(agent), ...writes(agent)]) {
      expect((await send()).status, label).toBe(401);
    }
  });
});

describe('staff who may read the athlete', () => {
  const cases: [string, (w: World) => User][] = [
    ['the assigned coach', (w) => w.coach],
    ['the assistant it is shared with', (w) => w.sharedAssistant],
    ['the owner of the team', (w) => w.owner],
  ];

  it.each(cases)(
    '%s reads the day and history but gets 403 on every write, no row changes',
    async (_l, who) => {
      const agent = await as(who(w));
      const [dayRes, historyRes] = await Promise.all(reads(agent).map(([, send]) => send()));
      expect(dayRes!.status).toBe(200);
      expect(dayRes!.body.abilities).toEqual({ log: false });
      expect(dayRes!.body.data.weighIn).not.toBeNull();
      expect(dayRes!.body.data.fluids).toHaveLength(1);
      expect(dayRes!.body.data.flags).toHaveLength(1);
      expect(historyRes!.status).toBe(200);
      expect(historyRes!.body.data).toHaveLength(1);

      const before = await checkInRows(t.dataSource);
      for (const [label, send] of writes(agent)) {
        const res = await send();
        expect(res.status, label).toBe(403);
        expect(res.body.error.code, label).toBe('forbidden');
      }
      expect(await checkInRows(t.dataSource)).toEqual(before);
    },
  );
});

describe('the athlete', () => {
  it('may use every route on their own days', async () => {
    const agent = await as(w.athlete.user);
    for (const [label, send] of reads(agent)) expect((await send()).status, label).toBe(200);
    for (const [label, send] of writes(agent))
      expect([200, 201, 204], label).toContain((await send()).status);
  });
});
