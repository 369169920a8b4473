import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createOwner } from '../factories/users.js';
import { buildTestApp, type TestApp } from './setup/app.js';
import { APP_ORIGIN } from './setup/config.js';
import { connectionRefused, eventually, RawConnection, spawnServer } from './setup/spawned-server.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
  await t.reset();
});
afterAll(() => t.close());

describe('SIGTERM', () => {
  it('refuses new connections, closes idle ones, finishes the request in flight, then exits 0', async () => {
    const owner = await createOwner(t.dataSource);
    const server = await spawnServer();
    try {
      // An idle keep-alive connection: one answered request, then nothing.
      const idle = new RawConnection(server.port);
      await idle.write('GET /api/health HTTP/1.1\r\nHost: 127.0.0.1\r\n\r\n');
      await idle.waitFor(/^HTTP\/1\.1 200[\s\S]*\{"status":"ok","db":"up"\}/);
      expect(idle.received).toMatch(/\r\nConnection: keep-alive\r\n/i);

      // A sign-in in flight: headers read by the server (it answers 100 Continue), half of the body sent.
      const body = JSON.stringify({ email: owner.email, password: FACTORY_PASSWORD });
      const half = Math.floor(body.length / 2);
      const busy = new RawConnection(server.port);
      await busy.write(
        [
          'POST /api/auth/sign-in HTTP/1.1',
          'Host: 127.0.0.1',
          `Origin: ${APP_ORIGIN}`,
          'Content-Type: application/json',
          `Content-Length: ${Buffer.byteLength(body)}`,
          'Expect: 100-continue',
          '',
          '',
        ].join('\r\n'),
      );
      await busy.waitFor(/^HTTP\/1\.1 100 Continue\r\n\r\n/);
      await busy.write(body.slice(0, half));

      server.child.kill('SIGTERM');
      // At once: the port refuses new connections and the idle connection is closed.
      await eventually(() => connectionRefused(server.port));
      await idle.waitClosed();
      expect(busy.closed).toBe(false);

      // The request in flight still completes, told that the connection ends with it.
      await busy.write(body.slice(half));
      await busy.waitFor(/HTTP\/1\.1 200 OK\r\n[\s\S]*\r\n\r\n\{"data"/);
      const answer = busy.received.slice(busy.received.indexOf('HTTP/1.1 200'));
      expect(answer).toMatch(/\r\nConnection: close\r\n/i);
      await busy.waitClosed();

      expect(await server.exited).toBe(0);
      expect(server.output()).toContain('"msg":"stopped"');
    } finally {
      if (server.child.exitCode === null) server.child.kill('SIGKILL');
    }
  }, 60_000);
});
