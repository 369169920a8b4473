import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Session } from '../../api/src/entities/session.entity.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createOwner } from '../factories/users.js';
import { buildTestApp, type TestApp } from './setup/app.js';
import { APP_ORIGIN } from './setup/config.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(() => t.close());
beforeEach(() => t.reset());

const signIn = (email: string) =>
  request(t.app).post('/api/auth/sign-in').send({ email, password: FACTORY_PASSWORD });

describe('origin check (CSRF)', () => {
  it('refuses a state-changing request without Origin or Referer', async () => {
    const owner = await createOwner(t.dataSource);
    const res = await signIn(owner.email);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_rejected');
    expect(await t.dataSource.getRepository(Session).countBy({ userId: owner.id })).toBe(0);
  });

  it('refuses a foreign Origin, and a foreign Referer when Origin is missing', async () => {
    const owner = await createOwner(t.dataSource);
    expect((await signIn(owner.email).set('Origin', 'https://evil.example')).status).toBe(403);
    expect((await signIn(owner.email).set('Origin', 'http://127.0.0.1:3000.evil.example')).status).toBe(403);
    expect((await signIn(owner.email).set('Origin', 'null')).status).toBe(403);
    expect((await signIn(owner.email).set('Referer', 'https://evil.example/page')).status).toBe(403);
    // Origin wins over Referer: a good Referer does not rescue a bad Origin.
    expect(
      (
        await signIn(owner.email)
          .set('Origin', 'https://evil.example')
          .set('Referer', `${APP_ORIGIN}/sign-in`)
      ).status,
    ).toBe(403);
  });

  it('accepts the app origin, an extra origin, or a same-origin Referer', async () => {
    const owner = await createOwner(t.dataSource);
    expect((await signIn(owner.email).set('Origin', APP_ORIGIN)).status).toBe(200);
    expect((await signIn(owner.email).set('Origin', 'http://127.0.0.1:5173')).status).toBe(200);
    expect((await signIn(owner.email).set('Referer', `${APP_ORIGIN}/sign-in?next=%2Fcoach`)).status).toBe(
      200,
    );
  });

  it('lets safe methods through without an Origin', async () => {
    expect((await request(t.app).get('/api/health')).status).toBe(200);
  });

  it('guards signed-in writes too, even with a valid cookie', async () => {
    const owner = await createOwner(t.dataSource);
    const cookie = (await signIn(owner.email).set('Origin', APP_ORIGIN)).headers[
      'set-cookie'
    ] as unknown as string[];
    const res = await request(t.app)
      .patch('/api/me/settings')
      .set('Cookie', cookie)
      .send({ name: 'Hijacked' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_rejected');
  });
});
