import {
  createMarkRequest,
  createReplyRequest,
  listMarksQuery,
  updateMarkRequest,
  uuid,
  markView,
} from '@driftmark/shared';
import { Router, type Request } from 'express';
import { z } from 'zod';
import { notFound } from '../errors.js';
import { authenticate } from '../middleware/authenticate.js';
import { dated, validate } from '../middleware/validate.js';
import { authorizeMark, markAbilities, markListAbilities, type MarkAction } from '../policies/mark.policy.js';
import { MarkRepository } from '../repositories/mark.repository.js';
import { MarkService } from '../services/mark.service.js';
import { loadAthlete, loadAthleteById } from './athletes.routes.js';
import { responds } from '../middleware/responds.js';

const athleteParams = z.object({ athleteId: uuid });
const markParams = z.object({ markId: uuid });

/** Loads the mark, then its athlete (404 when the actor can't read it), and authorizes `action`. */
async function loadMark(req: Request, markId: string, action: MarkAction) {
  const mark = await new MarkRepository(req.ctx.dataSource.manager).findById(markId);
  if (!mark) throw notFound();
  const { actor, athlete, target } = await loadAthleteById(req, mark.athleteId, 'read');
  const markTarget = { athlete: target, authorId: mark.authorId };
  authorizeMark(actor, action, markTarget);
  return { actor, athlete, mark, abilities: markAbilities(actor, markTarget) };
}

/** Marks pinned to an athlete's charts and their threads: listed and pinned under the athlete, the rest by id. */
export function marksRouter(): Router {
  const router = Router();

  router.get(
    '/athletes/:athleteId/marks',
    responds({ summary: 'Marks on the athlete’s charts', data: z.array(markView), abilities: true }),
    authenticate(),
    validate({ params: athleteParams, query: dated(listMarksQuery, { from: 'any', to: 'any' }) }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      const marks = await new MarkService(req.ctx).list(actor, athlete, req.query);
      // Flat booleans (the web client keeps only those): replying is the same for every mark of
      // the athlete; editing and deleting are the author's, so each mark's `author.id` decides.
      const { create } = markListAbilities(actor, target);
      const { reply } = markAbilities(actor, { athlete: target, authorId: null });
      res.json({ data: marks, abilities: { create, reply } });
    },
  );

  router.post(
    '/athletes/:athleteId/marks',
    responds({ summary: 'Add a mark', status: 201, data: markView, abilities: true }),
    authenticate(),
    validate({ params: athleteParams, body: dated(createMarkRequest, { fromDate: 'any', toDate: 'any' }) }),
    async (req, res) => {
      const { actor, athlete, target } = await loadAthlete(req, 'read');
      authorizeMark(actor, 'create', { athlete: target, authorId: null });
      const mark = await new MarkService(req.ctx).create(actor, athlete, req.body);
      res
        .status(201)
        .json({ data: mark, abilities: markAbilities(actor, { athlete: target, authorId: actor.userId }) });
    },
  );

  router.patch(
    '/marks/:markId',
    responds({ summary: 'Edit a mark', data: markView, abilities: true }),
    authenticate(),
    validate({ params: markParams, body: updateMarkRequest }),
    async (req, res) => {
      const { actor, athlete, mark, abilities } = await loadMark(req, req.params.markId, 'update');
      res.json({ data: await new MarkService(req.ctx).update(actor, athlete, mark, req.body), abilities });
    },
  );

  router.delete(
    '/marks/:markId',
    responds({ summary: 'Delete a mark', status: 204, data: null }),
    authenticate(),
    validate({ params: markParams }),
    async (req, res) => {
      const { mark } = await loadMark(req, req.params.markId, 'delete');
      await new MarkService(req.ctx).delete(mark);
      res.status(204).end();
    },
  );

  router.post(
    '/marks/:markId/replies',
    responds({ summary: 'Reply to a mark', status: 201, data: markView, abilities: true }),
    authenticate(),
    validate({ params: markParams, body: createReplyRequest }),
    async (req, res) => {
      const { actor, athlete, mark, abilities } = await loadMark(req, req.params.markId, 'reply');
      res
        .status(201)
        .json({ data: await new MarkService(req.ctx).reply(actor, athlete, mark, req.body), abilities });
    },
  );

  router.post(
    '/marks/:markId/read',
    responds({ summary: 'Mark as read', data: markView, abilities: true }),
    authenticate(),
    validate({ params: markParams }),
    async (req, res) => {
      const { actor, athlete, mark, abilities } = await loadMark(req, req.params.markId, 'markRead');
      res.json({ data: await new MarkService(req.ctx).markRead(actor, athlete, mark), abilities });
    },
  );

  return router;
}
