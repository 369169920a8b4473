/**
 * A 24-megapixel photo (6000 × 4000 JPEG, made here) through the upload route against bare sharp
 * making the same outputs as api/src/adapters/images.ts: the metadata read, then the display
 * (1600 px long edge, mozjpeg quality 84) and thumb (320 px, quality 76) sizes, each from the
 * input with orientation applied and a white background, and the SHA-256 of the input.
 *
 * The API process's peak memory rise per upload: VmRSS before, then the peak (VmHWM) after, the
 * peak being reset first through /proc/<pid>/clear_refs (Linux, "5" resets the peak RSS).
 */
import { createHash } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { LIMITS } from '@driftmark/shared';
import sharp from 'sharp';
import { expectStatus } from './http.js';

export const PHOTO_WIDTH = 6000;
export const PHOTO_HEIGHT = 4000;

/** A photo-like JPEG: smooth shapes with fine grain, so it compresses as a camera picture does (a few MB). */
export async function makePhoto(): Promise<Buffer> {
  const small = await sharp({
    create: {
      width: 600,
      height: 400,
      channels: 3,
      background: '#7a8ea3',
      noise: { type: 'gaussian', mean: 120, sigma: 60 },
    },
  })
    .png()
    .toBuffer();
  const grain = await sharp(small)
    .resize(PHOTO_WIDTH, PHOTO_HEIGHT, { kernel: 'cubic' })
    .blur(2)
    .raw()
    .toBuffer({ resolveWithObject: true });
  // Fine grain over the smooth picture (a camera sensor's noise), with a fixed pattern.
  const pixels = grain.data;
  let seed = 42;
  for (let i = 0; i < pixels.length; i += 1) {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    pixels[i] = Math.max(0, Math.min(255, pixels[i]! + ((seed >> 16) % 13) - 6));
  }
  return sharp(pixels, { raw: { width: PHOTO_WIDTH, height: PHOTO_HEIGHT, channels: 3 } })
    .jpeg({ quality: 90 })
    .toBuffer();
}

/** What processPhoto does with sharp, bare. */
export async function bareSharp(input: Buffer): Promise<number> {
  const started = performance.now();
  const options = { limitInputPixels: LIMITS.photoMaxPixels, failOn: 'error' as const, sequentialRead: true };
  await sharp(input, options).metadata();
  const encode = (edge: number, quality: number) =>
    sharp(input, options)
      .rotate()
      .resize({ width: edge, height: edge, fit: 'inside', withoutEnlargement: true })
      .flatten({ background: '#ffffff' })
      .jpeg({ quality, mozjpeg: true })
      .toBuffer();
  await encode(1600, 84);
  await encode(320, 76);
  createHash('sha256').update(input).digest('hex');
  return performance.now() - started;
}

function statusKb(pid: number, field: 'VmRSS' | 'VmHWM'): number {
  const match = new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
  return match ? Number(match[1]) * 1024 : NaN;
}

export interface UploadFigures {
  ms: number;
  rssRiseBytes: number;
}

/** One upload of `photo` as the athlete; the API's peak RSS rise during it. */
export async function uploadThroughRoute(options: {
  baseUrl: string;
  cookie: string;
  athleteId: string;
  date: string;
  photo: Buffer;
  apiPid: number;
}): Promise<UploadFigures> {
  const boundary = `----driftmark-bench-${Date.now()}`;
  const field = (name: string, value: string) =>
    `--${boundary}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n${value}\r\n`;
  const body = Buffer.concat([
    Buffer.from(field('date', options.date) + field('pose', 'Front relaxed')),
    Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="bench.jpg"\r\n` +
        'Content-Type: image/jpeg\r\n\r\n',
    ),
    options.photo,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  ]);
  const before = statusKb(options.apiPid, 'VmRSS');
  writeFileSync(`/proc/${options.apiPid}/clear_refs`, '5');
  const res = await expectStatus(
    options.baseUrl,
    {
      method: 'POST',
      path: `/api/athletes/${options.athleteId}/photos`,
      headers: { cookie: options.cookie, 'content-type': `multipart/form-data; boundary=${boundary}` },
      body,
    },
    201,
  );
  return { ms: res.ms, rssRiseBytes: statusKb(options.apiPid, 'VmHWM') - before };
}
