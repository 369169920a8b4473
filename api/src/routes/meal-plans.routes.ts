import {
  fitMealPlanRequest,
  isoDate,
  logPlannedMealRequest,
  mealPlanFit,
  mealView,
  uuid,
} from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { presentMeal } from '../presenters/day.presenter.js';
import { loadAthlete } from './athletes.routes.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { responds } from '../middleware/responds.js';
import { validate } from '../middleware/validate.js';
import { authorizeFoods } from '../policies/food.policy.js';
import { MealPlanService } from '../services/meal-plan.service.js';

const plannedMealParams = z.object({ athleteId: uuid, date: isoDate, mealId: uuid });

/**
 * Logging a planned meal as eaten, mounted at /api/athletes: one tap on Today writes one meal
 * entry (201; 200 with the first entry when the client id was used before).
 */
export function plannedMealsRouter(): Router {
  const router = Router();
  router.post(
    '/:athleteId/days/:date/planned-meals/:mealId',
    responds({
      summary:
        "Log a planned meal of the day's meal plan as eaten (201; 200 when the clientId was sent before)",
      status: 201,
      data: mealView,
      also: { status: 200, data: mealView, summary: 'The clientId was sent before: the first meal' },
    }),
    authenticate(),
    validate({ params: plannedMealParams, body: logPlannedMealRequest }),
    async (req, res) => {
      const { athlete } = await loadAthlete(req, 'log');
      const result = await new MealPlanService(req.ctx).logPlannedMeal(
        athlete,
        req.params.date,
        req.params.mealId,
        req.body,
      );
      res.status(result.created ? 201 : 200).json({ data: presentMeal(result.entry) });
    },
  );
  return router;
}

/** Meal-plan tools, mounted at /api/meal-plans. */
export function mealPlansRouter(): Router {
  const router = Router();

  // The fit is worked out on the server so one solver judges; nothing is stored.
  router.post(
    '/fit',
    responds({
      summary: "Propose grams for a meal plan's foods to meet the day's targets (nothing is stored)",
      data: mealPlanFit,
    }),
    authenticate(),
    validate({ body: fitMealPlanRequest }),
    async (req, res) => {
      const { actor } = requireAuth(req);
      authorizeFoods(actor, 'plan_meals', { teamId: actor.teamId });
      res.json({ data: await new MealPlanService(req.ctx).fit(actor, req.body) });
    },
  );

  return router;
}
