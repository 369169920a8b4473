import { forbidden, notFound } from '../errors.js';
import type { Actor } from './actor.js';

/** A countdown template, or the team's library of them. */
export interface TemplateTarget {
  teamId: string;
}

export const TEMPLATE_ACTIONS = [
  /** List, open and apply templates (applying also needs `plan` on the athlete). */
  'read',
  /** Create, edit and delete templates. */
  'manage',
] as const;
export type TemplateAction = (typeof TEMPLATE_ACTIONS)[number];

// Templates are coaching material: athletes never see the library, only the days applied to them.
const RULES: Record<Actor['role'], readonly TemplateAction[]> = {
  owner: ['read', 'manage'],
  coach: ['read', 'manage'],
  assistant: ['read'],
  athlete: [],
};

export function canOnTemplate(actor: Actor, action: TemplateAction, target: TemplateTarget): boolean {
  if (actor.teamId !== target.teamId) return false;
  return RULES[actor.role].includes(action);
}

/** 404 for another team's template (or an athlete), 403 for staff who may read but not manage. */
export function authorizeTemplate(actor: Actor, action: TemplateAction, target: TemplateTarget): void {
  if (!canOnTemplate(actor, 'read', target)) throw notFound();
  if (!canOnTemplate(actor, action, target)) throw forbidden();
}

export function templateAbilities(actor: Actor, target: TemplateTarget) {
  return { manage: canOnTemplate(actor, 'manage', target) };
}
