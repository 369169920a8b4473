import type { CutoffBreach, DriftEntry, ResolvedTargets, Tolerances } from '@driftmark/shared';
import { cutoffBreachFor, driftFor, type DayActuals } from './analysis.js';

/**
 * A day's drift and cut-off breach against its targets. None without targets, and none for a day
 * after the athlete's today: nothing could have been logged yet, and a future day must not count
 * as "not logged" in adherence.
 */
export function dayDrift(input: {
  plan: { targets: ResolvedTargets; tolerances: Tolerances } | null;
  actuals: DayActuals;
  fluids: readonly { time: string; volumeMl: number }[];
  date: string;
  today: string;
}): { drift: DriftEntry[]; breach: CutoffBreach | null } {
  const { plan } = input;
  if (!plan || input.date > input.today) return { drift: [], breach: null };
  return {
    drift: driftFor(plan.targets, plan.tolerances, input.actuals),
    breach: cutoffBreachFor(plan.targets.fluidCutoff, input.fluids),
  };
}
