import {
  cutoffVerdict,
  isInProgress,
  type CutoffBreach,
  type CutoffStatus,
  type DriftEntry,
  type ResolvedTargets,
  type Tolerances,
} from '@driftmark/shared';
import { cutoffBreachFor, driftFor, type DayActuals } from './analysis.js';

/**
 * A day's drift, cut-off status and breach against its targets, by the shared day-verdict rules.
 * None without targets, and none for a day after the athlete's today: nothing could have been
 * logged yet, and a future day must not count as "not logged" in adherence. The athlete's today is
 * in progress until their local day ends: every metric reads "so far", never on or off plan.
 */
export function dayDrift(input: {
  plan: { targets: ResolvedTargets; tolerances: Tolerances } | null;
  actuals: DayActuals;
  fluids: readonly { time: string; volumeMl: number }[];
  date: string;
  today: string;
}): { drift: DriftEntry[]; cutoff: CutoffStatus | null; breach: CutoffBreach | null } {
  const { plan } = input;
  if (!plan || input.date > input.today) return { drift: [], cutoff: null, breach: null };
  const inProgress = isInProgress(input.date, input.today);
  return {
    drift: driftFor(plan.targets, plan.tolerances, input.actuals, inProgress),
    cutoff: cutoffVerdict(plan.targets.fluidCutoff, input.fluids, inProgress),
    breach: cutoffBreachFor(plan.targets.fluidCutoff, input.fluids),
  };
}
