import { healthResponse } from '@driftmark/shared';
import { Router } from 'express';
import { HealthService } from '../services/health.service.js';
import { responds } from '../middleware/responds.js';

/** `GET /api/health`: a real round trip to the database; 503 when it fails. No envelope. */
export function healthRouter(): Router {
  const router = Router();
  router.get(
    '/',
    responds({
      summary: 'Health: a round trip to the database (503 when it fails)',
      data: healthResponse,
      bare: true,
    }),
    async (req, res) => {
      const health = await new HealthService(req.ctx).check();
      res.setHeader('Cache-Control', 'no-store');
      res.status(health.db === 'up' ? 200 : 503).json(health);
    },
  );
  return router;
}
