import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { CONSENTS } from '@driftmark/shared';
import { todayIn } from '../../api/src/lib/dates.js';
import { Athlete } from '../../api/src/entities/athlete.entity.js';
import { Consent } from '../../api/src/entities/consent.entity.js';
import { Invitation } from '../../api/src/entities/invitation.entity.js';
import { User } from '../../api/src/entities/user.entity.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { browser, buildTestApp, sessionCookieLine, signedIn, type TestApp } from './setup/app.js';
import { outboxFor, tokenFromMail } from './setup/outbox.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(() => t.close());
beforeEach(() => t.reset());

function addDays(date: string, days: number): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

const intake = (overrides: Record<string, unknown> = {}) => ({
  sex: 'female',
  birthDate: '1996-02-29',
  heightCm: 166,
  currentWeightKg: 61,
  usualWaterMl: 2800,
  usualEnergyKcal: 2050,
  goal: 'lose',
  eventType: 'show',
  eventName: 'Harbour Classic',
  eventDate: addDays(todayIn('Pacific/Auckland'), 9),
  eventTime: '10:30',
  eventTimeZone: 'Pacific/Auckland',
  division: 'Figure',
  timeZone: 'Pacific/Auckland',
  weightUnit: 'kg',
  volumeUnit: 'ml',
  photoConsent: true,
  safetyAcknowledged: true,
  ...overrides,
});

async function invite(agent: ReturnType<typeof browser>, body: Record<string, unknown>) {
  return agent.post('/api/invitations').send(body);
}

async function latestInviteToken(email: string): Promise<string> {
  const mails = await outboxFor(t.dataSource, email);
  expect(mails.length).toBeGreaterThan(0);
  return tokenFromMail(mails.at(-1)!, t.config.appOrigin, 'invite');
}

