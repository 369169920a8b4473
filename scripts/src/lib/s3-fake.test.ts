import { createHash } from 'node:crypto';
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { Readable } from 'node:stream';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { S3Storage } from '../../../api/src/adapters/s3-storage.js';
import { loadStorageConfig } from '../../../api/src/config.js';
import { s3FakeEnv, startS3Fake, type S3Fake } from './s3-fake.js';

let dir: string;
let fake: S3Fake;
let storage: S3Storage;

const KEY = `athlete-1/${'a'.repeat(32)}.jpg`;

beforeAll(async () => {
  dir = await mkdtemp(path.join(os.tmpdir(), 'dm-s3-fake-'));
  fake = await startS3Fake({ port: 0, directory: dir, buckets: ['unit-photos'] });
  const config = loadStorageConfig({ PHOTO_STORAGE: 's3', ...s3FakeEnv(fake.endpoint, 'unit-photos') });
  storage = S3Storage.fromSettings(config.s3!);
});
afterAll(async () => {
  await fake.close();
  await rm(dir, { recursive: true, force: true });
});

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

const sha256 = (data: Buffer) => createHash('sha256').update(data).digest('hex');

async function listed() {
  const entries = [];
  for await (const entry of storage.list()) entries.push(entry.key ?? `stray:${entry.name}`);
  return entries;
}

describe('the S3 fake with the S3 storage adapter', () => {
  it('listens on a real port when asked for port 0', () => {
    expect(fake.port).toBeGreaterThan(0);
    expect(fake.endpoint).toBe(`http://127.0.0.1:${fake.port}`);
  });

  it('stages out of sight, publishes, serves the same bytes and deletes', async () => {
    const data = Buffer.alloc(300_000);
    for (let i = 0; i < data.length; i++) data[i] = (i * 7919) % 251;

    await storage.stage(KEY, data, 'image/jpeg');
    expect(await storage.get(KEY)).toBeNull();
    expect(await storage.exists(KEY)).toBe(false);
    expect(await listed()).toEqual([KEY]);

    await storage.publish(KEY);
    // Publishing again is fine (a sweep and the upload may both do it).
    await storage.publish(KEY);
    const object = await storage.get(KEY);
    expect(object).toMatchObject({ size: data.length, contentType: 'image/jpeg' });
    expect(sha256(await readAll(object!.stream))).toBe(sha256(data));

    await storage.delete(KEY);
    await storage.delete(KEY);
    expect(await storage.exists(KEY)).toBe(false);
    expect(await listed()).toEqual([]);
  });

  it('refuses keys the server did not make and bytes of another type', async () => {
    await expect(storage.put('../escape.jpg', Buffer.from('x'), 'image/jpeg')).rejects.toThrow(
      /Invalid storage key/,
    );
    await expect(storage.put(KEY, Buffer.from('x'), 'image/webp')).rejects.toThrow(/does not match/);
  });

  it('keeps one owner mark: the first one written stands', async () => {
    expect(await storage.readMark()).toBeNull();
    await storage.writeMark('127.0.0.1:5432/one\n');
    await storage.writeMark('127.0.0.1:5432/two\n');
    expect(await storage.readMark()).toBe('127.0.0.1:5432/one\n');
    // The mark is not an object of ours, nor a stray.
    expect(await listed()).toEqual([]);
  });
});
