/**
 * The photo migration (`photos-migrate`, api/src/services/photo-migration.service.ts) both ways
 * between a folder and a bucket of the S3 fake: cut off part-way, finished by a second run through
 * the real command, every file checked by SHA-256 (node:crypto) against its source, then served
 * from the bucket, then moved back to a new folder with the sources removed.
 */
import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, unlinkSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Readable } from 'node:stream';
import { fileURLToPath } from 'node:url';
import sharp from 'sharp';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LocalFolderStorage } from '../../api/src/adapters/storage.js';
import { S3Storage } from '../../api/src/adapters/s3-storage.js';
import type { S3Settings } from '../../api/src/config.js';
import { PhotoRepository } from '../../api/src/repositories/photo.repository.js';
import { migratePhotos } from '../../api/src/services/photo-migration.service.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createOwner } from '../factories/users.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { bucketNames, freshTestBucket } from './setup/s3.js';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

// Friday 20 November 2026, 11:00 in Oslo.
const now = new Date('2026-11-20T10:00:00Z');

const sha256 = (data: Buffer) => createHash('sha256').update(data).digest('hex');

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

/** Runs `api/src/cli.ts photos-migrate <args>` as the operator would; resolves with its exit code and output. */
function photosMigrate(
  args: string[],
  env: Record<string, string>,
): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      ['--import', 'tsx', path.join(repoRoot, 'api', 'src', 'cli.ts'), 'photos-migrate', ...args],
      {
        cwd: repoRoot,
        env: { ...process.env, TSX_TSCONFIG_PATH: path.join(repoRoot, 'api', 'tsconfig.json'), ...env },
      },
      (error, stdout, stderr) =>
        resolve({ code: error ? Number((error as { code?: number }).code ?? 1) : 0, stdout, stderr }),
    );
  });
}

let folderApp: TestApp;
let s3: S3Settings;
let bucket: S3Storage;
let folderDir: string;
let backDir: string;
let athlete: CreatedAthlete;

beforeAll(async () => {
  folderDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-migrate-from-'));
  backDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-migrate-back-'));
  s3 = await freshTestBucket('photos-migrate');
  bucket = S3Storage.fromSettings(s3);
  folderApp = await buildTestApp({ uploadsDir: folderDir }, { clock: () => now });
  await folderApp.reset();
  const owner = await createOwner(folderApp.dataSource);
  athlete = await createAthlete(folderApp.dataSource, { coach: owner, user: { timeZone: 'Europe/Oslo' } });
});
afterAll(async () => {
  await folderApp.close();
  rmSync(folderDir, { recursive: true, force: true });
  rmSync(backDir, { recursive: true, force: true });
});

/** The env the command reads: the test database, a folder, the bucket. */
function commandEnv(uploadsDir: string): Record<string, string> {
  return {
    APP_MODE: 'test',
    DATABASE_URL: folderApp.config.databaseUrl,
    UPLOADS_DIR: uploadsDir,
    S3_BUCKET: s3.bucket,
  };
}

async function allKeys(): Promise<string[]> {
  const photos = await new PhotoRepository(folderApp.dataSource.manager).keysPage(null, 100);
  return photos.flatMap((p) => [p.thumbKey, p.displayKey]);
}

const fileHash = (dir: string, key: string) => sha256(readFileSync(path.join(dir, key)));
const objectHash = async (key: string) => sha256(await readAll((await bucket.get(key))!.stream));

