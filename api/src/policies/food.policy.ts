import { forbidden, notFound } from '../errors.js';
import type { Actor } from './actor.js';
import { canOnAthlete, type AthleteTarget } from './athlete.policy.js';

/** The food list of a team: its own foods plus the shared reference table. */
export interface FoodListTarget {
  teamId: string;
}

export const FOOD_ACTIONS = [
  /** Search the list (and log a meal from it). */
  'read',
  /** Add a team food. */
  'create',
  /** Fit a meal plan's quantities from the list's foods (planning is staff work). */
  'plan_meals',
] as const;
export type FoodAction = (typeof FOOD_ACTIONS)[number];

const RULES: Record<Actor['role'], readonly FoodAction[]> = {
  owner: ['read', 'create', 'plan_meals'],
  coach: ['read', 'create', 'plan_meals'],
  assistant: ['read'],
  athlete: ['read'],
};

export function canOnFoods(actor: Actor, action: FoodAction, target: FoodListTarget): boolean {
  if (actor.teamId !== target.teamId) return false;
  return RULES[actor.role].includes(action);
}

/** 404 for another team's list, 403 for an action the actor's role may not take. */
export function authorizeFoods(actor: Actor, action: FoodAction, target: FoodListTarget): void {
  if (!canOnFoods(actor, 'read', target)) throw notFound();
  if (!canOnFoods(actor, action, target)) throw forbidden();
}

export function foodAbilities(actor: Actor, target: FoodListTarget) {
  return { create: canOnFoods(actor, 'create', target) };
}

/** One food by id: a team food, or a personal food with what the athlete policy needs of its athlete. */
export interface FoodTarget {
  teamId: string;
  /** Set for a personal food: only those who read this athlete see it. */
  athlete: AthleteTarget | null;
}

/**
 * A team food: anyone of the team. A personal food: the athlete and the staff who read that athlete
 * (the athlete policy's `read`: owner, assigned coach, staff it is shared with); nobody else.
 */
export function canReadFood(actor: Actor, target: FoodTarget): boolean {
  if (target.athlete) return canOnAthlete(actor, 'read', target.athlete);
  return actor.teamId === target.teamId;
}

/** 404 when the actor may not see this food (ids never reveal another team's or athlete's foods). */
export function authorizeReadFood(actor: Actor, target: FoodTarget): void {
  if (!canReadFood(actor, target)) throw notFound();
}
