import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createOwner } from '../factories/users.js';
import { browser, buildTestApp, type TestApp } from './setup/app.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({ signInRateLimit: 3, resetRateLimit: 2 });
  await t.reset();
});
afterAll(() => t.close());

describe('rate limits', () => {
  it('answers 429 rate_limited after too many failed sign-ins for one e-mail', async () => {
    const owner = await createOwner(t.dataSource);
    for (let i = 0; i < 3; i += 1) {
      expect(
        (await browser(t.app).post('/api/auth/sign-in').send({ email: owner.email, password: 'wrong-guess' }))
          .status,
      ).toBe(401);
    }
    const blocked = await browser(t.app)
      .post('/api/auth/sign-in')
      .send({ email: owner.email, password: FACTORY_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    expect(blocked.headers['ratelimit-policy'] ?? blocked.headers.ratelimit).toBeDefined();

    // Keyed by IP + e-mail: another account from the same address is not locked out.
    const other = await createOwner(t.dataSource);
    expect(
      (
        await browser(t.app)
          .post('/api/auth/sign-in')
          .send({ email: other.email, password: FACTORY_PASSWORD })
      ).status,
    ).toBe(200);
  });

  it('does not count successful sign-ins', async () => {
    const owner = await createOwner(t.dataSource);
    for (let i = 0; i < 5; i += 1) {
      expect(
        (
          await browser(t.app)
            .post('/api/auth/sign-in')
            .send({ email: owner.email, password: FACTORY_PASSWORD })
        ).status,
      ).toBe(200);
    }
  });

  it('limits forgot-password requests per IP', async () => {
    for (let i = 0; i < 2; i += 1) {
      expect(
        (
          await browser(t.app)
            .post('/api/auth/forgot-password')
            .send({ email: `x${i}@example.test` })
        ).status,
      ).toBe(202);
    }
    const blocked = await browser(t.app).post('/api/auth/forgot-password').send({ email: 'x9@example.test' });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
  });
});
