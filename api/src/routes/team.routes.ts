import { z } from 'zod';
import { guardrailFloors, teamMember } from '@driftmark/shared';
import { Router } from 'express';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { authorizeTeam, canOnTeam } from '../policies/team.policy.js';
import { TeamService } from '../services/team.service.js';
import { responds } from '../middleware/responds.js';

export function teamRouter(): Router {
  const router = Router();
  router.get(
    '/members',
    responds({ summary: 'The team’s staff', data: z.array(teamMember) }),
    authenticate(),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeTeam(actor, { kind: 'viewMembers' }, { id: actor.teamId });
      res.json({ data: await new TeamService(req.ctx).listStaff(actor) });
    },
  );

  router.get(
    '/guardrails',
    responds({ summary: 'The team’s guardrail floors', data: guardrailFloors, abilities: true }),
    authenticate(),
    async (req, res) => {
      const { actor } = requireAuth(req);
      const team = { id: actor.teamId };
      authorizeTeam(actor, { kind: 'viewGuardrails' }, team);
      res.json({
        data: await new TeamService(req.ctx).guardrailFloors(actor.teamId),
        abilities: { manage: canOnTeam(actor, { kind: 'manageSettings' }, team) },
      });
    },
  );

  router.put(
    '/guardrails',
    responds({ summary: 'Replace the team’s guardrail floors', data: guardrailFloors }),
    authenticate(),
    validate({ body: guardrailFloors }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeTeam(actor, { kind: 'manageSettings' }, { id: actor.teamId });
      res.json({ data: await new TeamService(req.ctx).replaceGuardrailFloors(actor.teamId, req.body) });
    },
  );

  return router;
}
