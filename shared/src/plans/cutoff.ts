import type { FluidCap, FluidCutoff, FoodCutoff } from '../schemas/plans.js';

/** Seconds since midnight of "HH:MM" or "HH:MM:SS". */
function clockSeconds(time: string): number {
  const [h = 0, m = 0, s = 0] = time.split(':').map(Number);
  return h * 3600 + m * 60 + s;
}

/**
 * The one timing rule, for the fluid cut-off, the food cut-off and the fluid cap alike: what was
 * logged strictly after `after` (an entry at the cut-off minute itself is still in time; every
 * entry of the day when `after` is null), and how far that goes beyond `allowance`
 * (common practice, no source). Entries carry the athlete's own clock time.
 */
export function amountAfter(
  entries: readonly { time: string; amount: number }[],
  after: string | null,
  allowance: number,
): { logged: number; excess: number } {
  const limit = after === null ? -1 : clockSeconds(after);
  const logged = entries.filter((e) => clockSeconds(e.time) > limit).reduce((sum, e) => sum + e.amount, 0);
  return { logged, excess: logged - allowance };
}

/** A timing target broken on a day: which one, its clock time, and the amounts (mL or kcal). */
export interface TimingBreach {
  kind: 'fluid_cutoff' | 'food_cutoff' | 'fluid_cap';
  /** The athlete's clock time it counts after; null for a cap over the whole day. */
  after: string | null;
  unit: 'ml' | 'kcal';
  allowance: number;
  logged: number;
  excess: number;
}

/** Every timing target of the day that the logged fluids and meals went beyond, in that order. */
export function timingBreaches(
  targets: {
    fluidCutoff: FluidCutoff | null;
    foodCutoff: FoodCutoff | null;
    fluidCap: FluidCap | null;
  },
  fluids: readonly { time: string; volumeMl: number }[],
  meals: readonly { time: string; energyKcal: number }[],
): TimingBreach[] {
  const fluidAmounts = fluids.map((f) => ({ time: f.time, amount: f.volumeMl }));
  const mealAmounts = meals.map((m) => ({ time: m.time, amount: m.energyKcal }));
  const rules: Omit<TimingBreach, 'logged' | 'excess'>[] = [];
  const { fluidCutoff, foodCutoff, fluidCap } = targets;
  if (fluidCutoff)
    rules.push({
      kind: 'fluid_cutoff',
      after: fluidCutoff.time,
      unit: 'ml',
      allowance: fluidCutoff.allowanceMl,
    });
  if (foodCutoff)
    rules.push({
      kind: 'food_cutoff',
      after: foodCutoff.time,
      unit: 'kcal',
      allowance: foodCutoff.allowanceKcal,
    });
  if (fluidCap)
    rules.push({ kind: 'fluid_cap', after: fluidCap.after, unit: 'ml', allowance: fluidCap.maxMl });
  return rules.flatMap((r) => {
    const { logged, excess } = amountAfter(
      r.unit === 'ml' ? fluidAmounts : mealAmounts,
      r.after,
      r.allowance,
    );
    return excess > 0 ? [{ ...r, logged, excess }] : [];
  });
}
