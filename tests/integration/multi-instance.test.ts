/**
 * Two API instances (separate processes, the server's own start) on one PostgreSQL database and
 * one photo bucket in the S3 fake, behind a small proxy written here that hands requests to them in turn, as a
 * load balancer in front of several instances would. Nothing another instance needs may live in a
 * process's memory: a session made on one works on the other, a write on one is read on the other,
 * every e-mail (the scheduler's and the events') goes out exactly once with both workers running,
 * and the sign-in limit holds at the same count whichever instance answers.
 */
import { readdirSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { S3Settings } from '../../api/src/config.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { readAllCapturedMail, startSmtpFake, type SmtpFake } from '../../scripts/src/lib/smtp-fake.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach } from '../factories/users.js';
import { fluidBody } from './check-ins-helpers.js';
import { buildTestApp, sessionCookie, type TestApp } from './setup/app.js';
import { APP_ORIGIN } from './setup/config.js';
import { bucketNames, emptyBucket, freshTestBucket } from './setup/s3.js';
import { eventually, spawnServer, type SpawnedServer } from './setup/spawned-server.js';

/** The instances' pinned "now": a Tuesday evening, past every reminder hour of the UTC athlete. */
const NOW = '2026-12-01T20:00:00Z';
const TODAY = '2026-12-01';
/** Failed sign-ins per address + e-mail before 429 (the instances' SIGN_IN_RATE_LIMIT). */
const SIGN_IN_LIMIT = 4;

/** Which instance answered, as the proxy saw it. */
const SERVED_BY = 'x-served-by';
/** The client address the proxy forwards (a test stands in for several people). */
const CLIENT = 'x-test-client';

interface Proxy {
  url: string;
  close(): Promise<void>;
}

/**
 * Round-robin over the instances' ports, one request at a time each way: forwards method, path,
 * headers and body; adds X-Forwarded-For (the client's address, from `x-test-client` when the test
 * names one) and X-Forwarded-Proto, and says in `x-served-by` which instance answered.
 */
