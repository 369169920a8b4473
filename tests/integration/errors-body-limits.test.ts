import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../api/src/app.js';
import { createLogger } from '../../api/src/logger.js';
import { MAX_UPLOAD_BYTES } from '../../api/src/middleware/upload.js';
import { buildTestApp, type TestApp } from './setup/app.js';
import { APP_ORIGIN } from './setup/config.js';
import { RawConnection } from './setup/spawned-server.js';

const JSON_BYTES = 100 * 1024;

let t: TestApp;
let server: http.Server;
let port: number;

beforeAll(async () => {
  t = await buildTestApp();
  // The real app on a real socket, with body times short enough to wait for.
  const app = createApp({
    config: t.config,
    dataSource: t.dataSource,
    logger: createLogger('silent'),
    bodyLimits: { jsonBytes: JSON_BYTES, anonymousMs: 1_000, signedInMs: 5_000 },
  });
  server = http.createServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  port = (server.address() as AddressInfo).port;
});
afterAll(async () => {
  server.closeAllConnections();
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

const head = (lines: string[]) => [...lines, '', ''].join('\r\n');

/** The status line, headers and JSON body of the one answer on a connection the server has closed. */
function answer(raw: string) {
  const [top, body] = raw.split('\r\n\r\n', 2) as [string, string];
  return {
    status: Number(top.split(' ')[1]),
    head: top,
    body: JSON.parse(body) as { error: { code: string } },
  };
}

describe('body limits', () => {
  it('refuses a Content-Length above the limit before reading a byte of the body', async () => {
    const c = new RawConnection(port);
    await c.write(
      head([
        'POST /api/auth/sign-in HTTP/1.1',
        'Host: 127.0.0.1',
        `Origin: ${APP_ORIGIN}`,
        'Content-Type: application/json',
        `Content-Length: ${JSON_BYTES + 1}`,
      ]),
    );
    // No body is ever sent: the answer comes anyway, and the connection closes with it.
    await c.waitClosed();
    const res = answer(c.received);
    expect(res.status).toBe(413);
    expect(res.head).toMatch(/\r\nConnection: close/i);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('refuses an upload whose Content-Length is above the whole upload limit, unread', async () => {
    const c = new RawConnection(port);
    await c.write(
      head([
        'POST /api/athletes/00000000-0000-4000-8000-000000000000/photos HTTP/1.1',
        'Host: 127.0.0.1',
        `Origin: ${APP_ORIGIN}`,
        'Content-Type: multipart/form-data; boundary=x',
        `Content-Length: ${MAX_UPLOAD_BYTES + 1}`,
      ]),
    );
    await c.waitClosed();
    const res = answer(c.received);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('cuts a chunked body off at the limit instead of reading it to the end', async () => {
    const c = new RawConnection(port);
    await c.write(
      head([
        'POST /api/auth/sign-in HTTP/1.1',
        'Host: 127.0.0.1',
        `Origin: ${APP_ORIGIN}`,
        'Content-Type: application/json',
        'Transfer-Encoding: chunked',
      ]),
    );
    const chunk = 'x'.repeat(16 * 1024);
    // Past the limit, and never finished (no terminating chunk).
    for (let sent = 0; sent <= JSON_BYTES; sent += chunk.length)
      await c.write(`${chunk.length.toString(16)}\r\n${chunk}\r\n`);
    await c.waitClosed();
    const res = answer(c.received);
    expect(res.status).toBe(413);
    expect(res.head).toMatch(/\r\nConnection: close/i);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('answers 408 and closes the connection when a body without a session trickles', async () => {
    const c = new RawConnection(port);
    await c.write(
      head([
        'POST /api/auth/sign-in HTTP/1.1',
        'Host: 127.0.0.1',
        `Origin: ${APP_ORIGIN}`,
        'Content-Type: application/json',
        'Content-Length: 60',
      ]),
    );
    await c.write('{"email":"a');
    await c.waitClosed();
    const res = answer(c.received);
    expect(res.status).toBe(408);
    expect(res.head).toMatch(/\r\nConnection: close/i);
    expect(res.body.error).toEqual({
      code: 'request_timeout',
      message: expect.any(String),
      requestId: expect.any(String),
    });
  });

  it('still reads a whole body sent in pieces within its time', async () => {
    const body = JSON.stringify({ email: 'nobody@example.test', password: 'not-the-password' });
    const c = new RawConnection(port);
    await c.write(
      head([
        'POST /api/auth/sign-in HTTP/1.1',
        'Host: 127.0.0.1',
        `Origin: ${APP_ORIGIN}`,
        'Content-Type: application/json',
        `Content-Length: ${Buffer.byteLength(body)}`,
        'Connection: close',
      ]),
    );
    for (const piece of body.match(/.{1,7}/g)!) await c.write(piece);
    await c.waitClosed();
    const res = answer(c.received);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
  });
});
