import {
  applyCountdownRequest,
  checkPlanRequest,
  createPlanVersionRequest,
  moveCountdownRequest,
  uuid,
  planView,
  planVersionView,
  planCheckResult,
  countdownPreview,
} from '@driftmark/shared';
import { Router, type Response } from 'express';
import { z } from 'zod';
import { authenticate } from '../middleware/authenticate.js';
import { dated, validate } from '../middleware/validate.js';
import { canOnAthlete } from '../policies/athlete.policy.js';
import { PlanService, type CountdownResult } from '../services/plan.service.js';
import { loadAthlete } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });
const versionParams = z.object({ athleteId: uuid, versionId: uuid });

/** A preview answers 200; a saved version 201. */
function sendCountdown(res: Response, result: CountdownResult): void {
  if (result.kind === 'preview') res.json({ data: result.preview });
  else res.status(201).json({ data: result.version });
}

/** An athlete's plan and its versions, mounted at /api/athletes (/:athleteId/plan…). */
export function plansRouter(): Router {
  const router = Router();

  router.get(
    '/:athleteId/plan',
    responds({ summary: 'The plan: versions and the one in force', data: planView, abilities: true }),
    authenticate(),
    validate({ params: athleteParams }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      res.json({
        data: await new PlanService(req.ctx).getPlan(athlete),
        abilities: { edit: canOnAthlete(actor, 'plan', target) },
      });
    },
  );

  router.get(
    '/:athleteId/plan/versions/:versionId',
    responds({ summary: 'One plan version', data: planVersionView }),
    authenticate(),
    validate({ params: versionParams }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'read');
      res.json({ data: await new PlanService(req.ctx).getVersion(athlete, req.params.versionId) });
    },
  );

  router.post(
    '/:athleteId/plan/check',
    responds({
      summary: 'Check plan content: refusals and guardrail warnings, nothing saved',
      data: planCheckResult,
    }),
    authenticate(),
    validate({ params: athleteParams, body: dated(checkPlanRequest, { effectiveFrom: 'any' }) }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'plan');
      res.json({ data: await new PlanService(req.ctx).check(athlete, req.body) });
    },
  );

  router.post(
    '/:athleteId/plan/versions',
    responds({
      summary: 'Save a plan version (409 until its warnings are acknowledged)',
      status: 201,
      data: planVersionView,
    }),
    authenticate(),
    validate({ params: athleteParams, body: dated(createPlanVersionRequest, { effectiveFrom: 'any' }) }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'plan');
      res.status(201).json({ data: await new PlanService(req.ctx).createVersion(actor, athlete, req.body) });
    },
  );

  router.post(
    '/:athleteId/plan/countdown',
    responds({
      summary: 'Apply a countdown template (201 saved; 200 a preview)',
      status: 201,
      data: planVersionView,
      also: { status: 200, data: countdownPreview, summary: 'A preview: nothing saved' },
    }),
    authenticate(),
    validate({ params: athleteParams, body: dated(applyCountdownRequest, { eventDate: 'any' }) }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'plan');
      sendCountdown(res, await new PlanService(req.ctx).applyCountdown(actor, athlete, req.body));
    },
  );

  router.post(
    '/:athleteId/plan/countdown/move',
    responds({
      summary: 'Move the countdown and the event date (201 saved; 200 a preview)',
      status: 201,
      data: planVersionView,
      also: { status: 200, data: countdownPreview, summary: 'A preview: nothing saved' },
    }),
    authenticate(),
    validate({ params: athleteParams, body: dated(moveCountdownRequest, { eventDate: 'any' }) }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'plan');
      sendCountdown(res, await new PlanService(req.ctx).moveCountdown(actor, athlete, req.body));
    },
  );

  return router;
}
