import {
  createBodyMeasurementRequest,
  uuid,
  bodyCompositionView,
  bodyMeasurementView,
} from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { authenticate } from '../middleware/authenticate.js';
import { dated, validate } from '../middleware/validate.js';
import { canOnAthlete } from '../policies/athlete.policy.js';
import { BodyCompositionService } from '../services/body-composition.service.js';
import { loadAthlete } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });
const measurementParams = z.object({ athleteId: uuid, measurementId: uuid });

/**
 * Body composition under /api/athletes/:athleteId: reading is the athlete policy's `read`; entering
 * and removing measurements is `measure` (the athlete and the staff working on them).
 */
export function bodyCompositionRouter(): Router {
  const router = Router();

  router.get(
    '/:athleteId/body-composition',
    responds({ summary: 'Measurements and body-fat estimates', data: bodyCompositionView, abilities: true }),
    authenticate(),
    validate({ params: athleteParams }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const view = await new BodyCompositionService(req.ctx).view(athlete);
      res.json({
        data: view,
        abilities: { measure: athlete.status !== 'ended' && canOnAthlete(actor, 'measure', target) },
      });
    },
  );

  router.post(
    '/:athleteId/body-measurements',
    responds({ summary: 'Record a measurement', status: 201, data: bodyMeasurementView }),
    authenticate(),
    // The window here; "not after today" is the athlete's own today, which the service checks.
    validate({ params: athleteParams, body: dated(createBodyMeasurementRequest, { date: 'any' }) }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'measure');
      const measurement = await new BodyCompositionService(req.ctx).create(actor, athlete, req.body);
      res.status(201).json({ data: measurement });
    },
  );

  router.delete(
    '/:athleteId/body-measurements/:measurementId',
    responds({ summary: 'Delete a measurement', status: 204, data: null }),
    authenticate(),
    validate({ params: measurementParams }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'measure');
      await new BodyCompositionService(req.ctx).remove(athlete, req.params.measurementId);
      res.status(204).end();
    },
  );

  return router;
}
