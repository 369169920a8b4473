import { templateRequest, uuid } from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { authorizeTemplate, templateAbilities } from '../policies/template.policy.js';
import { CountdownTemplateService } from '../services/countdown-template.service.js';

const templateParams = z.object({ templateId: uuid });

/**
 * The team's countdown templates, mounted at /api/countdown-templates. Templates are looked up
 * within the actor's team, so another team's id answers 404 like an unknown one.
 */
export function countdownTemplatesRouter(): Router {
  const router = Router();

  router.get('/', authenticate(), async (req, res) => {
    const { actor } = requireAuth(req);
    const team = { teamId: actor.teamId };
    authorizeTemplate(actor, 'read', team);
    res.json({
      data: await new CountdownTemplateService(req.ctx).list(actor.teamId),
      abilities: templateAbilities(actor, team),
    });
  });

  router.post('/', authenticate(), validate({ body: templateRequest }), async (req, res) => {
    const { actor } = requireAuth(req);
    authorizeTemplate(actor, 'manage', { teamId: actor.teamId });
    res.status(201).json({ data: await new CountdownTemplateService(req.ctx).create(actor, req.body) });
  });

  router.get('/:templateId', authenticate(), validate({ params: templateParams }), async (req, res) => {
    const { actor } = requireAuth(req);
    const team = { teamId: actor.teamId };
    authorizeTemplate(actor, 'read', team);
    res.json({
      data: await new CountdownTemplateService(req.ctx).get(actor.teamId, req.params.templateId),
      abilities: templateAbilities(actor, team),
    });
  });

  router.put(
    '/:templateId',
    authenticate(),
    validate({ params: templateParams, body: templateRequest }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      const service = new CountdownTemplateService(req.ctx);
      // Loaded before the manage check: an unknown or other team's id is 404 for everyone.
      authorizeTemplate(actor, 'read', { teamId: actor.teamId });
      await service.get(actor.teamId, req.params.templateId);
      authorizeTemplate(actor, 'manage', { teamId: actor.teamId });
      res.json({ data: await service.update(actor.teamId, req.params.templateId, req.body) });
    },
  );

  router.delete('/:templateId', authenticate(), validate({ params: templateParams }), async (req, res) => {
    const { actor } = requireAuth(req);
    const service = new CountdownTemplateService(req.ctx);
    authorizeTemplate(actor, 'read', { teamId: actor.teamId });
    await service.get(actor.teamId, req.params.templateId);
    authorizeTemplate(actor, 'manage', { teamId: actor.teamId });
    await service.remove(actor.teamId, req.params.templateId);
    res.status(204).end();
  });

  return router;
}
