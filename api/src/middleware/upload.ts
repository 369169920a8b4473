import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { LIMITS } from '@driftmark/shared';
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../errors.js';

/** Where multer puts uploads while a request runs: per process, emptied as each request ends. */
export function uploadTempDir(): string {
  return path.join(os.tmpdir(), 'driftmark-uploads', String(process.pid));
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
/** The largest body a refused upload is read to the end for (a full upload plus its fields). */
const MAX_DRAIN_BYTES = LIMITS.photosPerUpload * LIMITS.photoMaxBytes + MB;

const uploader = multer({
  storage: multer.diskStorage({
    destination: (_req, _file, cb) => {
      const dir = uploadTempDir();
      try {
        mkdirSync(dir, { recursive: true, mode: 0o700 });
        cb(null, dir);
      } catch (error) {
        cb(error as Error, dir);
      }
    },
    filename: (_req, _file, cb) => cb(null, `${randomUUID()}.upload`),
  }),
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

/** Removes the request's temp files (safe to call twice). */
export async function discardUploads(req: Request): Promise<void> {
  const files = Array.isArray(req.files) ? req.files : [];
  await Promise.all(files.map((f) => rm(f.path, { force: true })));
}

/** The files of a request that passed `photoUpload()`. */
export function uploadedFiles(req: Request): UploadedFile[] {
  const files = Array.isArray(req.files) ? req.files : [];
  return files.map((f) => ({ path: f.path, originalName: f.originalname, size: f.size }));
}

/**
 * Receives `multipart/form-data` with up to LIMITS.photosPerUpload files in `files` (each at most
 * LIMITS.photoMaxBytes) into a private temp folder; text fields land in `req.body`. Limits become
 * 413 payload_too_large / 400 validation_failed; anything multer wrote is gone before the error is
 * sent, and the temp files of a finished request are removed when the response closes (handlers
 * call `discardUploads` earlier, as soon as they are done with the files).
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
    res.once('close', () => void discardUploads(req));
    uploader(req, res, (error: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError) return next(fromMulter(error));
      next(error);
    });
  };
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
