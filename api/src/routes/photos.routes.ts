import { pipeline } from 'node:stream/promises';
import { isoDate, LIMITS, text, uuid, photoView, photoUploadFields } from '@driftmark/shared';
import { Router, type Request, type RequestHandler } from 'express';
import { z } from 'zod';
import { notFound } from '../errors.js';
import { authenticate } from '../middleware/authenticate.js';
import { discardUploads, drainBeforeError, photoUpload, uploadedFiles } from '../middleware/upload.js';
import { dated, validate } from '../middleware/validate.js';
import type { AthleteAction } from '../policies/athlete.policy.js';
import { PhotoRepository } from '../repositories/photo.repository.js';
import { assertPhotoConsent, PhotoService } from '../services/photo.service.js';
import { loadAthleteById } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });
const photoParams = z.object({ photoId: uuid });
const fileParams = z.object({ photoId: uuid, size: z.enum(['thumb', 'display']) });

const listQuery = z
  .object({
    /** One pose only (exact name as listed). */
    pose: text('Pose', LIMITS.poseName).optional(),
    /** First day, inclusive (YYYY-MM-DD). */
    from: isoDate.optional(),
    /** Last day, inclusive (YYYY-MM-DD). */
    to: isoDate.optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    path: ['to'],
    message: 'The end date is before the start date',
  });

/**
 * Body photos are never stored by a browser or a proxy (`no-store`; `Pragma` for HTTP/1.0 caches):
 * after a sign-out or a revoked share a shared device has nothing left to show. The web client keeps
 * them only in the page's memory (plain `<img>`, no service worker, no persistent cache).
 */
const PHOTO_CACHE_CONTROL = 'no-store';

/** Loads the photo, then its athlete, and authorizes `action` on the athlete (404 for outsiders). */
async function loadPhoto(req: Request, photoId: string, action: AthleteAction) {
  const photo = await new PhotoRepository(req.ctx.dataSource.manager).findById(photoId);
  if (!photo) throw notFound();
  const { athlete } = await loadAthleteById(req, photo.athleteId, action);
  return { photo, athlete };
}

/** Runs a step before the upload is read; when it refuses, the body is read away first. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- wraps handlers of any params shape
function beforeUpload(step: RequestHandler<any>): RequestHandler {
  return (req, res, next) => {
    const done = (error?: unknown) => (error ? drainBeforeError(req, error, next) : next());
    Promise.resolve(step(req, res, done)).catch(done);
  };
}

/** Photo routes: uploads and the gallery under an athlete, single photos by id. */
export function photosRouter(): Router {
  const router = Router();

  router.post(
    '/athletes/:athleteId/photos',
    responds({
      summary: 'Upload photos of one day and pose',
      status: 201,
      data: z.array(photoView),
      body: {
        contentType: 'multipart/form-data',
        schema: photoUploadFields.extend({ files: z.array(z.string().meta({ format: 'binary' })) }),
      },
    }),
    beforeUpload(authenticate()),
    beforeUpload(validate({ params: athleteParams })),
    beforeUpload(async (req, res, next) => {
      // Authorize before a byte of the files is stored: only the athlete, with photo consent.
      const { athlete } = await loadAthleteById(req, String(req.params.athleteId), 'log');
      assertPhotoConsent(athlete);
      res.locals.athlete = athlete;
      next();
    }),
    photoUpload(),
    async (req, res) => {
      const service = new PhotoService(req.ctx);
      try {
        const photos = await service.upload(
          res.locals.athlete,
          req.body,
          uploadedFiles(req),
          req.ctx.clock(),
        );
        await discardUploads(req);
        res.status(201).json({ data: photos });
      } catch (error) {
        await discardUploads(req);
        throw error;
      }
    },
  );

  router.get(
    '/athletes/:athleteId/photos',
    responds({ summary: 'The gallery, by pose and dates', data: z.array(photoView) }),
    authenticate(),
    validate({ params: athleteParams, query: dated(listQuery, { from: 'any', to: 'any' }) }),
    async (req, res) => {
      const { athlete } = await loadAthleteById(req, req.params.athleteId, 'read');
      const { pose, from, to } = req.query;
      res.json({ data: await new PhotoService(req.ctx).list(athlete.id, { pose, from, to }) });
    },
  );

  router.get(
    '/photos/:photoId/:size',
    responds({
      summary: 'A photo file (thumb or display)',
      data: null,
      raw: { contentType: 'image/*', description: 'The image bytes (JPEG or WebP)' },
    }),
    authenticate(),
    validate({ params: fileParams }),
    async (req, res) => {
      const { photo } = await loadPhoto(req, req.params.photoId, 'read');
      const file = await new PhotoService(req.ctx).open(photo, req.params.size);
      res.status(200);
      res.setHeader('Content-Type', file.contentType);
      res.setHeader('Content-Length', String(file.size));
      res.setHeader('Cache-Control', PHOTO_CACHE_CONTROL);
      res.setHeader('Pragma', 'no-cache');
      res.setHeader('X-Content-Type-Options', 'nosniff');
      res.setHeader('Content-Disposition', 'inline');
      try {
        await pipeline(file.stream, res);
      } catch (error) {
        // A reader that goes away mid-photo is not our failure; anything before the first byte is.
        if (!res.headersSent) throw error;
        file.stream.destroy();
      }
    },
  );

  router.delete(
    '/photos/:photoId',
    responds({ summary: 'Delete a photo', status: 204, data: null }),
    authenticate(),
    validate({ params: photoParams }),
    async (req, res) => {
      const { photo } = await loadPhoto(req, req.params.photoId, 'log');
      await new PhotoService(req.ctx).delete(photo);
      res.status(204).end();
    },
  );

  return router;
}
