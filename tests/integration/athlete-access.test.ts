import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Athlete } from '../../api/src/entities/athlete.entity.js';
import { AthleteShare } from '../../api/src/entities/athlete-share.entity.js';
import { Consent } from '../../api/src/entities/consent.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(() => t.close());

interface World {
  owner: User;
  coach: User;
  otherCoach: User;
  assistant: User;
  otherAssistant: User;
  athlete: CreatedAthlete;
  otherAthlete: CreatedAthlete;
  outsider: User;
}

let w: World;
beforeEach(async () => {
  await t.reset();
  const owner = await createOwner(t.dataSource);
  const teamId = owner.teamId;
  const coach = await createCoach(t.dataSource, { teamId });
  const otherCoach = await createCoach(t.dataSource, { teamId });
  const assistant = await createAssistant(t.dataSource, { teamId });
  const otherAssistant = await createAssistant(t.dataSource, { teamId });
  const athlete = await createAthlete(t.dataSource, { coach, user: { name: 'Zoe Assigned' } });
  const otherAthlete = await createAthlete(t.dataSource, {
    coach: owner,
    user: { name: 'Ada Owners' },
    athlete: { eventDate: null, eventType: 'none' },
  });
  const outsider = await createOwner(t.dataSource);
  w = { owner, coach, otherCoach, assistant, otherAssistant, athlete, otherAthlete, outsider };
});

const as = (user: User) => signedIn(t.app, user.email, FACTORY_PASSWORD);

async function snapshot(athleteId: string) {
  const athlete = await t.dataSource.getRepository(Athlete).findOneByOrFail({ id: athleteId });
  const shares = await t.dataSource.getRepository(AthleteShare).findBy({ athleteId });
  const consents = await t.dataSource.getRepository(Consent).countBy({ userId: athlete.userId });
  return { athlete, shares: shares.map((s) => s.userId).sort(), consents };
}

const intake = {
  sex: 'male',
  birthDate: '1990-01-01',
  heightCm: 180,
  currentWeightKg: 78,
  usualWaterMl: 3000,
  usualEnergyKcal: 2600,
  goal: 'maintain',
  eventType: 'none',
  timeZone: 'Europe/Oslo',
  weightUnit: 'kg',
  volumeUnit: 'ml',
  photoConsent: false,
  safetyAcknowledged: true,
};

describe('another team', () => {
  it('gets 404 for the athlete on every route and no row changes', async () => {
    const id = w.athlete.athlete.id;
    const before = await snapshot(id);
    const agent = await as(w.outsider);
    for (const res of [
      await agent.get(`/api/athletes/${id}`),
      await agent.put(`/api/athletes/${id}/intake`).send(intake),
      await agent.post(`/api/athletes/${id}/shares`).send({ userId: w.outsider.id }),
      await agent.delete(`/api/athletes/${id}/shares/${w.assistant.id}`),
    ]) {
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await agent.get('/api/roster')).body.data).toEqual([]);
    expect(await snapshot(id)).toEqual(before);
  });
});

