import { pipeline } from 'node:stream/promises';
import { confirmDeletionRequest, type DeletionRequestView, deletionRequestView } from '@driftmark/shared';
import { Router } from 'express';
import { notFound } from '../errors.js';
import { DELETION_TOKEN_TTL_SECONDS } from '../lib/deletion-token.js';
import { clearSessionCookie } from '../lib/session-cookie.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import type { RateLimits } from '../middleware/rate-limit.js';
import { validate } from '../middleware/validate.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { AccountDeletionService } from '../services/account-deletion.service.js';
import { DataArchiveService } from '../services/data-archive.service.js';
import { loadAthleteById } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

/** The signed-in athlete's own data rights under /api/me: the archive of everything they logged. */
export function meDataRouter(limits: RateLimits): Router {
  const router = Router();

  // Only an athlete has an archive; it stays available after the coaching ended.
  router.get(
    '/export',
    responds({
      summary: 'The athlete’s data archive',
      data: null,
      raw: { contentType: 'application/zip', description: 'A zip of everything the athlete logged' },
    }),
    authenticate(),
    async (req, res) => {
      const { user } = requireAuth(req);
      const own = await new AthleteRepository(req.ctx.dataSource.manager).findByUserId(user.id);
      if (!own) throw notFound('Only athletes have a data archive.');
      const { athlete } = await loadAthleteById(req, own.id, 'read');
      const zip = await new DataArchiveService(req.ctx).build(athlete);
      const day = new Date(req.ctx.clock()).toISOString().slice(0, 10);
      res.setHeader('Content-Type', 'application/zip');
      res.setHeader('Content-Disposition', `attachment; filename="driftmark-my-data-${day}.zip"`);
      res.setHeader('Cache-Control', 'no-store');
      await pipeline(zip, res);
    },
  );

  // Step one: e-mail a signed, expiring confirm link to the athlete's address.
  router.post(
    '/deletion-request',
    responds({ summary: 'E-mail a link that deletes the account', status: 202, data: deletionRequestView }),
    authenticate(),
    async (req, res) => {
      const { user } = requireAuth(req);
      await new AccountDeletionService(req.ctx).request(user);
      const view: DeletionRequestView = {
        sentTo: user.email,
        expiresInMinutes: DELETION_TOKEN_TTL_SECONDS / 60,
      };
      res.status(202).json({ data: view });
    },
  );

  // Step two: the link's token alone deletes the account (it may open in another browser).
  router.post(
    '/deletion/confirm',
    responds({ summary: 'Delete the account with the e-mailed token', status: 204, data: null }),
    limits.perAddress('deletion-confirm'),
    validate({ body: confirmDeletionRequest }),
    async (req, res) => {
      await new AccountDeletionService(req.ctx).confirm(req.body.token);
      clearSessionCookie(res, req.ctx.config);
      res.status(204).end();
    },
  );

  return router;
}
