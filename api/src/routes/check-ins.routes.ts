import {
  dayRangeQuery,
  eveningRequest,
  isoDate,
  uuid,
  weighInRequest,
  daySummary,
  dayView,
  weighInView,
  eveningView,
} from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import type { ClientDayEntry } from '../entities/day-record.entity.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { dated, validate } from '../middleware/validate.js';
import { readerOf } from '../lib/reader.js';
import { presentEvening, presentWeighIn } from '../presenters/day.presenter.js';
import { canOnAthlete } from '../policies/athlete.policy.js';
import { CheckInService } from '../services/check-in.service.js';
import {
  fluidKind,
  mealKind,
  supplementKind,
  symptomKind,
  type EntryKind,
} from '../services/day-entry-kinds.js';
import { DayService } from '../services/day.service.js';
import { loadAthlete } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });
const dayParams = z.object({ athleteId: uuid, date: isoDate });
const entryParams = z.object({ athleteId: uuid, entryId: uuid });

/** An edit's body for the description: any subset of the create body's fields (its cross-field checks run on the merged entry). */
const anySubset = (schema: z.ZodType): z.ZodType =>
  schema instanceof z.ZodObject ? z.object(schema.shape).partial() : schema;

const entryBody = (entry: unknown, meta?: Record<string, string>) => ({
  data: entry,
  ...(meta ? { meta } : {}),
});

/**
 * POST /days/:date/<kind>, PATCH and DELETE /<kind>/:entryId for one kind of entry. A write answers
 * with the entry it wrote (a delete with 204), not the day: the day's totals and verdicts come
 * from GET …/days/:date, so a write is the session check, the access check and its own statement.
 */
function entryRoutes<E extends ClientDayEntry, I extends { clientId: string; time: string }>(
  router: Router,
  kind: EntryKind<E, I>,
): void {
  router.post(
    `/:athleteId/days/:date/${kind.path}`,
    responds({
      summary: `Log a ${kind.plural.replace(/ entries$/, '')} entry (201; 200 when the clientId was sent before)`,
      status: 201,
      data: kind.view,
      meta: true,
    }),
    authenticate(),
    validate({ params: dayParams, body: kind.schema }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'log');
      const result = await new CheckInService(req.ctx).createEntry(kind, athlete, req.params.date, req.body);
      res.status(result.created ? 201 : 200).json(entryBody(kind.present(result.entry), result.meta));
    },
  );

  // The body is checked after loading: it is laid over the stored entry, then validated whole.
  router.patch(
    `/:athleteId/${kind.path}/:entryId`,
    responds({
      summary: `Edit a ${kind.plural.replace(/ entries$/, '')} entry: any subset, laid over the stored one`,
      data: kind.view,
      meta: true,
      body: {
        contentType: 'application/json',
        schema: anySubset(kind.schema),
      },
    }),
    authenticate(),
    validate({ params: entryParams }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'log');
      const result = await new CheckInService(req.ctx).updateEntry(
        kind,
        athlete,
        req.params.entryId,
        req.body,
      );
      res.json(entryBody(kind.present(result.entry), result.meta));
    },
  );

  router.delete(
    `/:athleteId/${kind.path}/:entryId`,
    responds({ summary: `Delete a ${kind.plural.replace(/ entries$/, '')} entry`, status: 204, data: null }),
    authenticate(),
    validate({ params: entryParams }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'log');
      await new CheckInService(req.ctx).deleteEntry(kind, athlete, req.params.entryId);
      res.status(204).end();
    },
  );
}

/**
 * An athlete's days under /api/athletes/:athleteId: reads follow the athlete policy's `read`
 * (the athlete, the assigned coach, the owner, staff it is shared with), writes its `log` (the
 * athlete only). Dates are the athlete's own local dates.
 */
export function checkInsRouter(): Router {
  const router = Router();

  router.get(
    '/:athleteId/days',
    responds({ summary: 'Day summaries over a range', data: z.array(daySummary), abilities: true }),
    authenticate(),
    validate({ params: athleteParams, query: dated(dayRangeQuery, { from: 'any', to: 'any' }) }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const days = await new DayService(req.ctx).listDays(athlete, req.query.from, req.query.to);
      res.json({
        data: days,
        abilities: { log: athlete.status !== 'ended' && canOnAthlete(actor, 'log', target) },
      });
    },
  );

  router.get(
    '/:athleteId/days/:date',
    responds({ summary: 'One day: entries, targets, verdicts, cautions', data: dayView, abilities: true }),
    authenticate(),
    validate({ params: dayParams }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const reader = readerOf(requireAuth(req).user, athlete);
      const day = await new DayService(req.ctx).getDay(athlete, req.params.date, reader);
      res.json({
        data: day,
        abilities: { log: athlete.status !== 'ended' && canOnAthlete(actor, 'log', target) },
      });
    },
  );

  router.put(
    '/:athleteId/days/:date/weigh-in',
    responds({ summary: 'Record or replace the day’s weigh-in', data: weighInView }),
    authenticate(),
    validate({ params: dayParams, body: weighInRequest }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'log');
      const weighIn = await new CheckInService(req.ctx).putWeighIn(athlete, req.params.date, req.body);
      res.json({ data: presentWeighIn(weighIn) });
    },
  );

  router.delete(
    '/:athleteId/days/:date/weigh-in',
    responds({ summary: 'Delete the day’s weigh-in', status: 204, data: null }),
    authenticate(),
    validate({ params: dayParams }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'log');
      await new CheckInService(req.ctx).deleteWeighIn(athlete, req.params.date);
      res.status(204).end();
    },
  );

  router.put(
    '/:athleteId/days/:date/evening',
    responds({ summary: 'Record or replace the evening card', data: eveningView }),
    authenticate(),
    validate({ params: dayParams, body: eveningRequest }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'log');
      const evening = await new CheckInService(req.ctx).putEvening(athlete, req.params.date, req.body);
      res.json({ data: presentEvening(evening) });
    },
  );

  router.delete(
    '/:athleteId/days/:date/evening',
    responds({ summary: 'Delete the evening card', status: 204, data: null }),
    authenticate(),
    validate({ params: dayParams }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'log');
      await new CheckInService(req.ctx).deleteEvening(athlete, req.params.date);
      res.status(204).end();
    },
  );

  entryRoutes(router, fluidKind);
  entryRoutes(router, mealKind);
  entryRoutes(router, supplementKind);
  entryRoutes(router, symptomKind);

  return router;
}
