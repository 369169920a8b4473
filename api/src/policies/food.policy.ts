import { forbidden, notFound } from '../errors.js';
import type { Actor } from './actor.js';

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
