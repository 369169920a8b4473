import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { RateLimitCounter } from '../../api/src/entities/rate-limit-counter.entity.js';
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

  it('counts whatever the client typed, NUL and all, and still answers 400 naming the field', async () => {
    // The limiter keys on the e-mail before it is validated (found by the route fuzz).
    const res = await browser(t.app).post('/api/auth/sign-in').send({ email: 'a\u0000@example.test' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('email');
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

describe('limits per client address, across accounts, kept in PostgreSQL', () => {
  const LIMIT = 4;
  let a: TestApp;
  beforeAll(async () => {
    a = await buildTestApp({ addressRateLimit: LIMIT });
  });
  afterAll(() => a.close());
  beforeEach(() => a.reset());

  function expectThrottled(res: {
    status: number;
    body: { error?: unknown };
    headers: Record<string, string>;
  }) {
    expect(res.status).toBe(429);
    expect(res.body.error).toMatchObject({ code: 'rate_limited', message: expect.any(String) });
    expect(res.body.error).toHaveProperty('requestId');
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  }

  it('throttles one address spraying sign-ins over many e-mails, known or not', async () => {
    const owner = await createOwner(a.dataSource);
    for (let i = 0; i < LIMIT; i += 1) {
      const res = await browser(a.app)
        .post('/api/auth/sign-in')
        .send({ email: `spray${i}@example.test`, password: 'spring-2026-password' });
      expect(res.status).toBe(401);
    }
    // A fresh e-mail, and even the right password of a real account, now waits out the window.
    expectThrottled(
      await browser(a.app)
        .post('/api/auth/sign-in')
        .send({ email: 'spray-next@example.test', password: 'spring-2026-password' }),
    );
    expectThrottled(
      await browser(a.app).post('/api/auth/sign-in').send({ email: owner.email, password: FACTORY_PASSWORD }),
    );
  });

  it('keeps its counts across a rebuilt app on the same database (a restart, another instance)', async () => {
    for (let i = 0; i < LIMIT; i += 1) {
      await browser(a.app)
        .post('/api/auth/sign-in')
        .send({ email: `before${i}@example.test`, password: 'spring-2026-password' });
    }
    const counters = await a.dataSource.getRepository(RateLimitCounter).find();
    expect(counters.map((c) => c.key)).toEqual(
      expect.arrayContaining([expect.stringMatching(/^address:sign-in:/)]),
    );

    const rebuilt = await buildTestApp({ addressRateLimit: LIMIT });
    try {
      expectThrottled(
        await browser(rebuilt.app)
          .post('/api/auth/sign-in')
          .send({ email: 'after@example.test', password: 'spring-2026-password' }),
      );
    } finally {
      await rebuilt.close();
    }
  });

  it('throttles bogus invitation accepts, reset links and deletion confirmations per address', async () => {
    const token = 'not-a-real-token-'.padEnd(43, 'x');
    const routes: [string, Record<string, unknown>][] = [
      ['/api/invitations/accept', { token, name: 'Ana Ruiz', password: 'my-own-passphrase' }],
      ['/api/auth/reset-password', { token, password: 'my-own-passphrase' }],
      ['/api/me/deletion/confirm', { token }],
    ];
    for (const [path, body] of routes) {
      for (let i = 0; i < LIMIT; i += 1) {
        const res = await browser(a.app).post(path).send(body);
        expect(res.status, path).toBeGreaterThanOrEqual(400);
        expect(res.status, path).not.toBe(429);
      }
      expectThrottled(await browser(a.app).post(path).send(body));
    }
  });
});