describe('within the team', () => {
  it('an assistant without a share sees nothing', async () => {
    const agent = await as(w.assistant);
    expect((await agent.get('/api/roster')).body.data).toEqual([]);
    expect((await agent.get(`/api/athletes/${w.athlete.athlete.id}`)).status).toBe(404);
  });

  it('an assistant with a share sees the athlete, may not share or delete it', async () => {
    await shareAthlete(t.dataSource, w.athlete.athlete, w.assistant, w.coach);
    const agent = await as(w.assistant);
    const roster = await agent.get('/api/roster');
    expect(roster.body.data.map((r: { athleteId: string }) => r.athleteId)).toEqual([w.athlete.athlete.id]);
    const res = await agent.get(`/api/athletes/${w.athlete.athlete.id}`);
    expect(res.status).toBe(200);
    expect(res.body.abilities).toEqual({
      update: true,
      delete: false,
      share: false,
      log: false,
      endCoaching: false,
      plan: true,
    });

    const before = await snapshot(w.athlete.athlete.id);
    const share = await agent
      .post(`/api/athletes/${w.athlete.athlete.id}/shares`)
      .send({ userId: w.otherAssistant.id });
    expect(share.status).toBe(403);
    expect(share.body.error.code).toBe('forbidden');
    // Intake is the athlete's own form: staff who can read get 403, not 404.
    expect((await agent.put(`/api/athletes/${w.athlete.athlete.id}/intake`).send(intake)).status).toBe(403);
    expect(await snapshot(w.athlete.athlete.id)).toEqual(before);
  });

  it('a coach sees assigned and shared athletes, not the others', async () => {
    const agent = await as(w.coach);
    expect((await agent.get('/api/roster')).body.data.map((r: { name: string }) => r.name)).toEqual([
      'Zoe Assigned',
    ]);
    expect((await agent.get(`/api/athletes/${w.otherAthlete.athlete.id}`)).status).toBe(404);
    await shareAthlete(t.dataSource, w.otherAthlete.athlete, w.coach, w.owner);
    expect((await agent.get(`/api/athletes/${w.otherAthlete.athlete.id}`)).status).toBe(200);
    const other = await as(w.otherCoach);
    expect((await other.get('/api/roster')).body.data).toEqual([]);
    expect((await other.get(`/api/athletes/${w.athlete.athlete.id}`)).status).toBe(404);
  });

  it('the owner sees the whole team, soonest event first and athletes without an event last', async () => {
    const agent = await as(w.owner);
    const roster = await agent.get('/api/roster');
    expect(roster.body.data.map((r: { name: string }) => r.name)).toEqual(['Zoe Assigned', 'Ada Owners']);
    expect(roster.body.data[1].daysToEvent).toBeNull();
    const res = await agent.get(`/api/athletes/${w.athlete.athlete.id}`);
    expect(res.body.abilities).toEqual({
      update: true,
      delete: true,
      share: true,
      log: false,
      endCoaching: true,
      plan: true,
    });
  });

  it('another athlete of the team gets 404', async () => {
    const agent = await as(w.otherAthlete.user);
    expect((await agent.get(`/api/athletes/${w.athlete.athlete.id}`)).status).toBe(404);
    expect((await agent.get('/api/roster')).status).toBe(403);
  });

  it('the athlete reads their own profile with log ability and completes intake', async () => {
    const agent = await as(w.athlete.user);
    const res = await agent.get(`/api/athletes/${w.athlete.athlete.id}`);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      id: w.athlete.athlete.id,
      email: w.athlete.user.email,
      coach: { id: w.coach.id },
    });
    expect(res.body.abilities).toEqual({
      update: true,
      delete: false,
      share: false,
      log: true,
      endCoaching: false,
      plan: false,
    });
    const done = await agent.put(`/api/athletes/${w.athlete.athlete.id}/intake`).send(intake);
    expect(done.status).toBe(200);
    expect(done.body.data).toMatchObject({
      eventType: 'none',
      eventDate: null,
      eventName: null,
      timeZone: 'Europe/Oslo',
      photoConsent: false,
    });
  });

  it('intake errors are named by field', async () => {
    const agent = await as(w.athlete.user);
    const url = `/api/athletes/${w.athlete.athlete.id}/intake`;
    const plain = await agent.put(url).send({ ...intake, heightCm: 40, safetyAcknowledged: false });
    expect(plain.status).toBe(400);
    expect(Object.keys(plain.body.error.fields).sort()).toEqual(['heightCm', 'safetyAcknowledged']);
    // Cross-field rules (zod refinements) run once every field is valid on its own.
    const event = await agent.put(url).send({ ...intake, eventType: 'weigh_in' });
    expect(event.status).toBe(400);
    expect(Object.keys(event.body.error.fields).sort()).toEqual([
      'eventDate',
      'eventTimeZone',
      'weighInLimitKg',
    ]);
    expect((await snapshot(w.athlete.athlete.id)).consents).toBe(0);
  });
});

describe('shares', () => {
  it('the assigned coach shares with an assistant and takes the share back', async () => {
    const id = w.athlete.athlete.id;
    const agent = await as(w.coach);
    expect((await agent.post(`/api/athletes/${id}/shares`).send({ userId: w.assistant.id })).status).toBe(
      204,
    );
    // Idempotent.
    expect((await agent.post(`/api/athletes/${id}/shares`).send({ userId: w.assistant.id })).status).toBe(
      204,
    );
    expect((await snapshot(id)).shares).toEqual([w.assistant.id]);
    const assistant = await as(w.assistant);
    expect((await assistant.get(`/api/athletes/${id}`)).status).toBe(200);

    expect((await agent.delete(`/api/athletes/${id}/shares/${w.assistant.id}`)).status).toBe(204);
    expect((await snapshot(id)).shares).toEqual([]);
    expect((await assistant.get(`/api/athletes/${id}`)).status).toBe(404);
  });

  it('refuses sharing with someone outside the team, an athlete or the assigned coach', async () => {
    const id = w.athlete.athlete.id;
    const agent = await as(w.owner);
    for (const userId of [w.outsider.id, w.otherAthlete.user.id, w.coach.id]) {
      const res = await agent.post(`/api/athletes/${id}/shares`).send({ userId });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.userId).toBeDefined();
    }
    expect((await snapshot(id)).shares).toEqual([]);
  });
});

describe('team members', () => {
  it('lists the staff for staff, owner first; an athlete gets 403', async () => {
    const agent = await as(w.assistant);
    const res = await agent.get('/api/team/members');
    expect(res.status).toBe(200);
    expect(res.body.data).toHaveLength(5);
    expect(res.body.data[0]).toEqual({
      id: w.owner.id,
      name: w.owner.name,
      email: w.owner.email,
      role: 'owner',
    });
    expect(res.body.data.map((m: { role: string }) => m.role)).toEqual([
      'owner',
      'coach',
      'coach',
      'assistant',
      'assistant',
    ]);
    expect((await (await as(w.athlete.user)).get('/api/team/members')).status).toBe(403);
  });
});
