import { once } from 'node:events';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, type TestApp } from './setup/app.js';

/**
 * The demo inbox's web page (/dev/inbox) sits behind the same fence as its API (/api/dev/mail):
 * served only in demo mode, and only to clients on this machine. Elsewhere the server answers 404
 * and never sends the app that would draw it. A small built web app stands in for web/dist.
 */
const INDEX = '<!doctype html><title>Driftmark test build</title><div id="root"></div>';
let webDist: string;
let captureDir: string;
let demo: TestApp;

beforeAll(async () => {
  webDist = await mkdtemp(path.join(os.tmpdir(), 'driftmark-web-'));
  captureDir = await mkdtemp(path.join(os.tmpdir(), 'driftmark-mail-'));
  await writeFile(path.join(webDist, 'index.html'), INDEX);
  demo = await buildTestApp({ appMode: 'demo', mailCaptureDir: captureDir, webDist });
});
afterAll(async () => {
  await demo.close();
  await rm(webDist, { recursive: true, force: true });
  await rm(captureDir, { recursive: true, force: true });
});

const INBOX_PATHS = ['/dev/inbox', '/dev/inbox/', '/dev/inbox?id=1700000000000-abc', '/DEV/INBOX'];

describe('the demo inbox page', () => {
  it('is served in demo mode to a client on this machine', async () => {
    for (const p of INBOX_PATHS) {
      const res = await request(demo.app).get(p);
      expect(res.status, p).toBe(200);
      expect(res.text).toBe(INDEX);
    }
  });

  it('does not exist outside demo mode, while the rest of the app is served', async () => {
    for (const appMode of ['production', 'test', 'development'] as const) {
      const other = await buildTestApp({ appMode, mailCaptureDir: captureDir, webDist });
      try {
        for (const p of INBOX_PATHS) {
          const res = await request(other.app).get(p);
          expect(res.status, `${appMode} ${p}`).toBe(404);
          expect(res.body.error.code).toBe('not_found');
          expect(res.text).not.toContain('Driftmark test build');
        }
        expect((await request(other.app).get('/sign-in')).text).toBe(INDEX);
      } finally {
        await other.close();
      }
    }
  });

  it('does not exist in demo mode without a capture folder', async () => {
    const noCapture = await buildTestApp({ appMode: 'demo', mailCaptureDir: undefined, webDist });
    try {
      expect((await request(noCapture.app).get('/dev/inbox')).status).toBe(404);
    } finally {
      await noCapture.close();
    }
  });

  // A real connection from another address of this machine (not 127/8 or ::1), when it has one.
  const outside = Object.values(os.networkInterfaces())
    .flat()
    .find((i) => i && i.family === 'IPv4' && !i.internal)?.address;
  it.skipIf(!outside)('answers 404 to a client that is not on loopback, even in demo mode', async () => {
    const server = demo.app.listen(0, '0.0.0.0');
    await once(server, 'listening');
    try {
      const { port } = server.address() as AddressInfo;
      const remote = await fetch(`http://${outside}:${port}/dev/inbox`);
      expect(remote.status).toBe(404);
      expect(((await remote.json()) as { error: { code: string } }).error.code).toBe('not_found');
      expect((await fetch(`http://${outside}:${port}/sign-in`)).status).toBe(200);
      expect((await fetch(`http://127.0.0.1:${port}/dev/inbox`)).status).toBe(200);
    } finally {
      server.closeAllConnections();
      server.close();
    }
  });
});
