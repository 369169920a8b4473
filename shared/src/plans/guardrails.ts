import type { GuardrailContext, GuardrailFloors, GuardrailWarning, PlanContent } from '../schemas/plans.js';

/** Team defaults for the floors; see the comments in the implementation for their sources. */
export const GUARDRAIL_DEFAULTS: GuardrailFloors = {
  energyKcal: { female: 1200, male: 1500 },
  waterMl: { female: 1600, male: 2000 },
};

/** Every guardrail warning for a content (each day type, each dated day, and plan-wide rates). */
export function checkGuardrails(content: PlanContent, ctx: GuardrailContext): GuardrailWarning[] {
  void content;
  void ctx;
  throw new Error('not implemented');
}

/** The warnings whose key is not in `acknowledgedKeys`. */
export function unacknowledged(
  warnings: readonly GuardrailWarning[],
  acknowledgedKeys: readonly string[],
): GuardrailWarning[] {
  const keys = new Set(acknowledgedKeys);
  return warnings.filter((w) => !keys.has(w.key));
}

/** Standing words on every countdown day and every day with an acknowledged warning. */
export const STOP_SIGNS_TEXT =
  'Stop and seek medical care at once if you feel dizzy, faint, have palpitations or feel confused.';
export const NOT_MEDICAL_ADVICE_TEXT =
  'This plan is not medical advice. Set it with a licensed physician or registered dietitian and ' +
  'within your federation or commission rules.';