async function startProxy(ports: number[]): Promise<Proxy> {
  let next = 0;
  const server = http.createServer((req, res) => {
    const index = next++ % ports.length;
    const client = (req.headers[CLIENT] as string | undefined) ?? req.socket.remoteAddress ?? '127.0.0.1';
    const headers: http.OutgoingHttpHeaders = {
      ...req.headers,
      'x-forwarded-for': client,
      'x-forwarded-proto': 'http',
    };
    delete headers[CLIENT];
    const upstream = http.request(
      { host: '127.0.0.1', port: ports[index], method: req.method, path: req.url, headers },
      (answer) => {
        res.writeHead(answer.statusCode ?? 502, { ...answer.headers, [SERVED_BY]: String(index) });
        answer.pipe(res);
      },
    );
    upstream.on('error', () => {
      res.writeHead(502).end();
    });
    req.pipe(upstream);
  });
  server.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

let t: TestApp;
let smtp: SmtpFake;
let captureDir: string;
let uploadsDir: string;
let bucket: S3Settings;
const instances: SpawnedServer[] = [];
let proxy: Proxy;
let coach: User;
let athlete: CreatedAthlete;

beforeAll(async () => {
  t = await buildTestApp();
  await t.reset();
  coach = await createCoach(t.dataSource, { name: 'Rhea Castell' });
  athlete = await createAthlete(t.dataSource, {
    coach,
    user: { name: 'Odile Marsh', timeZone: 'UTC' },
  });

  captureDir = await mkdtemp(path.join(os.tmpdir(), 'dm-multi-mail-'));
  uploadsDir = await mkdtemp(path.join(os.tmpdir(), 'dm-multi-uploads-'));
  bucket = await freshTestBucket('multi-instance');
  smtp = await startSmtpFake({ port: 0, captureDir });
  const env = {
    PINNED_NOW: NOW,
    SMTP_URL: `smtp://127.0.0.1:${smtp.port}`,
    // Photos in one bucket of the S3 fake (its endpoint and keys come from the test runner).
    PHOTO_STORAGE: 's3',
    S3_BUCKET: bucket.bucket,
    UPLOADS_DIR: uploadsDir,
    // The proxy on this machine names the client; rate limits key on that address.
    TRUST_PROXY: 'loopback',
    SIGN_IN_RATE_LIMIT: String(SIGN_IN_LIMIT),
    ADDRESS_RATE_LIMIT: '1000',
    RESET_RATE_LIMIT: '1000',
    SESSION_ATHLETE_IDLE_DAYS: '3650',
    SESSION_ATHLETE_MAX_DAYS: '3650',
    SESSION_STAFF_IDLE_HOURS: '87600',
    SESSION_STAFF_MAX_DAYS: '3650',
  };
  // Both start at once: their start sweeps, catch-up ticks and workers run side by side. Each is
  // kept as soon as it listens, so one that fails to start does not leave the other running.
  const starting = [spawnServer(env, 'pinned'), spawnServer(env, 'pinned')].map((p) =>
    p.then((instance) => {
      instances.push(instance);
      return instance;
    }),
  );
  const started = await Promise.allSettled(starting);
  const failed = started.find((r) => r.status === 'rejected');
  if (failed) throw failed.reason;
  instances.sort((a, b) => a.port - b.port);
  proxy = await startProxy(instances.map((i) => i.port));
}, 120_000);

afterAll(async () => {
  await proxy?.close();
  for (const instance of instances) {
    instance.child.kill('SIGTERM');
    await instance.exited;
  }
  await smtp?.close();
  if (bucket) await emptyBucket(bucket);
  await t?.close();
  for (const dir of [captureDir, uploadsDir]) if (dir) await rm(dir, { recursive: true, force: true });
});

/** A cookie-keeping client of the proxy, sending the app's Origin like the web app. */
const client = () => request.agent(proxy.url).set('Origin', APP_ORIGIN);

const servedBy = (res: { headers: Record<string, unknown> }) => Number(res.headers[SERVED_BY]);

describe('two instances behind one origin', () => {
  it('keeps a session made on one instance on the other, and reads on one what the other wrote', async () => {
    const agent = client();
    const signIn = await agent
      .post('/api/auth/sign-in')
      .send({ email: athlete.user.email, password: FACTORY_PASSWORD });
    expect(signIn.status).toBe(200);

    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.data.email).toBe(athlete.user.email);
    expect(servedBy(me)).not.toBe(servedBy(signIn));

    const write = await agent
      .post(`/api/athletes/${athlete.athlete.id}/days/${TODAY}/fluids`)
      .send(fluidBody({ volume: 750 }));
    expect(write.status).toBe(201);
    const day = await agent.get(`/api/athletes/${athlete.athlete.id}/days/${TODAY}`);
    expect(day.status).toBe(200);
    expect(servedBy(day)).not.toBe(servedBy(write));
    expect(day.body.data.fluids.map((f: { id: string }) => f.id)).toEqual([write.body.data.id]);

    // Signed out on one instance: the other refuses the same cookie at once (the row says so).
    const cookie = sessionCookie(signIn);
    expect(cookie).toBeDefined();
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    const after = await request(proxy.url).get('/api/me').set('Cookie', cookie!);
    expect(servedBy(after)).not.toBe(servedBy(out));
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('session_revoked');
  });

  it('serves from one instance the photo uploaded through the other, both on one bucket', async () => {
    const agent = client();
    await agent.post('/api/auth/sign-in').send({ email: athlete.user.email, password: FACTORY_PASSWORD });
    const data = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#3a6ea5' } })
      .jpeg()
      .toBuffer();
    const upload = await agent
      .post(`/api/athletes/${athlete.athlete.id}/photos`)
      .field('date', TODAY)
      .field('pose', 'Front relaxed')
      .attach('files', data, { filename: 'front.jpg', contentType: 'image/jpeg' });
    expect(upload.status).toBe(201);
    const [photo] = upload.body.data as { urls: { display: string; thumb: string } }[];

    for (const url of [photo!.urls.display, photo!.urls.thumb]) {
      const read = await agent.get(url).buffer(true);
      expect(read.status).toBe(200);
      expect(read.headers['content-type']).toBe('image/jpeg');
      expect((await sharp(read.body as Buffer).metadata()).format).toBe('jpeg');
    }
    // The gallery, read through whichever instance answers next, lists it too.
    const gallery = await agent.get(`/api/athletes/${athlete.athlete.id}/photos`);
    expect(gallery.status).toBe(200);
    expect(gallery.body.data).toHaveLength(1);
    // The files are in the bucket (published, nothing pending), none in the instances' folder.
    const [row] = await t.dataSource.query('SELECT thumb_key, display_key FROM condition_photos');
    expect(await bucketNames(bucket)).toEqual(expect.arrayContaining([row.thumb_key, row.display_key]));
    expect((await bucketNames(bucket)).filter((name: string) => name.includes('pending'))).toEqual([]);
    expect(readdirSync(uploadsDir)).toEqual([]);
  });

  it('holds the sign-in limit across both instances at the count one instance allows', async () => {
    const address = '203.0.113.7';
    const served = new Set<number>();
    for (let i = 0; i < SIGN_IN_LIMIT; i += 1) {
      const res = await client()
        .set(CLIENT, address)
        .post('/api/auth/sign-in')
        .send({ email: coach.email, password: 'not-the-password' });
      expect(res.status).toBe(401);
      served.add(servedBy(res));
    }
    expect(served).toEqual(new Set([0, 1]));
    // The next attempt, right password and all, is refused by either instance.
    for (let i = 0; i < 2; i += 1) {
      const blocked = await client()
        .set(CLIENT, address)
        .post('/api/auth/sign-in')
        .send({ email: coach.email, password: FACTORY_PASSWORD });
      expect(blocked.status).toBe(429);
      expect(blocked.body.error.code).toBe('rate_limited');
    }
    // Keyed by the forwarded client address (TRUST_PROXY): another person behind the proxy signs in.
    const other = await client()
      .set(CLIENT, '198.51.100.20')
      .post('/api/auth/sign-in')
      .send({ email: coach.email, password: FACTORY_PASSWORD });
    expect(other.status).toBe(200);
  });

  it('sends every scheduled and event e-mail exactly once with both workers and schedulers running', async () => {
    // Event e-mails queued through each instance: a reset link for the coach and for the athlete.
    for (const email of [coach.email, athlete.user.email]) {
      const res = await client().post('/api/auth/forgot-password').send({ email });
      expect(res.status).toBeLessThan(300);
    }

    // Both instances ran the scheduler's catch-up tick at start under the pinned Tuesday evening:
    // the athlete's morning reminder (no weigh-in today) and the coach's weekly summary are due.
    const sends: { kind: string; user_id: string }[] = await t.dataSource.query(
      'SELECT kind, user_id FROM notification_sends ORDER BY kind',
    );
    expect(sends).toEqual(
      expect.arrayContaining([
        { kind: 'morning_reminder', user_id: athlete.user.id },
        { kind: 'weekly_summary', user_id: coach.id },
      ]),
    );

    type Row = { message_id: string; kind: string; status: string };
    let rows: Row[] = [];
    await eventually(async () => {
      rows = await t.dataSource.query('SELECT message_id, kind, status FROM outbox_messages');
      return rows.length > 0 && rows.every((r) => r.status === 'sent');
    }, 1500);
    // One outbox message per claimed send, plus the two reset e-mails.
    expect(rows).toHaveLength(sends.length + 2);

    const captured = await readAllCapturedMail(captureDir);
    const received = new Map<string, number>();
    for (const mail of captured) received.set(mail.messageId!, (received.get(mail.messageId!) ?? 0) + 1);
    expect([...received.keys()].sort()).toEqual(rows.map((r) => r.message_id).sort());
    expect([...received.values()].every((n) => n === 1)).toBe(true);

    // Both instances were there to do it: each answered requests and logged its worker's start.
    for (const instance of instances) expect(instance.output()).toContain('notification scheduler started');
  }, 60_000);
});
