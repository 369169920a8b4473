import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { LIMITS, stripControlCharacters } from '@driftmark/shared';
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../errors.js';

/**
 * Where multer puts uploads while a request runs: per process, one folder per upload inside it,
 * removed as each upload ends. The folder is named by host and process id: several instances may
 * share a temp folder (containers on one volume), and a process id means something only on its host.
 */
export function uploadTempDir(): string {
  return path.join(uploadTempRoot(), `${os.hostname()}-${process.pid}`);
}

function uploadTempRoot(): string {
  return path.join(os.tmpdir(), 'driftmark-uploads');
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    // EPERM: alive, someone else's.
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * At start, before any upload: removes this process's temp folder and those of this host's
 * processes that are gone (a kill leaves its folder behind); folders of running servers, and of
 * other hosts (whose processes this one cannot see), stay. Returns how many went.
 */
export async function sweepUploadTemp(): Promise<number> {
  let names: string[];
  try {
    names = await readdir(uploadTempRoot());
  } catch {
    return 0;
  }
  const host = `${os.hostname()}-`;
  let removed = 0;
  for (const name of names) {
    // Another host's folder (or a name that is not ours): that host's own start sweeps it.
    if (!name.startsWith(host)) continue;
    const pid = Number(name.slice(host.length));
    if (Number.isInteger(pid) && pid > 0 && pid !== process.pid && processAlive(pid)) continue;
    await rm(path.join(uploadTempRoot(), name), { recursive: true, force: true });
    removed += 1;
  }
  return removed;
}

/**
 * Each upload's own folder under `uploadTempDir()`. Removing the folder removes whatever multer
 * wrote for the request, including a file it was still writing when the client went away.
 */
const uploadDirs = new WeakMap<Request, string>();

/** Uploads whose temp folder is not yet removed (see `uploadsSettled`). */
const unsettled = new Set<Promise<void>>();

/**
 * Resolves once every upload in progress now has ended and its temp folder is gone: the server
 * awaits it when shutting down, tests after dropping a connection.
 */
export async function uploadsSettled(): Promise<void> {
  await Promise.all([...unsettled]);
}

/** A file received with the request, still in the temp folder. */
export interface UploadedFile {
  /** Temp path (random name chosen here, never the client's). */
  path: string;
  /** The client's file name, for messages only. */
  originalName: string;
  size: number;
}

/** The multipart field that carries the files. */
export const FILES_FIELD = 'files';

const MB = 1024 * 1024;
/** The largest multipart body: a full upload plus its fields. A larger Content-Length is refused unread. */
export const MAX_UPLOAD_BYTES = LIMITS.photosPerUpload * LIMITS.photoMaxBytes + MB;
/** The largest body a refused upload is read to the end for. */
const MAX_DRAIN_BYTES = MAX_UPLOAD_BYTES;

const uploader = multer({
  storage: multer.diskStorage({
    destination: (req, _file, cb) => {
      const dir = uploadDirs.get(req);
      if (!dir) return cb(new Error('The upload has no temp folder.'), '');
      try {
        mkdirSync(dir, { recursive: true, mode: 0o700 });
        cb(null, dir);
      } catch (error) {
        cb(error as Error, dir);
      }
    },
    filename: (_req, _file, cb) => cb(null, `${randomUUID()}.upload`),
  }),
  // File names are sent as UTF-8 by browsers; busboy's default (latin1) turns "é" into "Ã©".
  defParamCharset: 'utf8',
  limits: {
    fileSize: LIMITS.photoMaxBytes,
    files: LIMITS.photosPerUpload,
    // date and pose, plus a little room; every value is short.
    fields: 10,
    fieldSize: 1024,
    fieldNameSize: 100,
    parts: LIMITS.photosPerUpload + 10,
    headerPairs: 200,
  },
}).array(FILES_FIELD, LIMITS.photosPerUpload);

function fromMulter(error: multer.MulterError): AppError {
  switch (error.code) {
    case 'LIMIT_FILE_SIZE':
      return new AppError(
        'payload_too_large',
        `Each photo can be at most ${Math.round(LIMITS.photoMaxBytes / MB)} MB.`,
        { files: `A photo is larger than ${Math.round(LIMITS.photoMaxBytes / MB)} MB.` },
      );
    case 'LIMIT_FILE_COUNT':
      return new AppError('validation_failed', `Upload at most ${LIMITS.photosPerUpload} photos at once.`, {
        files: `Choose at most ${LIMITS.photosPerUpload} photos.`,
      });
    case 'LIMIT_UNEXPECTED_FILE':
      // multer reports a file beyond the field's maxCount the same way as a file in another field.
      return error.field === FILES_FIELD
        ? new AppError('validation_failed', `Upload at most ${LIMITS.photosPerUpload} photos at once.`, {
            files: `Choose at most ${LIMITS.photosPerUpload} photos.`,
          })
        : new AppError('validation_failed', `Send the photos in the "${FILES_FIELD}" field.`);
    default:
      return new AppError('validation_failed', 'The upload could not be read. Please try again.');
  }
}

/**
 * Removes the request's temp folder with every file in it (safe to call twice). Never rejects: a
 * folder that cannot be removed is logged, and the answer to the request does not depend on it.
 */
export async function discardUploads(req: Request): Promise<void> {
  const dir = uploadDirs.get(req);
  if (!dir) return;
  try {
    await rm(dir, { recursive: true, force: true });
  } catch (err) {
    req.log.warn({ err, dir }, 'could not remove an upload temp folder');
  }
}

/** The client's file name for messages: control characters removed, NFC, at most 200 characters. */
export function cleanFileName(name: string): string {
  return stripControlCharacters(name).normalize('NFC').trim().slice(0, 200);
}

/** The files of a request that passed `photoUpload()`. */
export function uploadedFiles(req: Request): UploadedFile[] {
  const files = Array.isArray(req.files) ? req.files : [];
  return files.map((f) => ({ path: f.path, originalName: cleanFileName(f.originalname), size: f.size }));
}

/** The client went away before the whole body arrived; nobody reads the answer, the log does. */
function cutOff(): AppError {
  return new AppError('validation_failed', 'The upload was cut off before it finished. Please try again.', {
    files: 'The upload did not finish.',
  });
}

/**
 * Receives `multipart/form-data` with up to LIMITS.photosPerUpload files in `files` (each at most
 * LIMITS.photoMaxBytes) into a private temp folder; text fields land in `req.body`. Limits become
 * 413 payload_too_large / 400 validation_failed, a body cut off by the client 400. The request's
 * temp folder is removed once multer has let go of the request and the response has closed,
 * whichever way it ended (handlers call `discardUploads` earlier, as soon as they are done with
 * the files).
 */
export function photoUpload(): RequestHandler {
  return (req, res, next) => {
    if (!req.is('multipart/form-data')) {
      return next(
        new AppError('unsupported_media_type', 'Send the photos as multipart/form-data.', {
          files: 'Choose at least one photo.',
        }),
      );
    }
    // Gone while the steps before the upload ran: multer would wait for a body that never comes.
    if (req.destroyed || res.closed) return next(cutOff());

    uploadDirs.set(req, path.join(uploadTempDir(), randomUUID()));
    let read = false;
    let closed = false;
    let settle!: () => void;
    const settled = new Promise<void>((resolve) => (settle = resolve));
    unsettled.add(settled);
    // Before multer has called back, it may still be writing a file into the folder.
    const cleanUp = () => {
      if (!read || !closed) return;
      void discardUploads(req).then(() => {
        unsettled.delete(settled);
        settle();
      });
    };
    res.once('close', () => {
      closed = true;
      cleanUp();
    });

    uploader(req, res, (error: unknown) => {
      read = true;
      cleanUp();
      if (!error) return next();
      if (error instanceof multer.MulterError) return next(fromMulter(error));
      if (req.destroyed && !req.complete) return next(cutOff());
      if (error instanceof AppError) return next(error);
      // busboy's refusals of a malformed body (bad part headers, a broken boundary…) are the
      // client's: answer 400, never 500. Failures writing the temp file stay server errors.
      if (isBodyError(error)) {
        req.log.info({ err: error }, 'multipart body refused');
        return next(new AppError('validation_failed', 'The upload could not be read. Please try again.'));
      }
      next(error);
    });
  };
}

/** An error about the multipart body itself (not a file system error such as ENOSPC). */
function isBodyError(error: unknown): boolean {
  if (!(error instanceof Error)) return false;
  const code = (error as NodeJS.ErrnoException).code;
  return typeof code !== 'string' || !code.startsWith('E');
}

/**
 * For handlers that refuse a multipart request before reading it (not signed in, not allowed):
 * reads the rest of the body away first, so the client is not cut off while still sending.
 */
export function drainBeforeError(req: Request, error: unknown, next: (err?: unknown) => void): void {
  if (!req.readable || req.destroyed || req.readableEnded) return next(error);
  // Only bodies a real upload could have; anything larger is cut off with the answer.
  const length = Number(req.get('content-length'));
  if (!Number.isFinite(length) || length > MAX_DRAIN_BYTES) {
    req.res?.setHeader('Connection', 'close');
    return next(error);
  }
  let done = false;
  const finish = () => {
    if (done) return;
    done = true;
    next(error);
  };
  req.once('end', finish);
  req.once('error', finish);
  req.once('close', finish);
  req.resume();
}
