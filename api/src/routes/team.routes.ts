import { guardrailFloors } from '@driftmark/shared';
import { Router } from 'express';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { authorizeTeam, canOnTeam } from '../policies/team.policy.js';
import { TeamService } from '../services/team.service.js';

export function teamRouter(): Router {
  const router = Router();
  router.get('/members', authenticate(), async (req, res) => {
    const { actor } = requireAuth(req);
    authorizeTeam(actor, { kind: 'viewMembers' }, { id: actor.teamId });
    res.json({ data: await new TeamService(req.ctx).listStaff(actor) });
  });

  router.get('/guardrails', authenticate(), async (req, res) => {
    const { actor } = requireAuth(req);
    const team = { id: actor.teamId };
    authorizeTeam(actor, { kind: 'viewGuardrails' }, team);
    res.json({
      data: await new TeamService(req.ctx).guardrailFloors(actor.teamId),
      abilities: { manage: canOnTeam(actor, { kind: 'manageSettings' }, team) },
    });
  });

  router.put('/guardrails', authenticate(), validate({ body: guardrailFloors }), async (req, res) => {
    const { actor } = requireAuth(req);
    authorizeTeam(actor, { kind: 'manageSettings' }, { id: actor.teamId });
    res.json({ data: await new TeamService(req.ctx).replaceGuardrailFloors(actor.teamId, req.body) });
  });

  return router;
}