describe('moving photo files between the folder and a bucket', () => {
  it('copies to the bucket resumably, verified by hash, and back with the sources removed', async () => {
    // Three photos uploaded while the folder is the store: six files.
    const agent: Agent = await signedIn(folderApp.app, athlete.user.email, FACTORY_PASSWORD);
    const urls: string[] = [];
    for (const colour of ['#102030', '#405060', '#708090']) {
      const data = await sharp({ create: { width: 60, height: 40, channels: 3, background: colour } })
        .jpeg()
        .toBuffer();
      const res = await agent
        .post(`/api/athletes/${athlete.athlete.id}/photos`)
        .field('date', '2026-11-20')
        .field('pose', 'Front relaxed')
        .attach('files', data, { filename: 'a.jpg', contentType: 'image/jpeg' });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      urls.push(res.body.data[0].urls.display);
    }
    const keys = await allKeys();
    expect(keys).toHaveLength(6);

    // A first run cut off after two files (Ctrl-C, or a kill between files) …
    const stop = new AbortController();
    const cut = await migratePhotos({
      dataSource: folderApp.dataSource,
      from: new LocalFolderStorage(folderDir),
      to: bucket,
      signal: stop.signal,
      onObject: (r) => {
        if (r.objects === 2) stop.abort();
      },
    });
    expect(cut).toMatchObject({ objects: 2, copied: 2, alreadyThere: 0 });
    // … and a kill mid-copy: other bytes under the third key, a staged object under the fourth.
    await bucket.put(keys[2]!, Buffer.from('not the photo'), 'image/jpeg');
    await bucket.stage(keys[3]!, Buffer.from('half a photo'), 'image/jpeg');

    const toS3 = await photosMigrate(['--to', 's3'], commandEnv(folderDir));
    expect(toS3.code, toS3.stderr).toBe(0);
    expect(toS3.stdout).toContain(
      `Photo files from ${folderDir} to s3://${s3.bucket}: 6 named by the rows; 4 copied and verified (sha256), ` +
        '1 of them replacing different bytes; 2 already there and verified; 0 missing in both stores.',
    );
    expect(await bucketNames(s3)).toEqual([...keys].sort());
    for (const key of keys) expect(await objectHash(key), key).toBe(fileHash(folderDir, key));

    // A second run finds everything in place.
    const again = await photosMigrate(['--to', 's3'], commandEnv(folderDir));
    expect(again.stdout).toContain('0 copied and verified (sha256); 6 already there and verified');

    // The app on the bucket serves the same bytes.
    const bucketApp = await buildTestApp({ photoStorage: 's3', s3 }, { clock: () => now });
    try {
      const reader = await signedIn(bucketApp.app, athlete.user.email, FACTORY_PASSWORD);
      for (const url of urls) {
        const fromBucket = await reader.get(url).buffer(true).responseType('blob');
        const fromFolder = await agent.get(url).buffer(true).responseType('blob');
        expect(fromBucket.status).toBe(200);
        expect(sha256(fromBucket.body as Buffer)).toBe(sha256(fromFolder.body as Buffer));
      }
    } finally {
      await bucketApp.close();
    }

    // Back to a new folder, removing each object from the bucket once its copy is verified.
    const back = await photosMigrate(['--to', 'folder', '--remove-source'], commandEnv(backDir));
    expect(back.code, back.stderr).toBe(0);
    expect(back.stdout).toContain(
      `Photo files from s3://${s3.bucket} to ${backDir}: 6 named by the rows; 6 copied and verified (sha256); ` +
        '0 already there and verified; 0 missing in both stores; 6 removed from the source.',
    );
    expect(await bucketNames(s3)).toEqual([]);
    for (const key of keys) expect(fileHash(backDir, key), key).toBe(fileHash(folderDir, key));
    // Run again, the sources gone: each file is found in the destination alone.
    const backAgain = await photosMigrate(['--to', 'folder'], commandEnv(backDir));
    expect(backAgain.stdout).toContain('0 copied and verified (sha256); 6 already there and verified');

    // A file lost in both stores is named, and the command exits 1.
    unlinkSync(path.join(backDir, keys[5]!));
    const lost = await photosMigrate(['--to', 's3'], commandEnv(backDir));
    expect(lost.code).toBe(1);
    expect(lost.stdout).toContain('5 copied and verified (sha256); 0 already there and verified; 1 missing');
    expect(lost.stdout).toContain(`  missing: ${keys[5]}`);
  });

  it('refuses a bad direction and a missing bucket, naming the setting', async () => {
    const noDirection = await photosMigrate(['--to', 'disk'], commandEnv(folderDir));
    expect(noDirection.code).toBe(1);
    expect(noDirection.stderr).toContain('--to must be s3 or folder');
    const { S3_BUCKET: _unused, ...withoutBucket } = commandEnv(folderDir);
    const noBucket = await photosMigrate(['--to', 's3'], { ...withoutBucket, S3_BUCKET: '' });
    expect(noBucket.code).toBe(1);
    expect(noBucket.stderr).toContain('S3_BUCKET: is required');
  });
});
