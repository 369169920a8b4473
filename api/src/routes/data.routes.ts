import { trendQuery, uuid, athleteProfile } from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { dated, validate } from '../middleware/validate.js';
import { athleteProfileView } from '../services/plan.service.js';
import { AthleteService } from '../services/athlete.service.js';
import { DaysExportService, daysCsvFileName } from '../services/days-export.service.js';
import { loadAthlete } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });

/** Reports and data rights under /api/athletes/:athleteId: the days as CSV, ending the coaching. */
export function dataRouter(): Router {
  const router = Router();

  // Anyone who may read the athlete (the athlete too, also after the coaching ended).
  router.get(
    '/:athleteId/days.csv',
    responds({
      summary: 'The days as CSV, in the viewer’s units',
      data: null,
      raw: { contentType: 'text/csv', description: 'One row per day (header row first)' },
    }),
    authenticate(),
    validate({ params: athleteParams, query: dated(trendQuery, { from: 'any', to: 'any' }) }),
    async (req, res) => {
      const { user } = requireAuth(req);
      const { athlete } = await loadAthlete(req, 'read');
      const { from, to } = req.query;
      const csv = await new DaysExportService(req.ctx).daysCsv(athlete, from, to, {
        weightUnit: user.weightUnit,
        volumeUnit: user.volumeUnit,
      });
      res.setHeader('Content-Type', 'text/csv; charset=utf-8; header=present');
      res.setHeader(
        'Content-Disposition',
        `attachment; filename="${daysCsvFileName(athlete.user.name, from, to)}"`,
      );
      res.setHeader('Cache-Control', 'no-store');
      res.send(csv);
    },
  );

  // The assigned coach or the owner ends the coaching: the athlete keeps sign-in and read access.
  router.post(
    '/:athleteId/end-coaching',
    responds({ summary: 'End the coaching: the athlete keeps read access', data: athleteProfile }),
    authenticate(),
    validate({ params: athleteParams }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'endCoaching');
      const ended = await new AthleteService(req.ctx).endCoaching(athlete);
      res.json({ data: await athleteProfileView(req.ctx.dataSource.manager, ended, req.ctx.clock()) });
    },
  );

  return router;
}
