import { Router } from 'express';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { authorizeTeam } from '../policies/team.policy.js';
import { TeamService } from '../services/team.service.js';

export function teamRouter(): Router {
  const router = Router();
  router.get('/members', authenticate(), async (req, res) => {
    const { actor } = requireAuth(req);
    authorizeTeam(actor, { kind: 'viewMembers' }, { id: actor.teamId });
    res.json({ data: await new TeamService(req.ctx).listStaff(actor) });
  });
  return router;
}
