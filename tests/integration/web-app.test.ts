import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach } from '../factories/users.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

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
  // What the build writes beside a large asset (web/vite.config.ts precompress()).
  const big = `export const rows = ${JSON.stringify(Array.from({ length: 400 }, (_, i) => ({ day: i, kg: 80 - i / 100 })))};`;
  writeFileSync(path.join(dist, 'assets', 'chunk-def456.js'), big);
  writeFileSync(path.join(dist, 'assets', 'chunk-def456.js.br'), brotliCompressSync(big));
  writeFileSync(path.join(dist, 'assets', 'chunk-def456.js.gz'), gzipSync(big));
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

  it('sends built assets precompressed, brotli first, and JSON answers compressed', async () => {
    const br = await request(t.app).get('/assets/chunk-def456.js').set('Accept-Encoding', 'gzip, br');
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(br.headers['content-type']).toMatch(/javascript/);
    expect(br.headers['cache-control']).toContain('immutable');
    expect(br.text).toContain('export const rows');
    const gz = await request(t.app).get('/assets/chunk-def456.js').set('Accept-Encoding', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    const plain = await request(t.app).get('/assets/chunk-def456.js').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();

    // A JSON answer above the compression threshold (1 kB): a food search as a signed-in coach.
    await t.reset();
    const coach = await createCoach(t.dataSource);
    const agent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    const foods = await agent.get('/api/foods').query({ q: 'rice' }).set('Accept-Encoding', 'gzip');
    expect(foods.status).toBe(200);
    expect(foods.headers['content-encoding']).toBe('gzip');
    expect(foods.headers['content-type']).toMatch(/json/);
    expect(foods.body.data.length).toBeGreaterThan(3);
  });

  it('keeps /api answers JSON', async () => {
    const res = await request(t.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    expect((await request(t.app).get('/api')).headers['content-type']).toMatch(/json/);
  });
});
