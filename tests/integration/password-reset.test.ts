import { createHash } from 'node:crypto';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { PasswordResetToken } from '../../api/src/entities/password-reset-token.entity.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createOwner } from '../factories/users.js';
import { browser, buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { outboxFor, tokenFromMail } from './setup/outbox.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(() => t.close());
beforeEach(() => t.reset());

async function requestReset(email: string): Promise<string> {
  const res = await browser(t.app).post('/api/auth/forgot-password').send({ email });
  expect(res.status).toBe(202);
  const mails = await outboxFor(t.dataSource, email);
  return tokenFromMail(mails.at(-1)!, t.config.appOrigin, 'reset');
}

describe('forgot password', () => {
  it('answers 202 for an unknown e-mail and queues nothing', async () => {
    const res = await browser(t.app).post('/api/auth/forgot-password').send({ email: 'nobody@example.test' });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ data: { ok: true } });
    expect(await outboxFor(t.dataSource, 'nobody@example.test')).toHaveLength(0);
  });

  it('queues a reset mail with a link and stores only the token’s sha256', async () => {
    const owner = await createOwner(t.dataSource);
    const token = await requestReset(owner.email);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const [mail] = await outboxFor(t.dataSource, owner.email);
    expect(mail).toMatchObject({ kind: 'password_reset', status: 'pending' });
    const rows = await t.dataSource.getRepository(PasswordResetToken).findBy({ userId: owner.id });
    expect(rows).toHaveLength(1);
    expect(rows[0]!.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(rows[0]!.tokenHash).not.toContain(token);
  });
});

describe('reset password', () => {
  it('sets the password, signs out every session and works only once', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const token = await requestReset(owner.email);

    const res = await browser(t.app)
      .post('/api/auth/reset-password')
      .send({ token, password: 'fresh-passphrase-123' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ data: { ok: true } });
    expect((await agent.get('/api/me')).status).toBe(401);
    expect(
      (
        await browser(t.app)
          .post('/api/auth/sign-in')
          .send({ email: owner.email, password: 'fresh-passphrase-123' })
      ).status,
    ).toBe(200);

    const again = await browser(t.app)
      .post('/api/auth/reset-password')
      .send({ token, password: 'another-passphrase-456' });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('token_invalid');
  });

  it('refuses an expired token with 410', async () => {
    const owner = await createOwner(t.dataSource);
    const token = await requestReset(owner.email);
    await t.dataSource
      .getRepository(PasswordResetToken)
      .update({ userId: owner.id }, { expiresAt: new Date(Date.now() - 60_000) });
    const res = await browser(t.app)
      .post('/api/auth/reset-password')
      .send({ token, password: 'fresh-passphrase-123' });
    expect(res.status).toBe(410);
    expect(
      (
        await browser(t.app)
          .post('/api/auth/sign-in')
          .send({ email: owner.email, password: FACTORY_PASSWORD })
      ).status,
    ).toBe(200);
  });

  it('refuses an unknown token with 410', async () => {
    const res = await browser(t.app)
      .post('/api/auth/reset-password')
      .send({ token: 'x'.repeat(43), password: 'fresh-passphrase-123' });
    expect(res.status).toBe(410);
  });

  it('a newer link does not revive an older one once either is used', async () => {
    const owner = await createOwner(t.dataSource);
    const first = await requestReset(owner.email);
    const second = await requestReset(owner.email);
    expect(
      (
        await browser(t.app)
          .post('/api/auth/reset-password')
          .send({ token: second, password: 'fresh-passphrase-123' })
      ).status,
    ).toBe(200);
    expect(
      (
        await browser(t.app)
          .post('/api/auth/reset-password')
          .send({ token: first, password: 'other-passphrase-123' })
      ).status,
    ).toBe(410);
  });
});
