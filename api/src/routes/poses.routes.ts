import { z } from 'zod';
import { posesRequest } from '@driftmark/shared';
import { Router } from 'express';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { authorizeTeam } from '../policies/team.policy.js';
import { PoseService } from '../services/pose.service.js';
import { responds } from '../middleware/responds.js';

/** The team's condition-photo poses, mounted at /api/team/poses. */
export function posesRouter(): Router {
  const router = Router();

  router.get(
    '/',
    responds({ summary: 'The team’s poses', data: z.array(z.string()) }),
    authenticate(),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeTeam(actor, { kind: 'read' }, { id: actor.teamId });
      res.json({ data: await new PoseService(req.ctx).list(actor.teamId) });
    },
  );

  router.put(
    '/',
    responds({ summary: 'Replace the team’s own poses', data: z.array(z.string()) }),
    authenticate(),
    validate({ body: posesRequest }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeTeam(actor, { kind: 'managePoses' }, { id: actor.teamId });
      res.json({ data: await new PoseService(req.ctx).replace(actor.teamId, req.body.poses) });
    },
  );

  return router;
}
