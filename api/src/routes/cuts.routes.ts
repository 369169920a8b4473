import {
  createCutPlanRequest,
  cutSettingsRequest,
  cutSettingsView,
  rehearsalNoteRequest,
  rehearsalView,
  uuid,
  weighInEventRequest,
  cutView,
} from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { dated, validate } from '../middleware/validate.js';
import { canOnAthlete } from '../policies/athlete.policy.js';
import { authorizeTeam, canOnTeam } from '../policies/team.policy.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { CutService, cutSettingsOf } from '../services/cut.service.js';
import { loadAthlete } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });
const cutPlanParams = z.object({ athleteId: uuid, cutPlanId: uuid });

/**
 * Making weight under /api/athletes/:athleteId: the weigh-in's record and the cut plan. Reading is
 * the athlete policy's `read` (the athlete too); writing is `plan` (coach, owner, shared staff), and
 * a rehearsal's day notes `noteRehearsal` (the athlete and those staff).
 * `abilities.log` says whether the reader may tick the recovery checklist (the athlete's own log).
 */
export function cutsRouter(): Router {
  const router = Router();

  router.get(
    '/:athleteId/cut',
    responds({ summary: 'The weigh-in’s record and the cut plan', data: cutView, abilities: true }),
    authenticate(),
    validate({ params: athleteParams }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      res.json({
        data: await new CutService(req.ctx).getCut(athlete),
        abilities: {
          plan: canOnAthlete(actor, 'plan', target),
          log: canOnAthlete(actor, 'log', target),
          noteRehearsal: canOnAthlete(actor, 'noteRehearsal', target),
        },
      });
    },
  );

  router.put(
    '/:athleteId/weigh-in',
    responds({ summary: 'Set the weigh-in’s details (limit, timing, time)', data: cutView }),
    authenticate(),
    validate({ params: athleteParams, body: weighInEventRequest }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'plan');
      res.json({ data: await new CutService(req.ctx).setWeighInEvent(athlete, req.body) });
    },
  );

  router.post(
    '/:athleteId/cut-plans',
    responds({
      summary: 'Save a cut plan (409 until its warnings are acknowledged)',
      status: 201,
      data: cutView,
    }),
    authenticate(),
    validate({
      params: athleteParams,
      body: dated(createCutPlanRequest, { startDate: 'any', practiceWeighInDate: 'any' }),
    }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'plan');
      res.status(201).json({ data: await new CutService(req.ctx).createPlan(actor, athlete, req.body) });
    },
  );

  // What was done on a rehearsal day: the athlete or the staff on them (`noteRehearsal`).
  router.put(
    '/:athleteId/cut-plans/:cutPlanId/note',
    responds({ summary: 'Write or clear the note of one rehearsal day', data: rehearsalView }),
    authenticate(),
    validate({ params: cutPlanParams, body: dated(rehearsalNoteRequest, { date: 'past' }) }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'noteRehearsal');
      res.json({
        data: await new CutService(req.ctx).setRehearsalNote(actor, athlete, req.params.cutPlanId, req.body),
      });
    },
  );

  return router;
}

/**
 * GET /api/team/cut-settings (staff, as the guardrail floors) and PUT (owner): the team's
 * acute-share threshold, answered with the default and the sources beside it.
 */
export function cutSettingsRouter(): Router {
  const router = Router();
  router.get(
    '/cut-settings',
    responds({
      summary: 'The team’s acute-share threshold, its default and sources',
      data: cutSettingsView,
      abilities: true,
    }),
    authenticate(),
    async (req, res) => {
      const { actor } = requireAuth(req);
      const team = { id: actor.teamId };
      authorizeTeam(actor, { kind: 'viewGuardrails' }, team);
      res.json({
        data: await cutSettingsOf(new TeamRepository(req.ctx.dataSource.manager), actor.teamId),
        abilities: { manage: canOnTeam(actor, { kind: 'manageSettings' }, team) },
      });
    },
  );
  router.put(
    '/cut-settings',
    responds({ summary: 'Set the team’s acute-share threshold', data: cutSettingsView }),
    authenticate(),
    validate({ body: cutSettingsRequest }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeTeam(actor, { kind: 'manageSettings' }, { id: actor.teamId });
      const teams = new TeamRepository(req.ctx.dataSource.manager);
      await teams.setAcuteSharePct(actor.teamId, req.body.acuteSharePct);
      res.json({ data: await cutSettingsOf(teams, actor.teamId) });
    },
  );
  return router;
}
