import { updateSettingsRequest, meResponse } from '@driftmark/shared';
import { Router } from 'express';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { MeService } from '../services/me.service.js';
import { responds } from '../middleware/responds.js';

export function meRouter(): Router {
  const router = Router();

  router.get(
    '/',
    responds({ summary: 'The signed-in user', data: meResponse }),
    authenticate(),
    async (req, res) => {
      const { user } = requireAuth(req);
      res.setHeader('Cache-Control', 'no-store');
      res.json({ data: await new MeService(req.ctx.dataSource.manager).describe(user) });
    },
  );

  router.patch(
    '/settings',
    responds({ summary: 'Change name, time zone or units', data: meResponse }),
    authenticate(),
    validate({ body: updateSettingsRequest }),
    async (req, res) => {
      const { user } = requireAuth(req);
      res.json({ data: await new MeService(req.ctx.dataSource.manager).updateSettings(user.id, req.body) });
    },
  );

  return router;
}
