import {
  datesWithin,
  intakeRequestOn,
  shareAthleteRequest,
  updateEventRequest,
  uuid,
  athleteProfile,
} from '@driftmark/shared';
import { Router, type Request } from 'express';
import { z } from 'zod';
import { forbidden, notFound } from '../errors.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { dated, validate } from '../middleware/validate.js';
import {
  athleteAbilities,
  authorizeAthlete,
  type AthleteAction,
  type AthleteTarget,
} from '../policies/athlete.policy.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { todayIn } from '../lib/dates.js';
import { AthleteService } from '../services/athlete.service.js';
import { athleteProfileView, PlanService } from '../services/plan.service.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });
const shareParams = z.object({ athleteId: uuid, userId: uuid });

/** Loads the athlete and what the policy needs, then authorizes (404 unreadable, 403 not allowed). */
export function loadAthlete(req: Request<{ athleteId: string }>, action: AthleteAction) {
  return loadAthleteById(req, req.params.athleteId, action);
}

/** As `loadAthlete`, for routes that reach the athlete through another record (a photo, an entry). */
export async function loadAthleteById(req: Request, athleteId: string, action: AthleteAction) {
  const { actor } = requireAuth(req);
  const manager = req.ctx.dataSource.manager;
  const found = await new AthleteRepository(manager).findForAccess(athleteId);
  if (!found) throw notFound();
  const { athlete, sharedWithUserIds } = found;
  const target: AthleteTarget = {
    userId: athlete.userId,
    teamId: athlete.teamId,
    coachId: athlete.coachId,
    sharedWithUserIds,
  };
  authorizeAthlete(actor, action, target);
  if ((action === 'log' || action === 'measure') && athlete.status === 'ended') {
    throw forbidden(
      'Your coaching has ended: you can still read and export your history, but not log new days.',
    );
  }
  return { actor, athlete, target };
}

export function athletesRouter(): Router {
  const router = Router();

  router.get(
    '/:athleteId',
    responds({ summary: 'One athlete’s profile', data: athleteProfile, abilities: true }),
    authenticate(),
    validate({ params: athleteParams }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const abilities = athleteAbilities(actor, target);
      // After the coaching ended nobody logs new days and there is nothing left to end.
      if (athlete.status === 'ended') Object.assign(abilities, { log: false, endCoaching: false });
      res.json({
        data: await athleteProfileView(req.ctx.dataSource.manager, athlete, req.ctx.clock()),
        abilities,
      });
    },
  );

  router.put(
    '/:athleteId/intake',
    responds({ summary: 'Complete the intake form', data: athleteProfile }),
    authenticate(),
    // Ages are counted to the server's today (UTC: the athlete's own zone is part of this very form).
    validate({
      params: athleteParams,
      body: (req) => {
        const today = todayIn('UTC', req.ctx.clock());
        return datesWithin(intakeRequestOn(today), today, { eventDate: 'any' });
      },
    }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'completeIntake');
      res.json({ data: await new AthleteService(req.ctx).completeIntake(athlete, req.body) });
    },
  );

  // The coach moves the event; the profile in the answer says when the countdown now aims elsewhere.
  router.patch(
    '/:athleteId/event',
    responds({ summary: 'Change the event date, time or name', data: z.object({ athlete: athleteProfile }) }),
    authenticate(),
    validate({ params: athleteParams, body: dated(updateEventRequest, { eventDate: 'any' }) }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'update');
      res.json({ data: await new PlanService(req.ctx).updateEvent(athlete, req.body) });
    },
  );

  router.post(
    '/:athleteId/shares',
    responds({ summary: 'Share the athlete with a staff member', status: 204, data: null }),
    authenticate(),
    validate({ params: athleteParams, body: shareAthleteRequest }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'share');
      await new AthleteService(req.ctx).share(actor, athlete, req.body.userId);
      res.status(204).end();
    },
  );

  router.delete(
    '/:athleteId/shares/:userId',
    responds({ summary: 'Stop sharing the athlete with a staff member', status: 204, data: null }),
    authenticate(),
    validate({ params: shareParams }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'share');
      await new AthleteService(req.ctx).unshare(athlete, req.params.userId);
      res.status(204).end();
    },
  );

  return router;
}
