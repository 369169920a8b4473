import { z } from 'zod';
import { rosterRow } from '@driftmark/shared';
import { Router } from 'express';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { authorizeTeam } from '../policies/team.policy.js';
import { RosterService } from '../services/roster.service.js';
import { responds } from '../middleware/responds.js';

export function rosterRouter(): Router {
  const router = Router();
  router.get(
    '/',
    responds({ summary: 'The roster with each athlete’s figures', data: z.array(rosterRow) }),
    authenticate(),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeTeam(actor, { kind: 'viewRoster' }, { id: actor.teamId });
      res.json({ data: await new RosterService(req.ctx).list(actor) });
    },
  );
  return router;
}
