import type { AcknowledgementView, DayCaution, PlanContent } from '../schemas/plans.js';

/**
 * The cautions the athlete sees on `date` under a version: the standing countdown caution on a
 * countdown day, and every acknowledged warning whose scope covers the day (plan-wide; the day's
 * day type when the day follows the pattern; the date itself).
 */
export function cautionsForDay(input: {
  content: PlanContent;
  date: string;
  acknowledgements: readonly Pick<
    AcknowledgementView,
    'code' | 'severity' | 'scope' | 'message' | 'source' | 'at'
  >[];
}): DayCaution[] {
  void input;
  throw new Error('not implemented');
}
