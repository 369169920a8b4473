import {
  inReaderUnits,
  trendDaysToColumns,
  trendQuery,
  uuid,
  type TrendResponse,
  trendResponse,
} from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { sendConditionalJson } from '../lib/conditional-json.js';
import { readerOf } from '../lib/reader.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { dated, validate } from '../middleware/validate.js';
import { canOnAthlete } from '../policies/athlete.policy.js';
import { TrendService } from '../services/trend.service.js';
import { loadAthlete } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });

/** An athlete's trend under /api/athletes/:athleteId (read: the athlete policy's `read`). */
export function trendsRouter(): Router {
  const router = Router();

  router.get(
    '/:athleteId/trend',
    responds({
      summary: 'Trend, drift and flags over a range (weak ETag; 304 when unchanged)',
      data: trendResponse,
      abilities: true,
    }),
    authenticate(),
    validate({ params: athleteParams, query: dated(trendQuery, { from: 'any', to: 'any' }) }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const view = await new TrendService(req.ctx).getTrend(athlete, req.query.from, req.query.to);
      // Flag texts are written in kg; each reader reads their own units.
      const { units } = readerOf(requireAuth(req).user, athlete);
      const flags = view.flags.map((f) => ({ ...f, message: inReaderUnits(f.message, units) }));
      // Days go as columns (trendResponse); an unchanged range answers 304 to the client holding it.
      const data: TrendResponse = { ...view, days: trendDaysToColumns(view.days), flags };
      sendConditionalJson(req, res, {
        data,
        abilities: { annotate: canOnAthlete(actor, 'annotate', target) },
      });
    },
  );

  return router;
}
