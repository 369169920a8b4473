/**
 * Photo upload and read latency with the photo files in an S3 bucket (the local S3 fake, s3rver)
 * against the same in the folder, measured in one run: a second built API server on the same
 * database with PHOTO_STORAGE=s3, and the bench's own server (the folder). Uploads and reads
 * alternate between the two, so a slower moment of the machine falls on both alike.
 *
 * An upload: a photo of PHOTO_EDGE px long edge (a phone picture the web app sends as it is)
 * through the route: checked, re-encoded to both sizes, staged, the row, published. A read: the
 * display size (at most 1600 px) through the authorized route, the whole body.
 */
import { mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import { startBuiltServer, startS3Fake, waitForHealth, type RunningS3Fake } from '../lib/app.js';
import { pickFreePort } from '../lib/ports.js';
import type { Service } from '../lib/proc.js';
import { expectStatus, request, signIn } from './http.js';
import { median, percentile } from './stats.js';

/** The long edge of the uploaded photo (12 megapixels at 4:3). */
export const PHOTO_EDGE = 4000;
const BUCKET = 'driftmark-bench';

export interface StorageSide {
  uploadMs: number[];
  readMs: number[];
}

export interface PhotoStorageFigures {
  photoBytes: number;
  folder: StorageSide;
  s3: StorageSide;
}

export interface PhotoStorageBench {
  /** The API server on the bucket. */
  s3BaseUrl: string;
  run(options: {
    folderBaseUrl: string;
    email: string;
    password: string;
    athleteId: string;
    /** The athlete's today; uploads go to the days before it, one day each (no repeat is merged). */
    today: string;
    uploads: number;
    reads: number;
    photo: Buffer;
  }): Promise<PhotoStorageFigures>;
  stop(): Promise<void>;
}

function multipart(date: string, photo: Buffer): { boundary: string; body: Buffer } {
  const boundary = `----driftmark-bench-${Date.now()}`;
  const field = (name: string, value: string) =>
    `--${boundary}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n${value}\r\n`;
  const body = Buffer.concat([
    Buffer.from(field('date', date) + field('pose', 'Front relaxed')),
    Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="bench.jpg"\r\n` +
        'Content-Type: image/jpeg\r\n\r\n',
    ),
    photo,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  ]);
  return { boundary, body };
}

function daysBefore(date: string, days: number): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() - days);
  return d.toISOString().slice(0, 10);
}

/** The bench photo (6000 × 4000) scaled to PHOTO_EDGE, as a camera JPEG of that size. */
export function phonePhoto(photo: Buffer): Promise<Buffer> {
  return sharp(photo).resize({ width: PHOTO_EDGE }).jpeg({ quality: 90 }).toBuffer();
}

/** Starts the S3 fake and a second API server on it (`serverEnv`: the bench server's environment). */
export async function openPhotoStorageBench(options: {
  serverEnv: NodeJS.ProcessEnv;
  outDir: string;
  exclude: number[];
}): Promise<PhotoStorageBench> {
  const directory = path.join(options.outDir, 's3-fake');
  rmSync(directory, { recursive: true, force: true });
  mkdirSync(directory, { recursive: true });
  let fake: RunningS3Fake | undefined;
  let server: Service | undefined;
  let s3BaseUrl = '';
  try {
    fake = await startS3Fake({
      preferredPort: 4569,
      directory,
      buckets: [BUCKET],
      exclude: options.exclude,
      logFile: path.join(options.outDir, 's3-fake.log'),
    });
    const port = await pickFreePort(3950, { exclude: [...options.exclude, fake.port] });
    s3BaseUrl = `http://127.0.0.1:${port}`;
    server = startBuiltServer(
      {
        ...options.serverEnv,
        PORT: String(port),
        APP_ORIGIN: s3BaseUrl,
        PHOTO_STORAGE: 's3',
        ...fake.env,
        S3_BUCKET: BUCKET,
      },
      path.join(options.outDir, 'api-s3.log'),
    );
    await waitForHealth(s3BaseUrl, server);
  } catch (error) {
    await server?.stop('SIGTERM', 15_000);
    await fake?.service.stop('SIGTERM', 5_000);
    throw error;
  }
  const s3Server = server;
  const s3Fake = fake;

  return {
    s3BaseUrl,
    async run(run) {
      const sides = [
        { name: 'folder' as const, baseUrl: run.folderBaseUrl },
        { name: 's3' as const, baseUrl: s3BaseUrl },
      ];
      const cookies = {
        folder: await signIn(run.folderBaseUrl, run.email, run.password),
        s3: await signIn(s3BaseUrl, run.email, run.password),
      };
      const figures: PhotoStorageFigures = {
        photoBytes: run.photo.length,
        folder: { uploadMs: [], readMs: [] },
        s3: { uploadMs: [], readMs: [] },
      };
      const photoIds: Record<'folder' | 's3', string[]> = { folder: [], s3: [] };
      for (let i = 0; i < run.uploads; i += 1) {
        for (const [k, side] of sides.entries()) {
          // Each upload its own day (folder: odd days back, bucket: even), so none is merged with another.
          const { boundary, body } = multipart(daysBefore(run.today, 2 * i + k + 1), run.photo);
          const res = await expectStatus(
            side.baseUrl,
            {
              method: 'POST',
              path: `/api/athletes/${run.athleteId}/photos`,
              headers: {
                cookie: cookies[side.name],
                'content-type': `multipart/form-data; boundary=${boundary}`,
              },
              body,
            },
            201,
          );
          figures[side.name].uploadMs.push(res.ms);
          photoIds[side.name].push(
            (JSON.parse(res.body.toString('utf8')) as { data: { id: string }[] }).data[0]!.id,
          );
        }
      }
      for (let i = 0; i < run.reads; i += 1) {
        for (const side of sides) {
          const ids = photoIds[side.name];
          const res = await request(side.baseUrl, {
            path: `/api/photos/${ids[i % ids.length]}/display`,
            headers: { cookie: cookies[side.name] },
          });
          if (res.status !== 200) throw new Error(`reading a photo from ${side.name} answered ${res.status}`);
          figures[side.name].readMs.push(res.ms);
        }
      }
      return figures;
    },
    async stop() {
      await s3Server.stop('SIGTERM', 15_000);
      await s3Fake.service.stop('SIGTERM', 5_000);
    },
  };
}

export function summarize(side: StorageSide): { upload: number; read: number; readP95: number } {
  return { upload: median(side.uploadMs), read: median(side.readMs), readP95: percentile(side.readMs, 95) };
}
