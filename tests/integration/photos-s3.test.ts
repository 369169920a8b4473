/**
 * Photos in an S3-compatible bucket (PHOTO_STORAGE=s3) through the HTTP routes, against the S3 fake
 * the test runner starts (s3rver, signatures checked): upload, both sizes served only after the
 * access check, delete, cleanup when the rows fail, and the sweep of what a kill leaves behind.
 */
import { createHash } from 'node:crypto';
import { readdirSync } from 'node:fs';
import type { Readable } from 'node:stream';
import JSZip from 'jszip';
import sharp from 'sharp';
import request, { type Agent, type Response } from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { newStorageKey } from '../../api/src/adapters/storage.js';
import { S3Storage } from '../../api/src/adapters/s3-storage.js';
import type { S3Settings } from '../../api/src/config.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { createLogger } from '../../api/src/logger.js';
import { uploadTempDir } from '../../api/src/middleware/upload.js';
import { PhotoRepository } from '../../api/src/repositories/photo.repository.js';
import {
  databaseIdentity,
  OWNER_MARK,
  sweepPhotoStorage,
} from '../../api/src/services/photo-sweep.service.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { bucketNames, emptyBucket, freshTestBucket } from './setup/s3.js';

// Friday 20 November 2026, 11:00 in Oslo.
const now = new Date('2026-11-20T10:00:00Z');
const DAY = '2026-11-20';

const jpeg = (width: number, height: number, colour = '#3a6f8f') =>
  sharp({ create: { width, height, channels: 3, background: colour } })
    .jpeg()
    .toBuffer();

const sha256 = (data: Buffer) => createHash('sha256').update(data).digest('hex');

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

let t: TestApp;
let s3: S3Settings;
let storage: S3Storage;

beforeAll(async () => {
  s3 = await freshTestBucket('photos-s3');
  t = await buildTestApp({ photoStorage: 's3', s3 }, { clock: () => now });
  storage = S3Storage.fromSettings(s3);
});
afterAll(() => t.close());

let coach: User;
let outsider: User;
let athlete: CreatedAthlete;

beforeEach(async () => {
  await t.reset();
  await emptyBucket(s3);
  const owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  athlete = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Oslo' } });
  outsider = await createOwner(t.dataSource);
});

const as = (user: User) => signedIn(t.app, user.email, FACTORY_PASSWORD);
const photoNames = async () => (await bucketNames(s3)).filter((name) => name !== OWNER_MARK);

function upload(agent: Agent, files: { data: Buffer; name: string }[]) {
  let req = agent.post(`/api/athletes/${athlete.athlete.id}/photos`).field('date', DAY);
  req = req.field('pose', 'Front relaxed');
  for (const f of files) req = req.attach('files', f.data, { filename: f.name, contentType: 'image/jpeg' });
  return req;
}

const fetchBytes = (agent: Agent, url: string) => agent.get(url).buffer(true).responseType('blob');

