import type { PlanBaseline, PlanContent, TemplateRequest } from '../schemas/plans.js';

/**
 * Refusals beyond the zod shape, as path → message (empty when fine): weekdays naming a missing day
 * type, duplicate day-type keys or dates, a share (%) without an energy target, shares of a day that
 * do not add up to 100 % within 1 point (message names the fields; path on each macro), and — with a
 * baseline — relative targets that need a baseline figure the athlete lacks.
 */
export function validatePlanContent(
  content: PlanContent,
  baseline: PlanBaseline | null,
): Record<string, string> {
  void content;
  void baseline;
  throw new Error('not implemented');
}

/** The same rules for a template (no baseline), plus duplicate offsets. */
export function validateTemplate(template: TemplateRequest): Record<string, string> {
  void template;
  throw new Error('not implemented');
}
