import {
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  writeFileSync,
} from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { LIMITS, RELAXED_POSES } from '@driftmark/shared';
import sharp from 'sharp';
import request, { type Agent } from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { LocalFolderStorage, newStorageKey, type StorageAdapter } from '../../api/src/adapters/storage.js';
import { ConditionPhoto } from '../../api/src/entities/condition-photo.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { todayIn } from '../../api/src/lib/dates.js';
import { createLogger } from '../../api/src/logger.js';
import { sweepUploadTemp, uploadTempDir } from '../../api/src/middleware/upload.js';
import { AthleteRepository, type AthleteWithPeople } from '../../api/src/repositories/athlete.repository.js';
import { PhotoRepository } from '../../api/src/repositories/photo.repository.js';
import {
  databaseIdentity,
  OWNER_MARK,
  sweepPhotoStorage,
  type PhotoSweepReport,
} from '../../api/src/services/photo-sweep.service.js';
import { PHOTO_STAGING_LOCK, whileStaging, withStagingPaused } from '../../api/src/lib/staging-lock.js';
import { PhotoService } from '../../api/src/services/photo.service.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { eventually } from './setup/spawned-server.js';

/* ---------- files made here, no binary fixtures ---------- */

const solid = (width: number, height: number, colour = '#3a6f8f') =>
  sharp({ create: { width, height, channels: 3, background: colour } });

const jpeg = (width = 64, height = 48, colour?: string) => solid(width, height, colour).jpeg().toBuffer();
const png = (width = 50, height = 70) =>
  sharp({ create: { width, height, channels: 4, background: { r: 200, g: 40, b: 40, alpha: 0.5 } } })
    .png()
    .toBuffer();

/** A JPEG that carries GPS coordinates, a camera make and an orientation of 6 (rotate 90° clockwise). */
const jpegWithGpsAndOrientation = () =>
  solid(40, 20, '#884422')
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExif({
      IFD0: { Make: 'Driftmark Test Camera' },
      IFD3: {
        GPSLatitudeRef: 'N',
        GPSLatitude: '59/1 54/1 3/1',
        GPSLongitudeRef: 'E',
        GPSLongitude: '10/1 45/1 8/1',
      },
    })
    .toBuffer();

/** Whether an EXIF block holds the GPS IFD pointer (tag 0x8825), in either byte order. */
function hasGpsPointer(exif: Buffer | undefined): boolean {
  if (!exif) return false;
  for (let i = 0; i < exif.length - 1; i++) {
    if ((exif[i] === 0x88 && exif[i + 1] === 0x25) || (exif[i] === 0x25 && exif[i + 1] === 0x88)) return true;
  }
  return false;
}

function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(zlib.crc32(body));
  return Buffer.concat([length, body, crc]);
}

/** A valid 1-bit greyscale PNG of width × height, all black: 20,000² compresses to about 50 kB. */
function hugePng(width: number, height: number): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 1; // bit depth
  header[9] = 0; // greyscale
  const raw = Buffer.alloc((1 + Math.ceil(width / 8)) * height);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', header),
    pngChunk('IDAT', zlib.deflateSync(raw, { level: 9 })),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A JPEG with detail (so it has real scan data) cut off at 60 %. */
async function truncatedJpeg(): Promise<Buffer> {
  const noise = Buffer.alloc(300 * 200 * 3);
  for (let i = 0; i < noise.length; i++) noise[i] = (i * 7919) % 251;
  const full = await sharp(noise, { raw: { width: 300, height: 200, channels: 3 } })
    .jpeg()
    .toBuffer();
  return full.subarray(0, Math.floor(full.length * 0.6));
}

const SVG = Buffer.from(
  '<svg xmlns="http://www.w3.org/2000/svg" width="100" height="100"><rect width="100" height="100" fill="red"/></svg>',
);

/* ---------- the world ---------- */

let t: TestApp;
let uploadsDir: string;

beforeAll(async () => {
  uploadsDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-photos-test-'));
  t = await buildTestApp({ uploadsDir });
});
afterAll(async () => {
  await t.close();
  rmSync(uploadsDir, { recursive: true, force: true });
});

interface World {
  owner: User;
  coach: User;
  otherCoach: User;
  assistant: User;
  sharedAssistant: User;
  athlete: CreatedAthlete;
  otherAthlete: CreatedAthlete;
  outsider: User;
}
let w: World;

