import { templateRequest, uuid, templateView } from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { authorizeTemplate, templateAbilities } from '../policies/template.policy.js';
import { CountdownTemplateService } from '../services/countdown-template.service.js';
import { responds } from '../middleware/responds.js';

const templateParams = z.object({ templateId: uuid });

/**
 * The team's countdown templates, mounted at /api/countdown-templates. Templates are looked up
 * within the actor's team, so another team's id answers 404 like an unknown one.
 */
export function countdownTemplatesRouter(): Router {
  const router = Router();

  router.get(
    '/',
    responds({ summary: 'The team’s countdown templates', data: z.array(templateView), abilities: true }),
    authenticate(),
    async (req, res) => {
      const { actor } = requireAuth(req);
      const team = { teamId: actor.teamId };
      authorizeTemplate(actor, 'read', team);
      res.json({
        data: await new CountdownTemplateService(req.ctx).list(actor.teamId),
        abilities: templateAbilities(actor, team),
      });
    },
  );

  router.post(
    '/',
    responds({ summary: 'Create a countdown template', status: 201, data: templateView }),
    authenticate(),
    validate({ body: templateRequest }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeTemplate(actor, 'manage', { teamId: actor.teamId });
      res.status(201).json({ data: await new CountdownTemplateService(req.ctx).create(actor, req.body) });
    },
  );

  router.get(
    '/:templateId',
    responds({ summary: 'One countdown template', data: templateView, abilities: true }),
    authenticate(),
    validate({ params: templateParams }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      const team = { teamId: actor.teamId };
      authorizeTemplate(actor, 'read', team);
      res.json({
        data: await new CountdownTemplateService(req.ctx).get(actor.teamId, req.params.templateId),
        abilities: templateAbilities(actor, team),
      });
    },
  );

  router.put(
    '/:templateId',
    responds({ summary: 'Replace a countdown template', data: templateView }),
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

  router.delete(
    '/:templateId',
    responds({ summary: 'Delete a countdown template', status: 204, data: null }),
    authenticate(),
    validate({ params: templateParams }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      const service = new CountdownTemplateService(req.ctx);
      authorizeTemplate(actor, 'read', { teamId: actor.teamId });
      await service.get(actor.teamId, req.params.templateId);
      authorizeTemplate(actor, 'manage', { teamId: actor.teamId });
      await service.remove(actor.teamId, req.params.templateId);
      res.status(204).end();
    },
  );

  return router;
}
