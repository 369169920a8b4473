import bcrypt from 'bcryptjs';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Session } from '../../api/src/entities/session.entity.js';
import { User } from '../../api/src/entities/user.entity.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAthlete } from '../factories/athletes.js';
import { createOwner } from '../factories/users.js';
import { APP_ORIGIN } from './setup/config.js';
import {
  browser,
  buildTestApp,
  sessionCookie,
  sessionCookieLine,
  signedIn,
  type TestApp,
} from './setup/app.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(() => t.close());
beforeEach(() => t.reset());

describe('sign-in', () => {
  it('signs in, answers Me and sets an httpOnly SameSite=Lax session cookie', async () => {
    const owner = await createOwner(t.dataSource, { email: 'head@example.test' });
    const res = await browser(t.app)
      .post('/api/auth/sign-in')
      .send({ email: ' Head@Example.test ', password: FACTORY_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      id: owner.id,
      email: 'head@example.test',
      role: 'owner',
      athleteId: null,
      intakeComplete: true,
    });
    const line = sessionCookieLine(res);
    expect(line).toBeDefined();
    expect(line).toMatch(/HttpOnly/i);
    expect(line).toMatch(/SameSite=Lax/i);
    expect(line).toMatch(/Path=\//);
    // The test origin is http: a Secure cookie would never come back.
    expect(line).not.toMatch(/Secure/i);
    expect(await t.dataSource.getRepository(Session).countBy({ userId: owner.id })).toBe(1);
  });

  it('marks the cookie Secure when the app origin is https', async () => {
    const secure = await buildTestApp({ appOrigin: 'https://driftmark.example' });
    try {
      await createOwner(secure.dataSource, { email: 'secure@example.test' });
      const res = await request(secure.app)
        .post('/api/auth/sign-in')
        .set('Origin', 'https://driftmark.example')
        .send({ email: 'secure@example.test', password: FACTORY_PASSWORD });
      expect(res.status).toBe(200);
      expect(sessionCookieLine(res)).toMatch(/;\s*Secure/i);
    } finally {
      await secure.close();
    }
  });

  it('answers the same 401 for a wrong password and an unknown e-mail', async () => {
    await createOwner(t.dataSource, { email: 'known@example.test' });
    const wrong = await browser(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'known@example.test', password: 'not-the-password' });
    const unknown = await browser(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@example.test', password: 'not-the-password' });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('invalid_credentials');
      expect(res.body.error.message).toBe('E-mail or password is incorrect.');
      expect(sessionCookie(res)).toBeUndefined();
    }
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it('answers an athlete with the athlete id and intake state', async () => {
    const owner = await createOwner(t.dataSource);
    const { user, athlete } = await createAthlete(t.dataSource, {
      coach: owner,
      athlete: { intakeCompletedAt: null, status: 'intake_pending' },
    });
    const agent = await signedIn(t.app, user.email, FACTORY_PASSWORD);
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.data).toMatchObject({
      role: 'athlete',
      athleteId: athlete.id,
      intakeComplete: false,
      team: { id: owner.teamId },
    });
  });
});

describe('sessions', () => {
  it('GET /api/me is 401 unauthenticated without a cookie', async () => {
    const res = await request(t.app).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('rejects a tampered or foreign-key-signed token', async () => {
    const owner = await createOwner(t.dataSource);
    const forged = jwt.sign({ sid: '00000000-0000-4000-8000-000000000000' }, 'x'.repeat(40), {
      subject: owner.id,
      expiresIn: 600,
    });
    const res = await request(t.app).get('/api/me').set('Cookie', `dm_session=${forged}`);
    expect(res.status).toBe(401);
  });

  it('sign-out revokes the session: the old cookie then gets 401', async () => {
    const owner = await createOwner(t.dataSource);
    const signIn = await browser(t.app)
      .post('/api/auth/sign-in')
      .send({ email: owner.email, password: FACTORY_PASSWORD });
    const cookie = sessionCookie(signIn)!;
    const otherDevice = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect((await request(t.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);

    const out = await request(t.app)
      .post('/api/auth/sign-out')
      .set('Origin', APP_ORIGIN)
      .set('Cookie', cookie);
    expect(out.status).toBe(204);
    expect(sessionCookieLine(out)).toMatch(/Expires=Thu, 01 Jan 1970/);

    // The JWT itself is still unexpired: only the revoked row makes it useless.
    const replay = await request(t.app).get('/api/me').set('Cookie', cookie);
    expect(replay.status).toBe(401);
    const sessions = await t.dataSource.getRepository(Session).findBy({ userId: owner.id });
    expect(sessions.filter((s) => s.revokedAt !== null)).toHaveLength(1);
    // Signing out one browser leaves the others signed in.
    expect((await otherDevice.get('/api/me')).status).toBe(200);
  });

  it('sign-out without a session still answers 204', async () => {
    expect((await browser(t.app).post('/api/auth/sign-out')).status).toBe(204);
  });
});

describe('change password', () => {
  it('changes the password, revokes every other session and re-issues the current cookie', async () => {
    const owner = await createOwner(t.dataSource);
    const laptop = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const phone = await signedIn(t.app, owner.email, FACTORY_PASSWORD);

    const res = await laptop
      .post('/api/auth/change-password')
      .send({ currentPassword: FACTORY_PASSWORD, newPassword: 'a-brand-new-passphrase' });
    expect(res.status).toBe(200);
    expect(res.body.data.id).toBe(owner.id);
    expect(sessionCookie(res)).toBeDefined();

    expect((await laptop.get('/api/me')).status).toBe(200);
    expect((await phone.get('/api/me')).status).toBe(401);

    const user = await t.dataSource.getRepository(User).findOneByOrFail({ id: owner.id });
    expect(user.passwordHash.startsWith('$2b$12$')).toBe(true);
    expect(
      (
        await browser(t.app)
          .post('/api/auth/sign-in')
          .send({ email: owner.email, password: FACTORY_PASSWORD })
      ).status,
    ).toBe(401);
    expect(
      (
        await browser(t.app)
          .post('/api/auth/sign-in')
          .send({ email: owner.email, password: 'a-brand-new-passphrase' })
      ).status,
    ).toBe(200);
  });

  it('answers 400 with fields.currentPassword for a wrong current password and changes nothing', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const before = await t.dataSource.getRepository(User).findOneByOrFail({ id: owner.id });
    const res = await agent
      .post('/api/auth/change-password')
      .send({ currentPassword: 'wrong-password', newPassword: 'another-long-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields).toHaveProperty('currentPassword');
    const after = await t.dataSource.getRepository(User).findOneByOrFail({ id: owner.id });
    expect(after.passwordHash).toBe(before.passwordHash);
  });

  it('requires a session', async () => {
    const res = await browser(t.app)
      .post('/api/auth/change-password')
      .send({ currentPassword: 'x', newPassword: 'another-long-password' });
    expect(res.status).toBe(401);
  });
});

describe('passwords over 72 bytes (bcrypt reads no further)', () => {
  const exact = 'k'.repeat(72);

  it('sign-in with a longer password fails like a wrong one, even when its first 72 bytes are right', async () => {
    const owner = await createOwner(t.dataSource, { passwordHash: await bcrypt.hash(exact, 4) });
    const ok = await browser(t.app).post('/api/auth/sign-in').send({ email: owner.email, password: exact });
    expect(ok.status).toBe(200);
    const res = await browser(t.app)
      .post('/api/auth/sign-in')
      .send({ email: owner.email, password: `${exact}-another-tail` });
    expect(res.status).toBe(401);
    expect(res.body.error).toMatchObject({
      code: 'invalid_credentials',
      message: 'E-mail or password is incorrect.',
    });
  });

  it('a new password over 72 bytes answers 400 naming newPassword and changes nothing', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const before = await t.dataSource.getRepository(User).findOneByOrFail({ id: owner.id });
    // 40 characters, 80 bytes in UTF-8 ('ö' takes 2, RFC 3629).
    const res = await agent
      .post('/api/auth/change-password')
      .send({ currentPassword: FACTORY_PASSWORD, newPassword: 'ö'.repeat(40) });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields.newPassword).toMatch(/At most 72 bytes/);
    const after = await t.dataSource.getRepository(User).findOneByOrFail({ id: owner.id });
    expect(after.passwordHash).toBe(before.passwordHash);
  });

  it('reset and invitation acceptance refuse it on the password field', async () => {
    const token = 't'.repeat(43);
    const reset = await browser(t.app)
      .post('/api/auth/reset-password')
      .send({ token, password: 'k'.repeat(73) });
    expect(reset.status).toBe(400);
    expect(reset.body.error.fields.password).toMatch(/At most 72 bytes/);
    const accept = await browser(t.app)
      .post('/api/invitations/accept')
      .send({ token, name: 'Ana Ruiz', password: 'k'.repeat(73) });
    expect(accept.status).toBe(400);
    expect(accept.body.error.fields.password).toMatch(/At most 72 bytes/);
  });
});

describe('settings', () => {
  it('PATCH /api/me/settings updates name, time zone and units', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const res = await agent
      .patch('/api/me/settings')
      .send({ name: 'Renamed Coach', timeZone: 'America/Denver', weightUnit: 'lb', volumeUnit: 'floz' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      name: 'Renamed Coach',
      timeZone: 'America/Denver',
      units: { weight: 'lb', volume: 'floz' },
    });
  });

  it('refuses an unknown time zone with fields.timeZone', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const res = await agent.patch('/api/me/settings').send({ timeZone: 'Mars/Olympus' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.timeZone).toBeDefined();
  });
});
