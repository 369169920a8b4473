import { uuid, reviewQueueItem, markReviewedResponse } from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { authorizeTeam } from '../policies/team.policy.js';
import { ReviewQueueService } from '../services/review-queue.service.js';
import { loadAthlete } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });

/** The staff's review queue: the athletes they may see (as on the roster) that need attention. */
export function reviewQueueRouter(): Router {
  const router = Router();

  router.get(
    '/',
    responds({ summary: 'The coach’s review queue', data: z.array(reviewQueueItem) }),
    authenticate(),
    async (req, res) => {
      const { actor, user } = requireAuth(req);
      authorizeTeam(actor, { kind: 'viewRoster' }, { id: actor.teamId });
      const units = { weight: user.weightUnit, volume: user.volumeUnit };
      res.json({ data: await new ReviewQueueService(req.ctx).list(actor, units) });
    },
  );

  // Reviewing is staff work on an athlete they can read, like pinning a mark: the athlete policy's
  // `annotate` (404 when the athlete is not readable, 403 for the athlete themself).
  router.post(
    '/:athleteId/reviewed',
    responds({ summary: 'Mark an athlete reviewed', data: markReviewedResponse }),
    authenticate(),
    validate({ params: athleteParams }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'annotate');
      res.json({ data: await new ReviewQueueService(req.ctx).markReviewed(actor, athlete) });
    },
  );

  return router;
}
