import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createOwner } from '../factories/users.js';
import { browser, buildTestApp, signedIn, type TestApp } from './setup/app.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(() => t.close());
beforeEach(() => t.reset());

describe('error bodies', () => {
  it('names each bad field by its path', async () => {
    const res = await browser(t.app).post('/api/auth/sign-in').send({ email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'validation_failed',
        message: expect.any(String),
        fields: { email: 'Enter a valid e-mail address', password: 'Password is required' },
        requestId: res.headers['x-request-id'],
      },
    });
  });

  it('reports cross-field rules of the shared schemas by path', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const res = await agent
      .post('/api/auth/change-password')
      .send({ currentPassword: 'same-password-1', newPassword: 'same-password-1' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['newPassword']);
  });

  it('answers malformed JSON with 400 validation_failed', async () => {
    const res = await browser(t.app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.requestId).toBe(res.headers['x-request-id']);
  });

  it('answers an oversized body with 413 payload_too_large', async () => {
    const res = await browser(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'a@example.test', password: 'x'.repeat(200_000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('answers an unknown /api route with a JSON 404', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error.code).toBe('not_found');
  });

  it('answers a malformed id in a path with 404, like an id that names nothing', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect((await agent.get('/api/athletes/not-a-uuid')).status).toBe(404);
    expect((await agent.get('/api/athletes/6f1c1e52-7c1e-4d3b-9d1b-6e1f1c1e5270')).status).toBe(404);
  });

  it('serves /api/dev/mail as 404 when no capture folder is configured', async () => {
    expect((await request(t.app).get('/api/dev/mail')).status).toBe(404);
  });
});
