import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import JSZip from 'jszip';
import sharp from 'sharp';
import type { Response } from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Mark } from '../../api/src/entities/mark.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { fluidBody, macroMealBody, weighInBody } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// Tuesday 1 December 2026, 11:00 in Madrid.
const now = new Date('2026-12-01T10:00:00Z');

let t: TestApp;
let uploadsDir: string;
beforeAll(async () => {
  uploadsDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-export-test-'));
  t = await buildTestApp({ uploadsDir }, { clock: () => now });
});
afterAll(async () => {
  await t.close();
  rmSync(uploadsDir, { recursive: true, force: true });
});

let coach: User;
let me: CreatedAthlete;
let coachAgent: Awaited<ReturnType<typeof signedIn>>;
let athleteAgent: Awaited<ReturnType<typeof signedIn>>;
let base: string;

beforeEach(async () => {
  await t.reset();
  const owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Madrid' } });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  athleteAgent = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
});

/** Collects a binary body as one Buffer. */
function binary(res: Response, done: (err: Error | null, body: Buffer) => void) {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}

async function download(agent: typeof athleteAgent) {
  const res = await agent
    .get('/api/me/export')
    .buffer(true)
    .parse(binary as never);
  return res;
}

describe('GET /api/me/export', () => {
  it('zips the athlete’s JSON and photo files', async () => {
    expect(
      (await athleteAgent.put(`${base}/days/2026-11-30/weigh-in`).send(weighInBody({ weight: 71 }))).status,
    ).toBe(200);
    expect((await athleteAgent.post(`${base}/days/2026-11-30/meals`).send(macroMealBody())).status).toBe(201);
    expect((await athleteAgent.post(`${base}/days/2026-11-30/fluids`).send(fluidBody())).status).toBe(201);
    // Written directly: the mark route's e-mail side is not this test's concern.
    await t.dataSource.getRepository(Mark).save({
      athleteId: me.athlete.id,
      authorId: coach.id,
      metric: 'weight',
      fromDate: '2026-11-30',
      toDate: '2026-11-30',
      note: 'Nice steady week',
    });
    const photo = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#3a6f8f' } })
      .jpeg()
      .toBuffer();
    const up = await athleteAgent
      .post(`${base}/photos`)
      .field('date', '2026-11-30')
      .field('pose', 'Front relaxed')
      .attach('files', photo, { filename: 'front.jpg', contentType: 'image/jpeg' });
    expect(up.status).toBe(201);

    const res = await download(athleteAgent);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/zip');
    expect(res.headers['content-disposition']).toBe(
      'attachment; filename="driftmark-my-data-2026-12-01.zip"',
    );
    const zip = await JSZip.loadAsync(res.body as Buffer);
    const names = Object.keys(zip.files).sort();
    expect(names).toEqual(
      expect.arrayContaining([
        'profile.json',
        'days.json',
        'plans.json',
        'marks.json',
        'weekly-check-ins.json',
        'flags.json',
        'body-composition.json',
        'making-weight.json',
        'photos.json',
      ]),
    );
    const read = async (name: string) =>
      JSON.parse(await zip.file(name)!.async('string')) as Record<string, Record<string, unknown>[]> & {
        profile: Record<string, unknown>;
      };
    expect((await read('profile.json')).profile).toMatchObject({ id: me.athlete.id, email: me.user.email });
    const days = await read('days.json');
    expect(days.weigh_ins).toHaveLength(1);
    expect(days.weigh_ins?.[0]).toMatchObject({ local_date: '2026-11-30', athlete_id: me.athlete.id });
    expect(days.meal_entries).toHaveLength(1);
    expect(days.fluid_entries).toHaveLength(1);
    expect((await read('marks.json')).marks?.[0]).toMatchObject({
      note: 'Nice steady week',
      from_date: '2026-11-30',
    });
    const photos = (await read('photos.json')).condition_photos as { file: string }[];
    expect(photos).toHaveLength(1);
    const file = zip.file(photos[0]!.file);
    expect(file).not.toBeNull();
    const meta = await sharp(await file!.async('nodebuffer')).metadata();
    expect(meta.format).toMatch(/jpeg|webp/);
    expect(photos[0]!.file).toMatch(/^photos\/2026-11-30-/);
  });

  it('answers 404 to staff (no archive of their own)', async () => {
    expect((await download(coachAgent)).status).toBe(404);
  });
});
