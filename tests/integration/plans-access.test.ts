import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { PlanRepository } from '../../api/src/repositories/plan.repository.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { planContent, planRows, templateBody, versionBody } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

const now = new Date('2026-12-01T10:00:00Z');
const TODAY = '2026-12-01';

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
  versionId: string;
  templateId: string;
}
let w: World;

beforeEach(async () => {
  await t.reset();
  const owner = await createOwner(t.dataSource);
  const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  const otherCoach = await createCoach(t.dataSource, { teamId: owner.teamId });
  const sharedAssistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  const athlete = await createAthlete(t.dataSource, { coach });
  const otherAthlete = await createAthlete(t.dataSource, { coach });
  await shareAthlete(t.dataSource, athlete.athlete, sharedAssistant);
  const outsiderOwner = await createOwner(t.dataSource);
  const outsiderCoach = await createCoach(t.dataSource, { teamId: outsiderOwner.teamId });
  // A version with a countdown, so the move route has something to move.
  const version = await new PlanRepository(t.dataSource.manager).insertVersion({
    athleteId: athlete.athlete.id,
    effectiveFrom: TODAY,
    reason: 'Starting plan',
    content: planContent({
      dates: [
        {
          date: '2026-12-05',
          label: 'Show day',
          countdownOffset: 0,
          targets: planContent().dayTypes[0]!.targets,
        },
      ],
      countdown: { templateId: null, templateName: 'Show week', eventDate: '2026-12-05', eventType: 'show' },
    }),
    baseline: { usualWaterMl: 2500, usualEnergyKcal: 2100, weightKg: null, sex: 'female' },
    createdById: coach.id,
    acknowledgements: [],
  });
  const coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  const template = await coachAgent.post('/api/countdown-templates').send(
    templateBody({
      // No g/kg day: the factory athlete has no weigh-ins.
      days: [{ offset: 0, label: 'Show day', targets: planContent().dayTypes[0]!.targets }],
    }),
  );
  expect(template.status).toBe(201);
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
    versionId: version.id,
    templateId: template.body.data.id,
  };
});

type Agent = Awaited<ReturnType<typeof signedIn>>;
type Call = { name: string; write: boolean; send: (agent: Agent) => Promise<{ status: number }> };

/** Every plan route on the athlete, each with a body that would succeed for an allowed actor. */
function athleteRoutes(): Call[] {
  const base = `/api/athletes/${w.athlete.athlete.id}`;
  return [
    { name: 'GET plan', write: false, send: (a) => a.get(`${base}/plan`) },
    { name: 'GET version', write: false, send: (a) => a.get(`${base}/plan/versions/${w.versionId}`) },
    {
      name: 'POST check',
      write: true,
      send: (a) => a.post(`${base}/plan/check`).send({ effectiveFrom: TODAY, content: planContent() }),
    },
    {
      name: 'POST version',
      write: true,
      send: (a) => a.post(`${base}/plan/versions`).send(versionBody(TODAY)),
    },
    {
      name: 'POST countdown preview',
      write: true,
      send: (a) =>
        a
          .post(`${base}/plan/countdown`)
          .send({ templateId: w.templateId, eventDate: '2026-12-06', preview: true }),
    },
    {
      name: 'POST countdown',
      write: true,
      send: (a) =>
        a.post(`${base}/plan/countdown`).send({ templateId: w.templateId, eventDate: '2026-12-06' }),
    },
    {
      name: 'POST countdown move preview',
      write: true,
      send: (a) => a.post(`${base}/plan/countdown/move`).send({ eventDate: '2026-12-07', preview: true }),
    },
    {
      name: 'POST countdown move',
      write: true,
      send: (a) => a.post(`${base}/plan/countdown/move`).send({ eventDate: '2026-12-07' }),
    },
  ];
}

const patchEvent = (a: Agent) =>
  a.patch(`/api/athletes/${w.athlete.athlete.id}/event`).send({ eventDate: '2026-12-09' });