beforeEach(async () => {
  await t.reset();
  rmSync(uploadsDir, { recursive: true, force: true });
  const owner = await createOwner(t.dataSource);
  const teamId = owner.teamId;
  const coach = await createCoach(t.dataSource, { teamId });
  const otherCoach = await createCoach(t.dataSource, { teamId });
  const assistant = await createAssistant(t.dataSource, { teamId });
  const sharedAssistant = await createAssistant(t.dataSource, { teamId });
  const athlete = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Oslo' } });
  const otherAthlete = await createAthlete(t.dataSource, { coach });
  await shareAthlete(t.dataSource, athlete.athlete, sharedAssistant);
  const outsider = await createOwner(t.dataSource);
  w = { owner, coach, otherCoach, assistant, sharedAssistant, athlete, otherAthlete, outsider };
});

const as = (user: User) => signedIn(t.app, user.email, FACTORY_PASSWORD);
const today = () => todayIn('Europe/Oslo');

function storedFiles(dir = uploadsDir): string[] {
  try {
    return readdirSync(dir, { recursive: true, withFileTypes: true })
      .filter((e) => e.isFile())
      .map((e) => path.join(e.parentPath, e.name));
  } catch {
    return [];
  }
}
const rowCount = () => t.dataSource.getRepository(ConditionPhoto).count();

interface UploadFile {
  data: Buffer;
  name: string;
  type?: string;
}

function upload(
  agent: Agent,
  athleteId: string,
  files: UploadFile[],
  fields: { date?: string; pose?: string } = {},
) {
  let req = agent.post(`/api/athletes/${athleteId}/photos`);
  const date = 'date' in fields ? fields.date : today();
  const pose = 'pose' in fields ? fields.pose : 'Front relaxed';
  if (date !== undefined) req = req.field('date', date);
  if (pose !== undefined) req = req.field('pose', pose);
  for (const f of files)
    req = req.attach('files', f.data, { filename: f.name, contentType: f.type ?? 'image/jpeg' });
  return req;
}

async function fetchBytes(agent: Agent, url: string) {
  return agent.get(url).buffer(true).responseType('blob');
}

/* ---------- tests ---------- */

