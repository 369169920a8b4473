/**
 * Uploads whose connection drops part-way (a phone losing signal, a cancelled upload): the server
 * stays up, keeps nothing of the half-received file and takes the next upload as usual. Runs the
 * real app on a listening port, because cutting a request off mid-body needs a raw socket.
 */
import { once } from 'node:events';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import http, { type IncomingMessage, type ServerResponse } from 'node:http';
import net, { type AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { ConditionPhoto } from '../../api/src/entities/condition-photo.entity.js';
import { uploadsSettled, uploadTempDir } from '../../api/src/middleware/upload.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach } from '../factories/users.js';
import { buildTestApp, sessionCookie, type TestApp } from './setup/app.js';
import { APP_ORIGIN } from './setup/config.js';

/** The app's "now": noon in Oslo on the day the photos are dated. */
const NOW = new Date('2026-03-10T11:00:00Z');
const PHOTO_DATE = '2026-03-10';
const BOUNDARY = '----driftmark-dropped-upload-test';

let t: TestApp;
let uploadsDir: string;
let server: http.Server;
let baseUrl: string;
let port: number;
/** Called when the app starts reading an upload's body. */
let onReading: (() => void) | undefined;
/** Called with each photo upload the app answers (with the status it chose), connection or not. */
let onAnswer: ((status: number) => void) | undefined;

beforeAll(async () => {
  uploadsDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-dropped-upload-test-'));
  t = await buildTestApp({ uploadsDir }, { clock: () => NOW });
  server = http.createServer((req: IncomingMessage, res: ServerResponse) => {
    if (req.method === 'POST' && req.url?.endsWith('/photos')) {
      // multer pipes the request into its parser: from then on the app is reading the body.
      const pipe = req.pipe.bind(req);
      req.pipe = ((...args: Parameters<typeof pipe>) => {
        onReading?.();
        return pipe(...args);
      }) as typeof req.pipe;
      // The app answers even when nobody is left to read it; that answer marks the end of its work.
      const end = res.end.bind(res) as (...args: unknown[]) => ServerResponse;
      res.end = ((...args: unknown[]) => {
        onAnswer?.(res.statusCode);
        return end(...args);
      }) as typeof res.end;
    }
    t.app(req, res);
  });
  server.listen(0, '127.0.0.1');
  await once(server, 'listening');
  port = (server.address() as AddressInfo).port;
  baseUrl = `http://127.0.0.1:${port}`;
});

afterAll(async () => {
  server.closeAllConnections();
  await new Promise((resolve) => server.close(resolve));
  await t.close();
  rmSync(uploadsDir, { recursive: true, force: true });
});

let athlete: CreatedAthlete;
let cookie: string;

beforeEach(async () => {
  await t.reset();
  rmSync(uploadsDir, { recursive: true, force: true });
  const coach = await createCoach(t.dataSource);
  athlete = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Oslo' } });
  const res = await request(t.app)
    .post('/api/auth/sign-in')
    .set('Origin', APP_ORIGIN)
    .send({ email: athlete.user.email, password: FACTORY_PASSWORD });
  expect(res.status).toBe(200);
  cookie = sessionCookie(res)!;
});

/** A JPEG of noise (so it does not compress away): about 0.4 MB, many TCP segments. */
async function bigJpeg(): Promise<Buffer> {
  const width = 800;
  const height = 600;
  const noise = Buffer.alloc(width * height * 3);
  for (let i = 0; i < noise.length; i++) noise[i] = (i * 7919 + (i >> 7) * 104_729) % 251;
  return sharp(noise, { raw: { width, height, channels: 3 } })
    .jpeg({ quality: 95 })
    .toBuffer();
}

/** The body of an upload of one photo, and the offsets where a drop is interesting. */
function multipartBody(photo: Buffer) {
  const text = (name: string, value: string) =>
    `--${BOUNDARY}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n${value}\r\n`;
  const fields = Buffer.from(text('date', PHOTO_DATE) + text('pose', 'Front relaxed'));
  const partHead = Buffer.from(
    `--${BOUNDARY}\r\nContent-Disposition: form-data; name="files"; filename="front.jpg"\r\n` +
      'Content-Type: image/jpeg\r\n\r\n',
  );
  const closing = Buffer.from(`\r\n--${BOUNDARY}--\r\n`);
  const body = Buffer.concat([fields, partHead, photo, closing]);
  const fileStart = fields.length + partHead.length;
  return {
    body,
    cuts: {
      'inside the photo part’s headers': fields.length + partHead.indexOf('filename='),
      'after the date and pose fields': fields.length,
      'at 10 % of the photo': fileStart + Math.floor(photo.length * 0.1),
      'at 90 % of the photo': fileStart + Math.floor(photo.length * 0.9),
      'right before the closing boundary': fileStart + photo.length,
    },
  };
}

function requestHead(bodyLength: number): string {
  return [
    `POST /api/athletes/${athlete.athlete.id}/photos HTTP/1.1`,
    `Host: 127.0.0.1:${port}`,
    `Origin: ${APP_ORIGIN}`,
    `Cookie: ${cookie}`,
    `Content-Type: multipart/form-data; boundary=${BOUNDARY}`,
    `Content-Length: ${bodyLength}`,
    '',
    '',
  ].join('\r\n');
}

function entries(dir: string): string[] {
  try {
    return readdirSync(dir, { recursive: true }).map(String);
  } catch {
    return [];
  }
}

const tempEntries = () => entries(uploadTempDir());
const rowCount = () => t.dataSource.getRepository(ConditionPhoto).count();

/**
 * Sends the request head and the body up to `cut`, waits for `waitFor`, then drops the connection
 * (FIN, or RST as a phone losing signal may) and waits until the app has answered into the void
 * and removed its temp folder. Returns the status the app chose.
 */
async function dropUpload(
  body: Buffer,
  cut: number,
  ending: 'close' | 'reset',
  waitFor: 'nothing' | 'reading' | 'partial file',
): Promise<number> {
  const answered = new Promise<number>((resolve) => (onAnswer = resolve));
  const reading = new Promise<void>((resolve) => (onReading = resolve));
  const socket = net.connect(port, '127.0.0.1');
  await once(socket, 'connect');
  const received: Buffer[] = [];
  socket.on('data', (chunk: Buffer) => received.push(chunk));
  socket.on('error', () => {});
  socket.write(requestHead(body.length));
  socket.write(body.subarray(0, cut));
  if (waitFor !== 'nothing') await reading;
  if (waitFor === 'partial file') {
    // The half-received photo really is on disk before the drop.
    await vi.waitFor(() => expect(tempEntries().some((e) => e.endsWith('.upload'))).toBe(true), {
      timeout: 10_000,
    });
  }
  // Nothing answered yet: the request is still being read.
  expect(Buffer.concat(received).toString()).toBe('');
  if (ending === 'reset') socket.resetAndDestroy();
  else socket.destroy();
  const status = await answered;
  await uploadsSettled();
  return status;
}

async function completeUpload(photo: Buffer): Promise<Response> {
  const form = new FormData();
  form.set('date', PHOTO_DATE);
  form.set('pose', 'Front relaxed');
  form.set('files', new Blob([photo], { type: 'image/jpeg' }), 'front.jpg');
  return fetch(`${baseUrl}/api/athletes/${athlete.athlete.id}/photos`, {
    method: 'POST',
    headers: { Cookie: cookie, Origin: APP_ORIGIN },
    body: form,
  });
}

describe('an upload whose connection drops part-way', () => {
  let photo: Buffer;
  let upload: ReturnType<typeof multipartBody>;
  beforeAll(async () => {
    photo = await bigJpeg();
    upload = multipartBody(photo);
  });

  const cases = [
    { where: 'inside the photo part’s headers', ending: 'close', waitFor: 'reading' },
    { where: 'after the date and pose fields', ending: 'reset', waitFor: 'reading' },
    { where: 'at 10 % of the photo', ending: 'close', waitFor: 'partial file' },
    { where: 'at 10 % of the photo', ending: 'reset', waitFor: 'partial file' },
    { where: 'at 90 % of the photo', ending: 'close', waitFor: 'partial file' },
    { where: 'right before the closing boundary', ending: 'close', waitFor: 'partial file' },
    { where: 'right before the closing boundary', ending: 'reset', waitFor: 'partial file' },
  ] as const;

  it.each(cases)(
    'dropped $where ($ending): the server stays up, keeps nothing and takes the next upload',
    async ({ where, ending, waitFor }) => {
      expect(photo.length).toBeGreaterThan(300_000);
      const status = await dropUpload(upload.body, upload.cuts[where], ending, waitFor);
      // A cut-off upload is the client's doing, not a server error.
      expect(status).toBe(400);

      const health = await fetch(`${baseUrl}/api/health`);
      expect(health.status).toBe(200);
      expect(entries(uploadsDir)).toEqual([]);
      expect(tempEntries()).toEqual([]);
      expect(await rowCount()).toBe(0);

      const next = await completeUpload(photo);
      expect(next.status, await next.clone().text()).toBe(201);
      const [saved] = ((await next.json()) as { data: { id: string; date: string }[] }).data;
      expect(saved?.date).toBe(PHOTO_DATE);
      expect(await t.dataSource.getRepository(ConditionPhoto).findOneBy({ id: saved!.id })).not.toBeNull();
      expect(await rowCount()).toBe(1);
      expect(tempEntries()).toEqual([]);
    },
  );

  it('survives a drop before the upload is read at all (while it is still signing in)', async () => {
    // Only the head: the connection is gone before the app gets to the body.
    const status = await dropUpload(upload.body, 0, 'close', 'nothing');
    expect(status).toBe(400);
    expect((await fetch(`${baseUrl}/api/health`)).status).toBe(200);
    expect(tempEntries()).toEqual([]);
    expect(await rowCount()).toBe(0);
  });
});