describe('invitations end to end', () => {
  it('invite → e-mail in the outbox → lookup → accept → intake → roster', async () => {
    const owner = await createOwner(t.dataSource, { name: 'Head Coach' });
    const coachAgent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);

    const created = await invite(coachAgent, {
      email: 'New.Athlete@Example.test',
      name: 'Nia Athlete',
      role: 'athlete',
    });
    expect(created.status).toBe(201);
    expect(created.body.data).toMatchObject({
      email: 'new.athlete@example.test',
      name: 'Nia Athlete',
      role: 'athlete',
      invitedBy: { id: owner.id, name: 'Head Coach' },
    });
    const expiresIn = Date.parse(created.body.data.expiresAt) - Date.now();
    expect(expiresIn).toBeGreaterThan(6.9 * 86_400_000);
    expect(expiresIn).toBeLessThanOrEqual(7 * 86_400_000);

    const [mail] = await outboxFor(t.dataSource, 'new.athlete@example.test');
    expect(mail).toMatchObject({ kind: 'invitation', status: 'pending' });
    const token = tokenFromMail(mail!, t.config.appOrigin, 'invite');
    expect(mail!.textBody).toContain(`${t.config.appOrigin}/invite/${token}`);

    const list = await coachAgent.get('/api/invitations');
    expect(list.body.data.map((i: { id: string }) => i.id)).toEqual([created.body.data.id]);

    const preview = await request(t.app).get(`/api/invitations/lookup/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body.data).toMatchObject({
      email: 'new.athlete@example.test',
      name: 'Nia Athlete',
      role: 'athlete',
      inviterName: 'Head Coach',
    });

    const athleteAgent = browser(t.app);
    const accepted = await athleteAgent
      .post('/api/invitations/accept')
      .send({ token, name: 'Nia Tane', password: 'my-own-passphrase' });
    expect(accepted.status).toBe(201);
    expect(sessionCookieLine(accepted)).toMatch(/HttpOnly/);
    expect(accepted.body.data).toMatchObject({
      role: 'athlete',
      name: 'Nia Tane',
      intakeComplete: false,
      team: { id: owner.teamId },
    });
    const athleteId: string = accepted.body.data.athleteId;
    const athleteRow = await t.dataSource.getRepository(Athlete).findOneByOrFail({ id: athleteId });
    expect(athleteRow).toMatchObject({ status: 'intake_pending', coachId: owner.id, teamId: owner.teamId });
    const invitation = await t.dataSource
      .getRepository(Invitation)
      .findOneByOrFail({ id: created.body.data.id });
    expect(invitation.acceptedAt).not.toBeNull();
    expect(invitation.acceptedUserId).toBe(accepted.body.data.id);

    // Single use.
    expect((await request(t.app).get(`/api/invitations/lookup/${token}`)).status).toBe(410);
    expect(
      (
        await browser(t.app)
          .post('/api/invitations/accept')
          .send({ token, name: 'Again', password: 'my-own-passphrase' })
      ).status,
    ).toBe(410);
    expect((await coachAgent.get('/api/invitations')).body.data).toEqual([]);

    const roster1 = await coachAgent.get('/api/roster');
    expect(roster1.body.data).toEqual([
      expect.objectContaining({ athleteId, status: 'intake_pending', daysToEvent: null }),
    ]);

    const done = await athleteAgent.put(`/api/athletes/${athleteId}/intake`).send(intake());
    expect(done.status).toBe(200);
    expect(done.body.data).toMatchObject({
      id: athleteId,
      status: 'active',
      sex: 'female',
      birthDate: '1996-02-29',
      heightCm: 166,
      eventType: 'show',
      eventTimeZone: 'Pacific/Auckland',
      timeZone: 'Pacific/Auckland',
      units: { weight: 'kg', volume: 'ml' },
      photoConsent: true,
      coach: { id: owner.id, name: 'Head Coach' },
    });
    expect(done.body.data.intakeCompletedAt).toEqual(expect.any(String));

    const consents = await t.dataSource
      .getRepository(Consent)
      .find({ where: { userId: accepted.body.data.id }, order: { kind: 'ASC' } });
    expect(consents.map((c) => [c.kind, c.version, c.granted])).toEqual([
      ['photo_consent', CONSENTS.photo_consent.version, true],
      ['safety_acknowledgement', CONSENTS.safety_acknowledgement.version, true],
    ]);
    expect(consents.every((c) => c.acceptedAt instanceof Date)).toBe(true);

    const me = await athleteAgent.get('/api/me');
    expect(me.body.data).toMatchObject({ intakeComplete: true, timeZone: 'Pacific/Auckland' });

    const roster2 = await coachAgent.get('/api/roster');
    expect(roster2.body.data).toEqual([
      expect.objectContaining({
        athleteId,
        name: 'Nia Tane',
        status: 'active',
        eventName: 'Harbour Classic',
        daysToEvent: 9,
        division: 'Figure',
      }),
    ]);
  });

  it('an owner can assign an invited athlete to another coach', async () => {
    const owner = await createOwner(t.dataSource);
    const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect(
      (
        await invite(agent, {
          email: 'assigned@example.test',
          name: 'Assigned',
          role: 'athlete',
          coachId: coach.id,
        })
      ).status,
    ).toBe(201);
    const token = await latestInviteToken('assigned@example.test');
    const accepted = await browser(t.app)
      .post('/api/invitations/accept')
      .send({ token, name: 'Assigned', password: 'my-own-passphrase' });
    const athlete = await t.dataSource
      .getRepository(Athlete)
      .findOneByOrFail({ id: accepted.body.data.athleteId });
    expect(athlete.coachId).toBe(coach.id);

    const coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    expect((await coachAgent.get('/api/roster')).body.data).toHaveLength(1);
  });

  it('invites staff: the new coach signs in with the owner’s team and an empty roster', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect(
      (await invite(agent, { email: 'second.coach@example.test', name: 'Second Coach', role: 'coach' }))
        .status,
    ).toBe(201);
    const token = await latestInviteToken('second.coach@example.test');
    const coach = browser(t.app);
    const accepted = await coach
      .post('/api/invitations/accept')
      .send({ token, name: 'Second Coach', password: 'my-own-passphrase' });
    expect(accepted.body.data).toMatchObject({
      role: 'coach',
      athleteId: null,
      intakeComplete: true,
      team: { id: owner.teamId },
    });
    expect((await coach.get('/api/roster')).body.data).toEqual([]);
    expect(await t.dataSource.getRepository(Athlete).count()).toBe(0);
  });
});

describe('who may invite whom', () => {
  it('a coach may invite athletes only, an assistant nobody, an athlete nobody', async () => {
    const owner = await createOwner(t.dataSource);
    const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
    const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
    const coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    const assistantAgent = await signedIn(t.app, assistant.email, FACTORY_PASSWORD);

    expect(
      (await invite(coachAgent, { email: 'a1@example.test', name: 'A One', role: 'athlete' })).status,
    ).toBe(201);
    const asCoach = await invite(coachAgent, { email: 'c1@example.test', name: 'C One', role: 'coach' });
    expect(asCoach.status).toBe(403);
    expect(asCoach.body.error.code).toBe('forbidden');
    expect(
      (await invite(coachAgent, { email: 'x1@example.test', name: 'X One', role: 'assistant' })).status,
    ).toBe(403);
    // A coach cannot hand an athlete to someone else.
    expect(
      (
        await invite(coachAgent, {
          email: 'a2@example.test',
          name: 'A Two',
          role: 'athlete',
          coachId: owner.id,
        })
      ).status,
    ).toBe(403);
    expect(
      (await invite(assistantAgent, { email: 'a3@example.test', name: 'A Three', role: 'athlete' })).status,
    ).toBe(403);

    expect(await t.dataSource.getRepository(Invitation).count()).toBe(1);
    expect(await outboxFor(t.dataSource, 'c1@example.test')).toHaveLength(0);
  });

  it('answers the same whether or not the address has an account, and mails the owner of it what to do', async () => {
    const owner = await createOwner(t.dataSource);
    const elsewhere = await createCoach(t.dataSource, { email: 'taken@example.test' });
    expect(elsewhere.teamId).not.toBe(owner.teamId);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);

    const fresh = await invite(agent, { email: 'fresh@example.test', name: 'Fresh', role: 'athlete' });
    const taken = await invite(agent, { email: 'taken@example.test', name: 'Taken', role: 'athlete' });
    expect(taken.status).toBe(fresh.status);
    expect(taken.status).toBe(201);
    // Same shape, same values but for the ids, names, addresses and times that differ anyway.
    const shape = (body: { data: Record<string, unknown> }) =>
      Object.fromEntries(Object.entries(body.data).map(([k, v]) => [k, typeof v]));
    expect(shape(taken.body)).toEqual(shape(fresh.body));
    expect(taken.body.data.role).toBe(fresh.body.data.role);
    const listed = (await agent.get('/api/invitations')).body.data as { email: string }[];
    expect(listed.map((i) => i.email).sort()).toEqual(['fresh@example.test', 'taken@example.test']);

    // The account's owner learns what to do; the mail carries no accept link, and nothing joins
    // their account to a second team.
    const [mail] = await outboxFor(t.dataSource, 'taken@example.test');
    expect(mail).toBeDefined();
    expect(mail!.textBody).toContain('already has a Driftmark account');
    expect(mail!.textBody).toContain(`${t.config.appOrigin}/sign-in`);
    expect(mail!.textBody).not.toContain('/invite/');
    const [freshMail] = await outboxFor(t.dataSource, 'fresh@example.test');
    expect(freshMail!.subject).toBe(mail!.subject);
    const account = await t.dataSource.getRepository(User).findOneByOrFail({ email: 'taken@example.test' });
    expect(account.teamId).toBe(elsewhere.teamId);

    // Resending keeps it that way.
    expect((await agent.post(`/api/invitations/${taken.body.data.id}/resend`)).status).toBe(200);
    const mails = await outboxFor(t.dataSource, 'taken@example.test');
    expect(mails).toHaveLength(2);
    expect(mails[1]!.textBody).not.toContain('/invite/');
  });

  it('refuses a coachId that is not a coach of the team', async () => {
    const owner = await createOwner(t.dataSource);
    const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
    const outsider = await createCoach(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    for (const coachId of [assistant.id, outsider.id]) {
      const res = await invite(agent, { email: 'z@example.test', name: 'Z', role: 'athlete', coachId });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.coachId).toBeDefined();
    }
  });
});

describe('managing invitations', () => {
  it('a new invitation to the same e-mail replaces the pending one', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    await invite(agent, { email: 'twice@example.test', name: 'Twice', role: 'athlete' });
    const first = await latestInviteToken('twice@example.test');
    await invite(agent, { email: 'twice@example.test', name: 'Twice Again', role: 'athlete' });
    const second = await latestInviteToken('twice@example.test');

    expect((await request(t.app).get(`/api/invitations/lookup/${first}`)).status).toBe(410);
    expect((await request(t.app).get(`/api/invitations/lookup/${second}`)).body.data.name).toBe(
      'Twice Again',
    );
    expect((await agent.get('/api/invitations')).body.data).toHaveLength(1);
  });

  it('resend issues a new token and expiry; the old link stops working', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const created = await invite(agent, { email: 'resend@example.test', name: 'Resend', role: 'athlete' });
    const old = await latestInviteToken('resend@example.test');
    await t.dataSource
      .getRepository(Invitation)
      .update({ id: created.body.data.id }, { expiresAt: new Date(Date.now() - 1000) });
    expect((await request(t.app).get(`/api/invitations/lookup/${old}`)).status).toBe(410);

    const resent = await agent.post(`/api/invitations/${created.body.data.id}/resend`);
    expect(resent.status).toBe(200);
    expect(Date.parse(resent.body.data.expiresAt)).toBeGreaterThan(Date.now() + 6 * 86_400_000);
    const fresh = await latestInviteToken('resend@example.test');
    expect(fresh).not.toBe(old);
    expect(await outboxFor(t.dataSource, 'resend@example.test')).toHaveLength(2);
    expect((await request(t.app).get(`/api/invitations/lookup/${old}`)).status).toBe(410);
    expect((await request(t.app).get(`/api/invitations/lookup/${fresh}`)).status).toBe(200);
  });

  it('revoke: the owner or the inviter; others get 404 and nothing changes', async () => {
    const owner = await createOwner(t.dataSource);
    const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
    const otherCoach = await createCoach(t.dataSource, { teamId: owner.teamId });
    const outsider = await createOwner(t.dataSource);
    const coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    const created = await invite(coachAgent, {
      email: 'revoke@example.test',
      name: 'Revoke',
      role: 'athlete',
    });
    const id: string = created.body.data.id;

    for (const who of [otherCoach, outsider]) {
      const agent = await signedIn(t.app, who.email, FACTORY_PASSWORD);
      expect((await agent.delete(`/api/invitations/${id}`)).status).toBe(404);
      expect((await agent.post(`/api/invitations/${id}/resend`)).status).toBe(404);
      expect((await agent.get('/api/invitations')).body.data).toEqual([]);
    }
    expect((await t.dataSource.getRepository(Invitation).findOneByOrFail({ id })).revokedAt).toBeNull();
    expect(await outboxFor(t.dataSource, 'revoke@example.test')).toHaveLength(1);

    const ownerAgent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect((await ownerAgent.get('/api/invitations')).body.data).toHaveLength(1);
    expect((await ownerAgent.delete(`/api/invitations/${id}`)).status).toBe(204);
    expect((await t.dataSource.getRepository(Invitation).findOneByOrFail({ id })).revokedAt).not.toBeNull();
    const token = await latestInviteToken('revoke@example.test');
    expect((await request(t.app).get(`/api/invitations/lookup/${token}`)).status).toBe(410);
    expect((await coachAgent.delete(`/api/invitations/${id}`)).status).toBe(404);
  });

  it('accepting refuses an address that got an account meanwhile', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    await invite(agent, { email: 'late@example.test', name: 'Late', role: 'athlete' });
    const token = await latestInviteToken('late@example.test');
    await createCoach(t.dataSource, { email: 'late@example.test' });
    const res = await browser(t.app)
      .post('/api/invitations/accept')
      .send({ token, name: 'Late', password: 'my-own-passphrase' });
    expect(res.status).toBe(409);
    expect(await t.dataSource.getRepository(User).countBy({ email: 'late@example.test' })).toBe(1);
  });

  it('refuses an expired invitation at accept time', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const created = await invite(agent, { email: 'expired@example.test', name: 'Expired', role: 'athlete' });
    const token = await latestInviteToken('expired@example.test');
    await t.dataSource
      .getRepository(Invitation)
      .update({ id: created.body.data.id }, { expiresAt: new Date(Date.now() - 1000) });
    const res = await browser(t.app)
      .post('/api/invitations/accept')
      .send({ token, name: 'Expired', password: 'my-own-passphrase' });
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe('token_invalid');
    expect(await t.dataSource.getRepository(User).countBy({ email: 'expired@example.test' })).toBe(0);
  });
});