describe('uploading', () => {
  it('stores a JPEG and a PNG sent together and serves both sizes through the authorized route', async () => {
    const agent = await as(w.athlete.user);
    const res = await upload(agent, w.athlete.athlete.id, [
      { data: await jpeg(2400, 1800), name: 'front.jpg' },
      { data: await png(50, 70), name: 'side.png', type: 'image/png' },
    ]);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.data).toHaveLength(2);
    const [big, small] = res.body.data;
    // Display size: long edge 1600 at most, never enlarged.
    expect([big.width, big.height]).toEqual([1600, 1200]);
    expect([small.width, small.height]).toEqual([50, 70]);
    expect(big).toMatchObject({ date: today(), pose: 'Front relaxed' });
    expect(big.urls).toEqual({
      thumb: `/api/photos/${big.id}/thumb`,
      display: `/api/photos/${big.id}/display`,
    });

    expect(await rowCount()).toBe(2);
    // Two sizes each, under the athlete's folder, with random names that owe nothing to the upload.
    const files = storedFiles();
    expect(files).toHaveLength(4);
    for (const f of files) {
      expect(path.relative(uploadsDir, f)).toMatch(
        new RegExp(`^${w.athlete.athlete.id}/[0-9a-f]{32}\\.jpg$`),
      );
    }
    expect(storedFiles(uploadTempDir())).toEqual([]);

    const display = await fetchBytes(agent, big.urls.display);
    expect(display.status).toBe(200);
    expect(display.headers['content-type']).toBe('image/jpeg');
    // Private images: no browser or proxy keeps them (issue 12, item 7).
    expect(display.headers['cache-control']).toBe('no-store');
    expect(display.headers.pragma).toBe('no-cache');
    expect(display.headers['x-content-type-options']).toBe('nosniff');
    const meta = await sharp(display.body as Buffer).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['jpeg', 1600, 1200]);

    const thumb = await fetchBytes(agent, big.urls.thumb);
    expect(thumb.headers['cache-control']).toBe('no-store');
    expect(thumb.headers.pragma).toBe('no-cache');
    const thumbMeta = await sharp(thumb.body as Buffer).metadata();
    expect([thumbMeta.width, thumbMeta.height]).toEqual([320, 240]);

    const list = await agent.get(`/api/athletes/${w.athlete.athlete.id}/photos`);
    expect(list.status).toBe(200);
    expect(list.body.data.map((p: { id: string }) => p.id).sort()).toEqual([big.id, small.id].sort());
  });

  it('removes GPS and every other EXIF tag, and applies the orientation to the pixels', async () => {
    const input = await jpegWithGpsAndOrientation();
    const inputMeta = await sharp(input).metadata();
    // The input really carries what must not survive.
    expect(inputMeta.orientation).toBe(6);
    expect(hasGpsPointer(inputMeta.exif)).toBe(true);
    expect([inputMeta.width, inputMeta.height]).toEqual([40, 20]);

    const agent = await as(w.athlete.user);
    const res = await upload(agent, w.athlete.athlete.id, [{ data: input, name: 'IMG_0001.jpg' }]);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const [photo] = res.body.data;
    expect([photo.width, photo.height]).toEqual([20, 40]);

    for (const url of [photo.urls.display, photo.urls.thumb]) {
      const served = await fetchBytes(agent, url);
      const meta = await sharp(served.body as Buffer).metadata();
      expect(meta.exif, url).toBeUndefined();
      expect(meta.xmp, url).toBeUndefined();
      expect(meta.iptc, url).toBeUndefined();
      expect(meta.orientation, url).toBeUndefined();
      expect([meta.width, meta.height], url).toEqual([20, 40]);
      expect((served.body as Buffer).includes(Buffer.from('Driftmark Test Camera'))).toBe(false);
    }
  });

  it('answers a repeated upload of the same bytes with the first photo, not a duplicate', async () => {
    const agent = await as(w.athlete.user);
    const data = await jpeg(100, 80, '#123456');
    const first = await upload(agent, w.athlete.athlete.id, [{ data, name: 'a.jpg' }]);
    const again = await upload(agent, w.athlete.athlete.id, [
      { data, name: 'a.jpg' },
      { data, name: 'a-copy.jpg' },
    ]);
    expect(again.status).toBe(201);
    expect(again.body.data.map((p: { id: string }) => p.id)).toEqual([
      first.body.data[0].id,
      first.body.data[0].id,
    ]);
    expect(await rowCount()).toBe(1);
    expect(storedFiles()).toHaveLength(2);
  });

  it('shows the day’s photos in the day view and counts them in the history', async () => {
    const agent = await as(w.athlete.user);
    const id = w.athlete.athlete.id;
    const res = await upload(agent, id, [{ data: await jpeg(30, 40), name: 'a.jpg' }], {
      date: '2026-11-20',
    });
    expect(res.status).toBe(201);
    const day = await agent.get(`/api/athletes/${id}/days/2026-11-20`);
    expect(day.status).toBe(200);
    expect(day.body.data.photos).toEqual(res.body.data);
    const history = await agent.get(`/api/athletes/${id}/days?from=2026-11-01&to=2026-11-30`);
    expect(history.status).toBe(200);
    expect(history.body.data).toEqual([expect.objectContaining({ date: '2026-11-20', photoCount: 1 })]);
  });

  it('accepts WebP and AVIF', async () => {
    const agent = await as(w.athlete.user);
    const res = await upload(agent, w.athlete.athlete.id, [
      { data: await solid(30, 30).webp().toBuffer(), name: 'a.webp', type: 'image/webp' },
      { data: await solid(32, 24, '#aa3355').avif().toBuffer(), name: 'b.avif', type: 'image/avif' },
    ]);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.data.map((p: { width: number; height: number }) => [p.width, p.height])).toEqual([
      [30, 30],
      [32, 24],
    ]);
  });

  it('checks the date against the athlete’s own today and the pose against the team’s list', async () => {
    const kiritimati = await createAthlete(t.dataSource, {
      coach: w.coach,
      user: { timeZone: 'Pacific/Kiritimati' },
    });
    const agent = await as(kiritimati.user);
    const localToday = todayIn('Pacific/Kiritimati');
    const tomorrow = new Date(Date.parse(`${localToday}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
    const data = await jpeg();

    const future = await upload(agent, kiritimati.athlete.id, [{ data, name: 'a.jpg' }], { date: tomorrow });
    expect(future.status).toBe(400);
    expect(future.body.error.fields).toEqual({ date: 'That date is still in the future' });
    // The entries' history window too (shared dateWindow: 5 years back), and nothing is stored.
    const year = Number(localToday.slice(0, 4));
    const ancient = await upload(agent, kiritimati.athlete.id, [{ data, name: 'a.jpg' }], {
      date: `${year - 6}-01-15`,
    });
    expect(ancient.status).toBe(400);
    expect(ancient.body.error.fields).toEqual({ date: expect.stringMatching(/^No earlier than /) });
    expect(
      await t.dataSource.getRepository(ConditionPhoto).countBy({ athleteId: kiritimati.athlete.id }),
    ).toBe(0);

    const ok = await upload(agent, kiritimati.athlete.id, [{ data, name: 'a.jpg' }], { date: localToday });
    expect(ok.status).toBe(201);

    const badPose = await upload(agent, kiritimati.athlete.id, [{ data, name: 'a.jpg' }], {
      pose: 'Handstand',
    });
    expect(badPose.status).toBe(400);
    expect(badPose.body.error.fields).toEqual({ pose: 'Choose a pose from the list' });

    const missing = await upload(agent, kiritimati.athlete.id, [], { date: '', pose: '' });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.error.fields).sort()).toEqual(['date', 'files', 'pose']);

    const notMultipart = await agent
      .post(`/api/athletes/${kiritimati.athlete.id}/photos`)
      .send({ date: localToday, pose: 'Front relaxed' });
    expect(notMultipart.status).toBe(415);
    expect(await rowCount()).toBe(1);
  });

  it('refuses uploads without photo consent, with a message that says why', async () => {
    const noConsent = await createAthlete(t.dataSource, { coach: w.coach, athlete: { photoConsent: false } });
    const agent = await as(noConsent.user);
    const res = await upload(agent, noConsent.athlete.id, [{ data: await jpeg(), name: 'a.jpg' }]);
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/photo consent/i);
    expect(await rowCount()).toBe(0);
    expect(storedFiles()).toEqual([]);
    expect(storedFiles(uploadTempDir())).toEqual([]);
  });
});

describe('hostile files', () => {
  const cases: {
    name: string;
    make: () => Promise<UploadFile[]>;
    status: number;
    code: string;
    message: RegExp;
  }[] = [
    {
      name: 'a text file named .jpg',
      make: async () => [{ data: Buffer.from('just some words, not a picture\n'), name: 'notes.jpg' }],
      status: 415,
      code: 'unsupported_media_type',
      message: /"notes\.jpg" is not a JPEG, PNG, WebP or AVIF image/,
    },
    {
      name: 'a truncated JPEG',
      make: async () => [{ data: await truncatedJpeg(), name: 'cut.jpg' }],
      status: 400,
      code: 'validation_failed',
      message: /"cut\.jpg" could not be read/,
    },
    {
      name: 'a PNG of 20,000 × 20,000 pixels',
      make: async () => [{ data: hugePng(20_000, 20_000), name: 'bomb.png', type: 'image/png' }],
      status: 413,
      code: 'payload_too_large',
      message: /"bomb\.png" has more than 50 million pixels/,
    },
    {
      name: 'an SVG (even named .png)',
      make: async () => [{ data: SVG, name: 'vector.png', type: 'image/png' }],
      status: 415,
      code: 'unsupported_media_type',
      message: /"vector\.png" is not a JPEG, PNG, WebP or AVIF image/,
    },
    {
      name: 'a GIF',
      make: async () => [{ data: await solid(4, 4).gif().toBuffer(), name: 'a.gif', type: 'image/gif' }],
      status: 415,
      code: 'unsupported_media_type',
      message: /is not a JPEG, PNG, WebP or AVIF image/,
    },
    {
      name: 'a file over the size limit',
      make: async () => {
        const data = Buffer.alloc(LIMITS.photoMaxBytes + 1024);
        (await jpeg()).copy(data);
        return [{ data, name: 'huge.jpg' }];
      },
      status: 413,
      code: 'payload_too_large',
      message: /at most 15 MB/,
    },
    {
      name: 'too many files',
      make: async () => {
        const files: UploadFile[] = [];
        for (let i = 0; i <= LIMITS.photosPerUpload; i++)
          files.push({ data: await jpeg(20 + i, 20), name: `${i}.jpg` });
        return files;
      },
      status: 400,
      code: 'validation_failed',
      message: /at most 8 photos/,
    },
    {
      name: 'a good JPEG followed by a text file named .jpg (nothing of the good one is kept)',
      make: async () => [
        { data: await jpeg(), name: 'good.jpg' },
        { data: Buffer.from('GIF89a? no, text'), name: 'bad.jpg' },
      ],
      status: 415,
      code: 'unsupported_media_type',
      message: /"bad\.jpg" is not/,
    },
  ];

  it.each(cases)(
    'refuses $name with $status and leaves no file and no row',
    async ({ make, status, code, message }) => {
      const agent = await as(w.athlete.user);
      const res = await upload(agent, w.athlete.athlete.id, await make());
      expect(res.status, JSON.stringify(res.body)).toBe(status);
      expect(res.body.error.code).toBe(code);
      expect(res.body.error.message).toMatch(message);
      expect(res.body.error.fields?.files).toBeTruthy();
      expect(await rowCount()).toBe(0);
      expect(storedFiles()).toEqual([]);
      expect(storedFiles(uploadTempDir())).toEqual([]);
    },
  );
});

describe('failures after files were written', () => {
  async function withPeople(athleteId: string): Promise<AthleteWithPeople> {
    return (await new AthleteRepository(t.dataSource.manager).findWithPeople(athleteId))!;
  }

  it('removes every stored size when the storage fails part-way', async () => {
    const local = new LocalFolderStorage(uploadsDir);
    let puts = 0;
    const flaky: StorageAdapter = {
      put: (key, data, type) => local.put(key, data, type),
      stage: async (key, data, type) => {
        puts += 1;
        if (puts === 3) throw new Error('disk full');
        await local.stage(key, data, type);
      },
      publish: (key) => local.publish(key),
      get: (key) => local.get(key),
      delete: (key) => local.delete(key),
      exists: (key) => local.exists(key),
    };
    const scratch = mkdtempSync(path.join(os.tmpdir(), 'driftmark-photos-in-'));
    try {
      const files = [await jpeg(30, 30, '#111111'), await jpeg(30, 30, '#eeeeee')].map((data, i) => {
        const file = path.join(scratch, `${i}.upload`);
        writeFileSync(file, data);
        return { path: file, originalName: `${i}.jpg`, size: data.length };
      });
      const service = new PhotoService({
        dataSource: t.dataSource,
        config: t.config,
        logger: createLogger('silent'),
        storage: flaky,
      });
      await expect(
        service.upload(
          await withPeople(w.athlete.athlete.id),
          { date: today(), pose: 'Side relaxed' },
          files,
          new Date(),
        ),
      ).rejects.toThrow('disk full');
      expect(puts).toBe(3);
      expect(storedFiles()).toEqual([]);
      expect(await rowCount()).toBe(0);
    } finally {
      rmSync(scratch, { recursive: true, force: true });
    }
  });

  it('removes every stored size when writing the rows fails', async () => {
    await t.dataSource.query(`
      CREATE FUNCTION photos_test_refuse() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'refused by test'; END $$`);
    await t.dataSource.query(
      `CREATE TRIGGER photos_test_refuse BEFORE INSERT ON condition_photos FOR EACH ROW EXECUTE FUNCTION photos_test_refuse()`,
    );
    try {
      const agent = await as(w.athlete.user);
      const res = await upload(agent, w.athlete.athlete.id, [
        { data: await jpeg(), name: 'a.jpg' },
        { data: await png(), name: 'b.png', type: 'image/png' },
      ]);
      expect(res.status).toBe(500);
      expect(res.body.error.code).toBe('internal_error');
      expect(storedFiles()).toEqual([]);
      expect(storedFiles(uploadTempDir())).toEqual([]);
    } finally {
      await t.dataSource.query('DROP TRIGGER photos_test_refuse ON condition_photos');
      await t.dataSource.query('DROP FUNCTION photos_test_refuse()');
    }
    expect(await rowCount()).toBe(0);
  });
});

describe('access', () => {
  async function onePhoto() {
    const agent = await as(w.athlete.user);
    const res = await upload(agent, w.athlete.athlete.id, [{ data: await jpeg(), name: 'a.jpg' }]);
    expect(res.status).toBe(201);
    return res.body.data[0] as { id: string; urls: { thumb: string; display: string } };
  }

  it('lets the assigned coach, the owner and a shared assistant see the photos', async () => {
    const photo = await onePhoto();
    for (const user of [w.coach, w.owner, w.sharedAssistant]) {
      const agent = await as(user);
      const list = await agent.get(`/api/athletes/${w.athlete.athlete.id}/photos`);
      expect(list.status, user.role).toBe(200);
      expect(list.body.data).toHaveLength(1);
      const file = await fetchBytes(agent, photo.urls.display);
      expect(file.status, user.role).toBe(200);
      expect(file.headers['content-type']).toBe('image/jpeg');
    }
  });

  it('answers 404 to another athlete, an unshared assistant or coach, and another team', async () => {
    const photo = await onePhoto();
    for (const user of [w.otherAthlete.user, w.assistant, w.otherCoach, w.outsider]) {
      const agent = await as(user);
      const list = await agent.get(`/api/athletes/${w.athlete.athlete.id}/photos`);
      expect(list.status, user.email).toBe(404);
      for (const url of [photo.urls.thumb, photo.urls.display]) {
        const file = await agent.get(url);
        expect(file.status, `${user.email} ${url}`).toBe(404);
        expect(file.headers['content-type']).toMatch(/application\/json/);
      }
    }
  });

  it('answers 401 to a visitor who is not signed in', async () => {
    const photo = await onePhoto();
    const res = await request(t.app).get(photo.urls.display);
    expect(res.status).toBe(401);
  });

  it('lets only the athlete upload and delete', async () => {
    const photo = await onePhoto();
    const data = await jpeg(10, 10, '#000000');

    for (const [user, status] of [
      [w.coach, 403],
      [w.sharedAssistant, 403],
      [w.owner, 403],
      [w.assistant, 404],
      [w.otherAthlete.user, 404],
      [w.outsider, 404],
    ] as const) {
      const agent = await as(user);
      const up = await upload(agent, w.athlete.athlete.id, [{ data, name: 'x.jpg' }]);
      expect(up.status, `upload as ${user.email}`).toBe(status);
      const del = await agent.delete(`/api/photos/${photo.id}`);
      expect(del.status, `delete as ${user.email}`).toBe(status);
    }
    expect(await rowCount()).toBe(1);
    expect(storedFiles()).toHaveLength(2);
    expect(storedFiles(uploadTempDir())).toEqual([]);

    const athlete = await as(w.athlete.user);
    expect((await athlete.delete(`/api/photos/${photo.id}`)).status).toBe(204);
    expect(await rowCount()).toBe(0);
    expect(storedFiles()).toEqual([]);
    expect((await athlete.get(photo.urls.display)).status).toBe(404);
  });

  it('filters the gallery by pose and dates', async () => {
    const agent = await as(w.athlete.user);
    const id = w.athlete.athlete.id;
    const send = async (date: string, pose: string, colour: string) =>
      expect(
        (await upload(agent, id, [{ data: await jpeg(20, 20, colour), name: 'a.jpg' }], { date, pose }))
          .status,
      ).toBe(201);
    await send('2026-10-01', 'Front relaxed', '#100000');
    await send('2026-10-08', 'Front relaxed', '#200000');
    await send('2026-10-08', 'Back relaxed', '#300000');
    await send('2026-10-15', 'Front relaxed', '#400000');

    const all = await agent.get(`/api/athletes/${id}/photos`);
    expect(all.body.data.map((p: { date: string }) => p.date)).toEqual([
      '2026-10-15',
      '2026-10-08',
      '2026-10-08',
      '2026-10-01',
    ]);
    const front = await agent.get(
      `/api/athletes/${id}/photos?pose=${encodeURIComponent('Front relaxed')}&from=2026-10-02`,
    );
    expect(front.body.data.map((p: { date: string }) => p.date)).toEqual(['2026-10-15', '2026-10-08']);
    const bad = await agent.get(`/api/athletes/${id}/photos?from=2026-10-09&to=2026-10-01`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ to: 'The end date is before the start date' });
  });
});

describe('team poses', () => {
  it('lists the relaxed poses plus the team’s own, which the owner and coaches edit', async () => {
    const athlete = await as(w.athlete.user);
    expect((await athlete.get('/api/team/poses')).body.data).toEqual([...RELAXED_POSES]);

    const coach = await as(w.coach);
    const put = await coach
      .put('/api/team/poses')
      .send({ poses: ['Front double biceps', '  Side   chest ', 'front double BICEPS', 'Front relaxed'] });
    expect(put.status).toBe(200);
    expect(put.body.data).toEqual([...RELAXED_POSES, 'Front double biceps', 'Side chest']);
    expect((await athlete.get('/api/team/poses')).body.data).toEqual(put.body.data);

    // The athlete can now use a team pose (matched ignoring case, stored as the team spells it).
    const res = await upload(athlete, w.athlete.athlete.id, [{ data: await jpeg(), name: 'a.jpg' }], {
      pose: 'side chest',
    });
    expect(res.status).toBe(201);
    expect(res.body.data[0].pose).toBe('Side chest');

    for (const user of [w.assistant, w.athlete.user]) {
      const agent = await as(user);
      expect((await agent.put('/api/team/poses').send({ poses: [] })).status).toBe(403);
    }
    const tooLong = await coach.put('/api/team/poses').send({ poses: ['x'.repeat(61)] });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.fields).toHaveProperty('poses.0');

    // Another team sees only its own list.
    const outsider = await as(w.outsider);
    expect((await outsider.get('/api/team/poses')).body.data).toEqual([...RELAXED_POSES]);
  });
});

describe('files and rows after a kill', () => {
  /** Every file counts as older than this: the sweep's cut-off, far in the future. */
  const AFTER_EVERYTHING = new Date(8.64e15);

  it('publishes the files a committed row claims and removes every file no row claims', async () => {
    const athleteId = w.athlete.athlete.id;
    const storage = new LocalFolderStorage(uploadsDir);
    const database = databaseIdentity(t.config.databaseUrl);
    const sweep = (before: Date, db = database) =>
      sweepPhotoStorage({
        dataSource: t.dataSource,
        storage,
        database: db,
        before,
        logger: createLogger('silent'),
      });

    // A finished upload: row and published files.
    const agent = await as(w.athlete.user);
    const done = await upload(agent, athleteId, [{ data: await jpeg(), name: 'done.jpg' }]);
    expect(done.status).toBe(201);
    const [kept] = done.body.data as { id: string; urls: { thumb: string; display: string } }[];

    // Killed before the commit: staged files, no row.
    const data = await jpeg(20, 20, '#222222');
    const beforeCommit = [newStorageKey(athleteId, 'image/jpeg'), newStorageKey(athleteId, 'image/jpeg')];
    for (const key of beforeCommit) await storage.stage(key, data, 'image/jpeg');

    // Killed after the commit, before the publish: staged files and their row.
    const afterCommit = {
      thumb: newStorageKey(athleteId, 'image/jpeg'),
      display: newStorageKey(athleteId, 'image/jpeg'),
    };
    for (const key of Object.values(afterCommit)) await storage.stage(key, data, 'image/jpeg');
    const [committed] = await new PhotoRepository(t.dataSource.manager).insertMany([
      {
        athleteId,
        localDate: today(),
        pose: 'Front relaxed',
        width: 20,
        height: 20,
        thumbKey: afterCommit.thumb,
        displayKey: afterCommit.display,
        contentType: 'image/jpeg',
        bytes: data.length * 2,
        contentHash: 'c'.repeat(64),
      },
    ]);
    // The unstaged file is not served yet.
    expect((await agent.get(`/api/photos/${committed!.id}/display`)).status).toBe(404);

    // Killed between a row's delete and its files': a published file no row claims.
    const orphan = newStorageKey(athleteId, 'image/jpeg');
    await storage.put(orphan, data, 'image/jpeg');
    // An older version's temp file.
    const stray = path.join(uploadsDir, athleteId, `${'d'.repeat(32)}.jpg.0a1b2c.tmp`);
    writeFileSync(stray, data);

    // Files changed after the cut-off (an upload still running elsewhere) are left alone.
    expect(await sweep(new Date(0))).toEqual({ published: 0, orphans: 0, pending: 0, strays: 0 });
    // The first sweep marked the folder for this database; a server on another database leaves it.
    expect(readFileSync(path.join(uploadsDir, OWNER_MARK), 'utf8').trim()).toBe(database);
    expect(await sweep(AFTER_EVERYTHING, '127.0.0.1:1/another')).toEqual({
      published: 0,
      orphans: 0,
      pending: 0,
      strays: 0,
    });
    expect(storedFiles().filter((f) => !f.endsWith(OWNER_MARK))).toHaveLength(8);

    expect(await sweep(AFTER_EVERYTHING)).toEqual({ published: 2, orphans: 1, pending: 2, strays: 1 });
    const claimed = (await t.dataSource.getRepository(ConditionPhoto).find()).flatMap((p) => [
      p.thumbKey,
      p.displayKey,
    ]);
    expect(claimed).toHaveLength(4);
    expect(
      storedFiles()
        .map((f) => path.relative(uploadsDir, f))
        .filter((f) => f !== OWNER_MARK)
        .sort(),
    ).toEqual(claimed.sort());

    expect((await agent.get(kept!.urls.display)).status).toBe(200);
    expect((await agent.get(`/api/photos/${committed!.id}/display`)).status).toBe(200);
    expect(await sweep(AFTER_EVERYTHING)).toEqual({ published: 0, orphans: 0, pending: 0, strays: 0 });
  });

  it('waits for an upload between staging and commit (another instance) before judging its files', async () => {
    const athleteId = w.athlete.athlete.id;
    const storage = new LocalFolderStorage(uploadsDir);
    const data = await jpeg(20, 20, '#335577');
    const keys = {
      thumb: newStorageKey(athleteId, 'image/jpeg'),
      display: newStorageKey(athleteId, 'image/jpeg'),
    };
    let sweeping: Promise<PhotoSweepReport> | undefined;
    await whileStaging(t.dataSource, async (lockHolder) => {
      for (const key of Object.values(keys)) await storage.stage(key, data, 'image/jpeg');
      // An instance starting now: its sweep counts every file as older than its start.
      sweeping = withStagingPaused(t.dataSource, () =>
        sweepPhotoStorage({
          dataSource: t.dataSource,
          storage,
          database: databaseIdentity(t.config.databaseUrl),
          before: new Date(8.64e15),
          logger: createLogger('silent'),
        }),
      );
      // It waits for the staging lock (PostgreSQL lists its request as not granted) …
      await eventually(async () => {
        const rows: { n: number }[] = await t.dataSource.query(
          `SELECT count(*)::int AS n FROM pg_locks WHERE locktype = 'advisory' AND objid = $1 AND NOT granted`,
          [PHOTO_STAGING_LOCK],
        );
        return rows[0]!.n > 0;
      });
      // … while the upload commits its row on the connection holding the lock.
      await lockHolder.transaction((tx) =>
        new PhotoRepository(tx).insertMany([
          {
            athleteId,
            localDate: today(),
            pose: 'Front relaxed',
            width: 20,
            height: 20,
            thumbKey: keys.thumb,
            displayKey: keys.display,
            contentType: 'image/jpeg',
            bytes: data.length * 2,
            contentHash: 'e'.repeat(64),
          },
        ]),
      );
    });
    // Then it finds the files claimed: published, not removed as a dead upload's.
    expect(await sweeping).toEqual({ published: 2, orphans: 0, pending: 0, strays: 0 });
    for (const key of Object.values(keys)) expect(await storage.exists(key)).toBe(true);
  });

  it('empties the upload temp folders of processes that are gone and keeps those of running ones', async () => {
    const root = path.dirname(uploadTempDir());
    const host = os.hostname();
    // Above Linux's largest pid_max (2^22), so no process can have it.
    const gone = path.join(root, `${host}-4194399`);
    mkdirSync(path.join(gone, 'a-killed-upload'), { recursive: true });
    writeFileSync(path.join(gone, 'a-killed-upload', 'x.upload'), 'partial');
    const running = path.join(root, `${host}-${process.ppid}`);
    const madeRunning = !existsSync(running);
    mkdirSync(running, { recursive: true });
    // Another host's instance sharing the temp folder: its process ids mean nothing here.
    const otherHost = path.join(root, `another-host.test-4194399`);
    mkdirSync(otherHost, { recursive: true });
    try {
      expect(await sweepUploadTemp()).toBeGreaterThanOrEqual(1);
      expect(existsSync(gone)).toBe(false);
      expect(existsSync(running)).toBe(true);
      expect(existsSync(otherHost)).toBe(true);
    } finally {
      if (madeRunning) rmSync(running, { recursive: true, force: true });
      rmSync(otherHost, { recursive: true, force: true });
    }
  });
});
