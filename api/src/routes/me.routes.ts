import { updateSettingsRequest } from '@driftmark/shared';
import { Router } from 'express';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { MeService } from '../services/me.service.js';

export function meRouter(): Router {
  const router = Router();

  router.get('/', authenticate(), async (req, res) => {
    const { user } = requireAuth(req);
    res.setHeader('Cache-Control', 'no-store');
    res.json({ data: await new MeService(req.ctx.dataSource.manager).describe(user) });
  });

  router.patch('/settings', authenticate(), validate({ body: updateSettingsRequest }), async (req, res) => {
    const { user } = requireAuth(req);
    res.json({ data: await new MeService(req.ctx.dataSource.manager).updateSettings(user.id, req.body) });
  });

  return router;
}
