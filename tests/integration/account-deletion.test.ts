import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startMailWorker, type MailWorker } from '../../api/src/jobs/mail.worker.js';
import { signDeletionToken } from '../../api/src/lib/deletion-token.js';
import { createLogger } from '../../api/src/logger.js';
import { Mark } from '../../api/src/entities/mark.entity.js';
import { MarkReply } from '../../api/src/entities/mark-reply.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { startSmtpFake, waitForMail, type SmtpFake } from '../../scripts/src/lib/smtp-fake.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { fluidBody, macroMealBody, weighInBody } from './check-ins-helpers.js';
import { browser, buildTestApp, signedIn, type TestApp } from './setup/app.js';

const TABLES = [
  'teams',
  'users',
  'athletes',
  'weigh_ins',
  'fluid_entries',
  'meal_entries',
  'condition_photos',
  'marks',
  'mark_replies',
  'sessions',
  'consents',
] as const;

let t: TestApp;
let uploadsDir: string;
let captureDir: string;
let smtp: SmtpFake;
let worker: MailWorker;

beforeAll(async () => {
  uploadsDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-deletion-photos-'));
  captureDir = await mkdtemp(path.join(os.tmpdir(), 'driftmark-deletion-mail-'));
  smtp = await startSmtpFake({ port: 0, captureDir });
  t = await buildTestApp({
    uploadsDir,
    smtpUrl: `smtp://127.0.0.1:${smtp.port}`,
    mailCaptureDir: captureDir,
  });
  worker = await startMailWorker({
    config: t.config,
    dataSource: t.dataSource,
    logger: createLogger('silent'),
    tuning: { pollingIntervalSeconds: 0.5, retryDelaySeconds: 1, sweepCron: null, stopTimeoutMs: 5_000 },
  });
});
afterAll(async () => {
  await worker?.stop();
  await t?.close();
  await smtp?.close();
  rmSync(uploadsDir, { recursive: true, force: true });
  await rm(captureDir, { recursive: true, force: true });
});

let coach: User;
let me: CreatedAthlete;
let other: CreatedAthlete;
/** Yesterday in UTC (the athletes' zone): every logged time is in the past. */
const today = () => new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);

async function counts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of TABLES) {
    const [row] = await t.dataSource.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM "${table}"`);
    out[table] = row?.n ?? 0;
  }
  return out;
}
const files = () => {
  try {
    return readdirSync(uploadsDir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile());
  } catch {
    return [];
  }
};

/** One weigh-in, meal, fluid and photo, a coach's mark with the athlete's reply. */
async function history(athlete: CreatedAthlete) {
  const agent = await signedIn(t.app, athlete.user.email, FACTORY_PASSWORD);
  const base = `/api/athletes/${athlete.athlete.id}`;
  expect((await agent.put(`${base}/days/${today()}/weigh-in`).send(weighInBody())).status).toBe(200);
  expect((await agent.post(`${base}/days/${today()}/meals`).send(macroMealBody())).status).toBe(201);
  expect((await agent.post(`${base}/days/${today()}/fluids`).send(fluidBody())).status).toBe(201);
  const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#3a6f8f' } })
    .jpeg()
    .toBuffer();
  const up = await agent
    .post(`${base}/photos`)
    .field('date', today())
    .field('pose', 'Front relaxed')
    .attach('files', jpeg, { filename: 'front.jpg', contentType: 'image/jpeg' });
  expect(up.status).toBe(201);
  const mark = await t.dataSource.getRepository(Mark).save({
    athleteId: athlete.athlete.id,
    authorId: coach.id,
    metric: 'weight',
    fromDate: today(),
    toDate: today(),
    note: 'Steady',
  });
  await t.dataSource
    .getRepository(MarkReply)
    .save({ markId: mark.id, authorId: athlete.user.id, body: 'Thanks!' });
  return agent;
}

beforeEach(async () => {
  await t.reset();
  rmSync(uploadsDir, { recursive: true, force: true });
  const owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, { coach, user: { timeZone: 'UTC' } });
  other = await createAthlete(t.dataSource, { coach, user: { timeZone: 'UTC' } });
});

describe('account deletion by e-mail', () => {
  it('requests, confirms by the e-mailed link, removes the athlete’s rows and files, keeps the team’s', async () => {
    const agent = await history(me);
    await history(other);
    const before = await counts();
    expect(files().length).toBe(4); // two photos × (thumb + display)

    const requested = await agent.post('/api/me/deletion-request');
    expect(requested.status).toBe(202);
    expect(requested.body.data).toEqual({ sentTo: me.user.email, expiresInMinutes: 60 });
    const ask = await waitForMail(
      captureDir,
      (m) => m.to.includes(me.user.email) && /confirm deleting/i.test(m.subject),
    );
    const link = /https?:\/\/\S+\/account\/delete\?token=(\S+)/.exec(ask.text);
    expect(link).not.toBeNull();
    expect(ask.html).toContain('/account/delete?token=');
    // Nothing is gone before the confirmation.
    expect(await counts()).toEqual(before);

    const token = decodeURIComponent(link![1]!);
    const confirmed = await browser(t.app).post('/api/me/deletion/confirm').send({ token });
    expect(confirmed.status).toBe(204);

    const after = await counts();
    expect(after).toEqual({
      ...before,
      users: before.users! - 1,
      athletes: before.athletes! - 1,
      weigh_ins: before.weigh_ins! - 1,
      fluid_entries: before.fluid_entries! - 1,
      meal_entries: before.meal_entries! - 1,
      condition_photos: before.condition_photos! - 1,
      marks: before.marks! - 1,
      mark_replies: before.mark_replies! - 1,
      sessions: after.sessions, // the athlete's sessions went with the user row
      consents: after.consents,
    });
    expect(after.sessions).toBeLessThan(before.sessions!);
    expect(after.teams).toBe(before.teams);
    // The other athlete's photo files stay; this athlete's folder is empty.
    const left = files().map((f) => path.join(f.parentPath, f.name));
    expect(left).toHaveLength(2);
    expect(left.every((f) => f.includes(other.athlete.id.toLowerCase()))).toBe(true);
    // The old session no longer works, the link is used up.
    expect((await agent.get('/api/me')).status).toBe(401);
    expect((await browser(t.app).post('/api/me/deletion/confirm').send({ token })).status).toBe(410);

    const done = await waitForMail(
      captureDir,
      (m) => m.to.includes(me.user.email) && /deleted/i.test(m.subject),
    );
    expect(done.text).toMatch(/have been deleted/);
    // The coach and the other athlete still sign in.
    expect(
      (await signedIn(t.app, other.user.email, FACTORY_PASSWORD).then((a) => a.get('/api/me'))).status,
    ).toBe(200);
  });

  it('refuses an expired or forged token and staff requests', async () => {
    const old = signDeletionToken(me.user.id, t.config.jwtSecret, new Date(Date.now() - 2 * 60 * 60 * 1000));
    expect((await browser(t.app).post('/api/me/deletion/confirm').send({ token: old })).status).toBe(410);
    const forged = signDeletionToken(me.user.id, 'another-secret-another-secret-xx', new Date());
    expect((await browser(t.app).post('/api/me/deletion/confirm').send({ token: forged })).status).toBe(410);
    const coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    expect((await coachAgent.post('/api/me/deletion-request')).status).toBe(404);
    expect((await counts()).users).toBe(4);
  });
});