describe('photos in an S3 bucket', () => {
  it('stores both sizes in the bucket and serves them through the authorized route', async () => {
    const agent = await as(athlete.user);
    const res = await upload(agent, [{ data: await jpeg(2400, 1800), name: 'front.jpg' }]);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const [photo] = res.body.data as { id: string; urls: { thumb: string; display: string } }[];

    const row = await new PhotoRepository(t.dataSource.manager).findById(photo!.id);
    expect(await photoNames()).toEqual([row!.displayKey, row!.thumbKey].sort());
    for (const name of await photoNames())
      expect(name).toMatch(new RegExp(`^${athlete.athlete.id}/[0-9a-f]{32}\\.jpg$`));
    expect(readdirSync(uploadTempDir())).toEqual([]);

    for (const [size, key, dims] of [
      ['display', row!.displayKey, [1600, 1200]],
      ['thumb', row!.thumbKey, [320, 240]],
    ] as const) {
      const served = await fetchBytes(agent, photo!.urls[size]);
      expect(served.status, size).toBe(200);
      expect(served.headers['content-type']).toBe('image/jpeg');
      expect(served.headers['cache-control']).toBe('no-store');
      expect(served.headers['x-content-type-options']).toBe('nosniff');
      const body = served.body as Buffer;
      expect(Number(served.headers['content-length'])).toBe(body.length);
      // The bytes served are the bytes in the bucket.
      expect(sha256(body)).toBe(sha256(await readAll((await storage.get(key))!.stream)));
      const meta = await sharp(body).metadata();
      expect([meta.format, meta.width, meta.height]).toEqual(['jpeg', ...dims]);
    }

    // The assigned coach reads it too; another team's owner and a visitor do not.
    expect((await fetchBytes(await as(coach), photo!.urls.display)).status).toBe(200);
    const stranger = await as(outsider);
    for (const url of [photo!.urls.thumb, photo!.urls.display]) {
      const answer = await stranger.get(url);
      expect(answer.status, url).toBe(404);
      expect(answer.headers['content-type']).toMatch(/application\/json/);
    }
    expect((await request(t.app).get(photo!.urls.display)).status).toBe(401);
    expect((await stranger.delete(`/api/photos/${photo!.id}`)).status).toBe(404);
    expect(await photoNames()).toHaveLength(2);

    // The athlete deletes it: row and both objects go.
    expect((await agent.delete(`/api/photos/${photo!.id}`)).status).toBe(204);
    expect(await photoNames()).toEqual([]);
    expect((await agent.get(photo!.urls.display)).status).toBe(404);
  });

  it('puts the files from the bucket into the athlete’s data archive', async () => {
    const agent = await as(athlete.user);
    const res = await upload(agent, [{ data: await jpeg(64, 48), name: 'a.jpg' }]);
    expect(res.status).toBe(201);
    const row = await new PhotoRepository(t.dataSource.manager).findById(res.body.data[0].id);
    const archive = await agent
      .get('/api/me/export')
      .buffer(true)
      .parse(((answer: Response, done: (err: Error | null, body: Buffer) => void) => {
        const chunks: Buffer[] = [];
        answer.on('data', (c: Buffer) => chunks.push(c));
        answer.on('end', () => done(null, Buffer.concat(chunks)));
      }) as never);
    expect(archive.status).toBe(200);
    const zip = await JSZip.loadAsync(archive.body as Buffer);
    const listed = JSON.parse(await zip.file('photos.json')!.async('string')) as {
      condition_photos: { file: string }[];
    };
    const file = await zip.file(listed.condition_photos[0]!.file)!.async('nodebuffer');
    expect(sha256(file)).toBe(sha256(await readAll((await storage.get(row!.displayKey))!.stream)));
  });

  it('removes the staged objects when writing the rows fails', async () => {
    await t.dataSource.query(`
      CREATE FUNCTION photos_s3_test_refuse() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'refused by test'; END $$`);
    await t.dataSource.query(
      `CREATE TRIGGER photos_s3_test_refuse BEFORE INSERT ON condition_photos FOR EACH ROW EXECUTE FUNCTION photos_s3_test_refuse()`,
    );
    try {
      const agent = await as(athlete.user);
      const res = await upload(agent, [
        { data: await jpeg(40, 30), name: 'a.jpg' },
        { data: await jpeg(30, 40, '#aa0000'), name: 'b.jpg' },
      ]);
      expect(res.status).toBe(500);
      expect(await photoNames()).toEqual([]);
    } finally {
      await t.dataSource.query('DROP TRIGGER photos_s3_test_refuse ON condition_photos');
      await t.dataSource.query('DROP FUNCTION photos_s3_test_refuse()');
    }
  });

  it('answers 503 with Retry-After and keeps no row when the bucket cannot be reached', async () => {
    // The same database, a bucket on a port nothing listens on.
    const down = await buildTestApp(
      { photoStorage: 's3', s3: { ...s3, endpoint: 'http://127.0.0.1:1' } },
      { clock: () => now },
    );
    try {
      const agent = await signedIn(down.app, athlete.user.email, FACTORY_PASSWORD);
      let req = agent.post(`/api/athletes/${athlete.athlete.id}/photos`).field('date', DAY);
      req = req.field('pose', 'Front relaxed').attach('files', await jpeg(40, 30), {
        filename: 'a.jpg',
        contentType: 'image/jpeg',
      });
      const res = await req;
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('storage_unavailable');
      expect(res.headers['retry-after']).toBeDefined();
      const [{ count }] = await t.dataSource.query(
        'SELECT count(*)::int AS count FROM condition_photos WHERE athlete_id = $1',
        [athlete.athlete.id],
      );
      expect(count).toBe(0);
    } finally {
      await down.close();
    }
  });

  it('sweeps what a kill leaves in the bucket: publishes what a row claims, removes the rest', async () => {
    const athleteId = athlete.athlete.id;
    const database = databaseIdentity(t.config.databaseUrl);
    const sweep = (before: Date, db = database) =>
      sweepPhotoStorage({
        dataSource: t.dataSource,
        storage,
        database: db,
        before,
        logger: createLogger('silent'),
      });
    const data = await jpeg(20, 20, '#222222');

    // Killed before the commit: a staged object, no row.
    const beforeCommit = newStorageKey(athleteId, 'image/jpeg');
    await storage.stage(beforeCommit, data, 'image/jpeg');
    // Killed after the commit, before the publish: staged objects and their row.
    const thumbKey = newStorageKey(athleteId, 'image/jpeg');
    const displayKey = newStorageKey(athleteId, 'image/jpeg');
    await storage.stage(thumbKey, data, 'image/jpeg');
    await storage.stage(displayKey, data, 'image/jpeg');
    const [committed] = await new PhotoRepository(t.dataSource.manager).insertMany([
      {
        athleteId,
        localDate: DAY,
        pose: 'Front relaxed',
        width: 20,
        height: 20,
        thumbKey,
        displayKey,
        contentType: 'image/jpeg',
        bytes: data.length * 2,
        contentHash: 'c'.repeat(64),
      },
    ]);
    const agent = await as(athlete.user);
    expect((await agent.get(`/api/photos/${committed!.id}/display`)).status).toBe(404);
    // Killed between a row's delete and its objects': a published object no row claims.
    const orphan = newStorageKey(athleteId, 'image/jpeg');
    await storage.put(orphan, data, 'image/jpeg');

    // Objects newer than the cut-off (an upload running on another instance) are left alone.
    expect(await sweep(new Date(0))).toEqual({ published: 0, orphans: 0, pending: 0, strays: 0 });
    // The first sweep marked the bucket for this database; a server on another database leaves it.
    expect((await storage.readMark())?.trim()).toBe(database);
    const afterEverything = new Date(8.64e15);
    expect(await sweep(afterEverything, '127.0.0.1:1/another')).toEqual({
      published: 0,
      orphans: 0,
      pending: 0,
      strays: 0,
    });
    expect(await photoNames()).toHaveLength(4);

    expect(await sweep(afterEverything)).toEqual({ published: 2, orphans: 1, pending: 1, strays: 0 });
    expect(await photoNames()).toEqual([displayKey, thumbKey].sort());
    const served = await fetchBytes(agent, `/api/photos/${committed!.id}/display`);
    expect(served.status).toBe(200);
    expect(sha256(served.body as Buffer)).toBe(sha256(data));
  });
});
