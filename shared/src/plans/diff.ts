import type { PlanContent } from '../schemas/plans.js';

/** What changed between two versions, in plain words ("Rest day: energy 2200 → 2000 kcal"). */
export function describeChanges(previous: PlanContent | null, next: PlanContent): string[] {
  void previous;
  void next;
  throw new Error('not implemented');
}