async function expectEvery(agent: Agent, expected: (call: Call) => number) {
  const before = await planRows(t.dataSource);
  for (const call of athleteRoutes()) {
    const res = await call.send(agent);
    expect(res.status, call.name).toBe(expected(call));
  }
  expect(await planRows(t.dataSource)).toEqual(before);
}

describe('plan routes: who may not', () => {
  const unrelated: [string, (w: World) => { email: string }][] = [
    ['another athlete of the team', (x) => x.otherAthlete.user],
    ['a coach of the team who is neither assigned nor shared', (x) => x.otherCoach],
    ['an assistant without the share', (x) => x.assistant],
    ['a coach of another team', (x) => x.outsiderCoach],
    ['the owner of another team', (x) => x.outsiderOwner],
  ];

  it.each(unrelated)(
    '%s gets 404 on every route, PATCH event included, and no row changes',
    async (_name, who) => {
      const agent = await signedIn(t.app, who(w).email, FACTORY_PASSWORD);
      await expectEvery(agent, () => 404);
      const before = await planRows(t.dataSource);
      expect((await patchEvent(agent)).status).toBe(404);
      expect(await planRows(t.dataSource)).toEqual(before);
    },
  );

  it('the athlete reads their own plan but gets 403 on every plan write, no row changes', async () => {
    const agent = await signedIn(t.app, w.athlete.user.email, FACTORY_PASSWORD);
    await expectEvery(agent, (call) => (call.write ? 403 : 200));
  });

  it('another team’s coach cannot see the version through their own athlete', async () => {
    const theirAthlete = await createAthlete(t.dataSource, { coach: w.outsiderCoach });
    const agent = await signedIn(t.app, w.outsiderCoach.email, FACTORY_PASSWORD);
    const res = await agent.get(`/api/athletes/${theirAthlete.athlete.id}/plan/versions/${w.versionId}`);
    expect(res.status).toBe(404);
  });
});

describe('plan routes: who may', () => {
  it.each([
    ['the assigned coach', (x: World) => x.coach],
    ['the assistant the athlete is shared with', (x: World) => x.sharedAssistant],
    ['the owner of the team', (x: World) => x.owner],
  ])('%s may use every route', async (_name, who) => {
    const agent = await signedIn(t.app, who(w).email, FACTORY_PASSWORD);
    for (const call of athleteRoutes()) {
      const res = await call.send(agent);
      expect([200, 201], call.name).toContain(res.status);
    }
    expect((await patchEvent(agent)).status).toBe(200);
  });
});

describe('team guardrail floors', () => {
  const floors = { energyKcal: { female: 1300, male: 1600 }, waterMl: { female: 1700, male: 2100 } };

  it('staff read them; only the owner changes them; an athlete gets 403; no row changes', async () => {
    const before = await planRows(t.dataSource);
    for (const who of [w.coach, w.assistant]) {
      const agent = await signedIn(t.app, who.email, FACTORY_PASSWORD);
      expect((await agent.get('/api/team/guardrails')).status).toBe(200);
      expect((await agent.put('/api/team/guardrails').send(floors)).status).toBe(403);
    }
    const athlete = await signedIn(t.app, w.athlete.user.email, FACTORY_PASSWORD);
    expect((await athlete.get('/api/team/guardrails')).status).toBe(403);
    expect((await athlete.put('/api/team/guardrails').send(floors)).status).toBe(403);
    expect(await planRows(t.dataSource)).toEqual(before);

    // Another team's owner changes only their own team's floors.
    const outsider = await signedIn(t.app, w.outsiderOwner.email, FACTORY_PASSWORD);
    expect((await outsider.put('/api/team/guardrails').send(floors)).status).toBe(200);
    const coach = await signedIn(t.app, w.coach.email, FACTORY_PASSWORD);
    expect((await coach.get('/api/team/guardrails')).body.data).not.toEqual(floors);
    const owner = await signedIn(t.app, w.owner.email, FACTORY_PASSWORD);
    expect((await owner.get('/api/team/guardrails')).body.abilities).toEqual({ manage: true });
  });
});
