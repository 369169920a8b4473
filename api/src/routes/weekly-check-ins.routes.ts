import {
  checkInDayRequest,
  checkInQuestionsRequest,
  replyWeeklyCheckInRequest,
  isoDate,
  submitWeeklyCheckInRequest,
  uuid,
  type WeeklyCheckInView,
  weeklyCheckInView,
  checkInQuestion,
  WEEKDAYS,
} from '@driftmark/shared';
import { Router, type Request } from 'express';
import { z } from 'zod';
import { notFound } from '../errors.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import type { Actor } from '../policies/actor.js';
import { authorizeAthlete, canOnAthlete, type AthleteTarget } from '../policies/athlete.policy.js';
import { authorizeTeam, canOnTeam } from '../policies/team.policy.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { WeeklyCheckInRepository } from '../repositories/weekly-check-in.repository.js';
import { WeeklyCheckInService } from '../services/weekly-check-in.service.js';
import { loadAthlete, loadAthleteById } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });
const checkInParams = z.object({ checkInId: uuid });
const weekParams = z.object({ athleteId: uuid, dueDate: isoDate });

/**
 * What the actor may do with a check-in: the athlete submits (or edits) it until it is answered and
 * while coaching lasts; staff who annotate the athlete reply once it is submitted; staff who work on
 * the plan move the check-in weekday.
 */
function weeklyAbilities(
  actor: Actor,
  athlete: AthleteWithPeople,
  target: AthleteTarget,
  view: Pick<WeeklyCheckInView, 'status'> | null,
) {
  const open = view === null || view.status === 'due' || view.status === 'submitted';
  return {
    submit: open && athlete.status !== 'ended' && canOnAthlete(actor, 'log', target),
    reply: view?.status === 'submitted' && canOnAthlete(actor, 'annotate', target),
    setCheckInDay: canOnAthlete(actor, 'plan', target),
  };
}

/** Loads the check-in, then its athlete (404 when the actor can't read it). */
async function loadCheckIn(req: Request, checkInId: string) {
  const checkIn = await new WeeklyCheckInRepository(req.ctx.dataSource.manager).findById(checkInId);
  if (!checkIn) throw notFound();
  const loaded = await loadAthleteById(req, checkIn.athleteId, 'read');
  return { ...loaded, checkIn };
}

/**
 * Weekly check-ins (/athletes/:athleteId/weekly-check-ins…, /weekly-check-ins/:checkInId…), the
 * athlete's check-in weekday and the team's question list (/team/check-in-questions).
 */
export function weeklyCheckInsRouter(): Router {
  const router = Router();

  router.get(
    '/athletes/:athleteId/weekly-check-ins',
    responds({
      summary: 'The athlete’s weekly check-ins',
      data: z.array(weeklyCheckInView),
      abilities: true,
    }),
    authenticate(),
    validate({ params: athleteParams }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const list = await new WeeklyCheckInService(req.ctx).list(athlete);
      res.json({ data: list, abilities: weeklyAbilities(actor, athlete, target, null) });
    },
  );

  router.get(
    '/athletes/:athleteId/weekly-check-ins/current',
    responds({ summary: 'The week due now', data: weeklyCheckInView, abilities: true }),
    authenticate(),
    validate({ params: athleteParams }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const view = await new WeeklyCheckInService(req.ctx).current(athlete);
      res.json({ data: view, abilities: weeklyAbilities(actor, athlete, target, view) });
    },
  );

  // The week due on a date (today's or earlier), stored or computed: the printable report reads its
  // range and figures here instead of working out the week itself.
  router.get(
    '/athletes/:athleteId/weekly-check-ins/week/:dueDate',
    responds({ summary: 'The week due on a date', data: weeklyCheckInView, abilities: true }),
    authenticate(),
    validate({ params: weekParams }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const view = await new WeeklyCheckInService(req.ctx).forDueDate(athlete, req.params.dueDate);
      res.json({ data: view, abilities: weeklyAbilities(actor, athlete, target, view) });
    },
  );

  router.post(
    '/athletes/:athleteId/weekly-check-ins',
    responds({ summary: 'Submit the weekly check-in', data: weeklyCheckInView, abilities: true }),
    authenticate(),
    validate({ params: athleteParams, body: submitWeeklyCheckInRequest }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'log');
      const view = await new WeeklyCheckInService(req.ctx).submit(athlete, req.body);
      res.json({ data: view, abilities: weeklyAbilities(actor, athlete, target, view) });
    },
  );

  router.get(
    '/weekly-check-ins/:checkInId',
    responds({ summary: 'One weekly check-in', data: weeklyCheckInView, abilities: true }),
    authenticate(),
    validate({ params: checkInParams }),
    async (req, res) => {
      const { actor, athlete, target, checkIn } = await loadCheckIn(req, req.params.checkInId);
      const view = new WeeklyCheckInService(req.ctx).get(checkIn);
      res.json({ data: view, abilities: weeklyAbilities(actor, athlete, target, view) });
    },
  );

  router.post(
    '/weekly-check-ins/:checkInId/reply',
    responds({ summary: 'The coach’s reply', data: weeklyCheckInView, abilities: true }),
    authenticate(),
    validate({ params: checkInParams, body: replyWeeklyCheckInRequest }),
    async (req, res) => {
      const { actor, athlete, target, checkIn } = await loadCheckIn(req, req.params.checkInId);
      authorizeAthlete(actor, 'annotate', target);
      const view = await new WeeklyCheckInService(req.ctx).reply(actor, athlete, checkIn, req.body);
      res.json({ data: view, abilities: weeklyAbilities(actor, athlete, target, view) });
    },
  );

  router.patch(
    '/athletes/:athleteId/check-in-day',
    responds({
      summary: 'Set the athlete’s check-in weekday',
      data: z.object({ athleteId: z.uuid(), weekday: z.enum(WEEKDAYS), current: weeklyCheckInView }),
      abilities: true,
    }),
    authenticate(),
    validate({ params: athleteParams, body: checkInDayRequest }),
    async (req, res) => {
      // The check-in day is part of the coaching schedule: whoever works on the plan moves it.
      const { actor, athlete, target } = await loadAthlete(req, 'plan');
      const view = await new WeeklyCheckInService(req.ctx).setWeekday(athlete, req.body.weekday);
      res.json({
        data: { athleteId: athlete.id, weekday: req.body.weekday, current: view },
        abilities: weeklyAbilities(actor, athlete, target, view),
      });
    },
  );

  router.get(
    '/team/check-in-questions',
    responds({ summary: 'The team’s weekly questions', data: z.array(checkInQuestion), abilities: true }),
    authenticate(),
    async (req, res) => {
      const { actor } = requireAuth(req);
      const team = { id: actor.teamId };
      authorizeTeam(actor, { kind: 'read' }, team);
      res.json({
        data: await new WeeklyCheckInService(req.ctx).questions(actor.teamId),
        abilities: { manage: canOnTeam(actor, { kind: 'manageCheckInQuestions' }, team) },
      });
    },
  );

  router.put(
    '/team/check-in-questions',
    responds({
      summary: 'Replace the team’s weekly questions',
      data: z.array(checkInQuestion),
      abilities: true,
    }),
    authenticate(),
    validate({ body: checkInQuestionsRequest }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeTeam(actor, { kind: 'manageCheckInQuestions' }, { id: actor.teamId });
      res.json({
        data: await new WeeklyCheckInService(req.ctx).replaceQuestions(actor.teamId, req.body.questions),
        abilities: { manage: true },
      });
    },
  );

  return router;
}
