import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, type TestApp } from './setup/app.js';

let t: TestApp;
let dist: string;
beforeAll(async () => {
  dist = mkdtempSync(path.join(os.tmpdir(), 'driftmark-web-dist-'));
  mkdirSync(path.join(dist, 'assets'));
  writeFileSync(
    path.join(dist, 'index.html'),
    '<!doctype html><title>Driftmark</title><div id="root"></div>',
  );
  writeFileSync(path.join(dist, 'assets', 'index-abc123.js'), 'console.log("app")');
  writeFileSync(path.join(dist, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
  t = await buildTestApp({ webDist: dist });
});
afterAll(async () => {
  await t.close();
  rmSync(dist, { recursive: true, force: true });
});

describe('serving the built web app', () => {
  it('serves index.html for client-side routes, uncached, with the CSP', async () => {
    for (const url of ['/', '/coach', '/invite/some-token', '/reset-password?token=x']) {
      const res = await request(t.app).get(url);
      expect(res.status, url).toBe(200);
      expect(res.headers['content-type']).toMatch(/text\/html/);
      expect(res.text).toContain('<div id="root">');
      expect(res.headers['cache-control']).toBe('no-cache');
    }
    const csp = (await request(t.app).get('/')).headers['content-security-policy'];
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("img-src 'self' data: blob:");
    expect(csp).toContain("frame-ancestors 'none'");
  });

  it('serves hashed assets with a long cache and 404s a missing one', async () => {
    const asset = await request(t.app).get('/assets/index-abc123.js');
    expect(asset.status).toBe(200);
    expect(asset.headers['cache-control']).toContain('immutable');
    expect((await request(t.app).get('/assets/missing.js')).status).toBe(404);
    expect((await request(t.app).get('/favicon.svg')).status).toBe(200);
  });

  it('keeps /api answers JSON', async () => {
    const res = await request(t.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    expect((await request(t.app).get('/api')).headers['content-type']).toMatch(/json/);
  });
});
