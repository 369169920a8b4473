import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, type TestApp } from './setup/app.js';

describe('GET /api/health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await buildTestApp();
  });
  afterAll(() => t.close());

  it('answers 200 with db up after a real query', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'up' });
    expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('answers 503 with db down when the pool is closed', async () => {
    const other = await buildTestApp();
    await other.dataSource.destroy();
    const res = await request(other.app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ status: 'error', db: 'down' });
  });

  it('reuses a sensible X-Request-Id from the caller', async () => {
    const res = await request(t.app).get('/api/health').set('X-Request-Id', 'probe-123');
    expect(res.headers['x-request-id']).toBe('probe-123');
    const odd = await request(t.app).get('/api/health').set('X-Request-Id', 'bad id\twith spaces');
    expect(odd.headers['x-request-id']).not.toBe('bad id\twith spaces');
  });
});
