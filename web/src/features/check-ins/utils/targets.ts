import { amountAfter, type DayView, type FluidCutoff, type ScheduleItem } from '@driftmark/shared';

/*
 * Progress of a day against its targets, for the athlete's Today screen and the day pages. The
 * tolerances come from the plan version in force (DEFAULT_TOLERANCES unless the coach changed them);
 * the grading beyond them (drifting up to twice the tolerance, the supplement due window) is a
 * display rule of ours: common practice, no source.
 */

/**
 * on-plan: within the tolerance. to-go: today and still below the band (the day is not over).
 * drifting: outside the band by at most the tolerance again. off-plan: further out.
 * not-logged: nothing logged for the metric.
 */
export type ProgressState = 'on-plan' | 'to-go' | 'drifting' | 'off-plan' | 'not-logged';

export interface AmountProgress {
  target: number;
  /** Null when nothing is logged for the metric. */
  actual: number | null;
  /** The tolerance band, clamped at zero. */
  low: number;
  high: number;
  state: ProgressState;
  /** actual − target (0 when not logged). */
  difference: number;
}

/**
 * A logged amount against a target with a tolerance either side (energy, macros, water, sodium).
 * `inProgress` is true on the athlete's today: being under the band then means "still to go".
 */
export function amountProgress(input: {
  target: number;
  actual: number | null;
  tolerance: number;
  inProgress: boolean;
}): AmountProgress {
  const tolerance = Math.max(0, input.tolerance);
  const { target, actual } = input;
  const low = Math.max(0, target - tolerance);
  const high = target + tolerance;
  if (actual === null) return { target, actual, low, high, state: 'not-logged', difference: 0 };
  const difference = actual - target;
  const outside = Math.abs(difference) - tolerance;
  let state: ProgressState;
  if (outside <= 1e-9) state = 'on-plan';
  else if (difference < 0 && input.inProgress) state = 'to-go';
  else state = outside <= tolerance + 1e-9 ? 'drifting' : 'off-plan';
  return { target, actual, low, high, state, difference };
}

/** Tolerance given as a share of the target (energy, water, sodium). */
export function percentOf(target: number, pct: number): number {
  return (Math.abs(target) * pct) / 100;
}

/**
 * A target that is a minimum (steps, cardio minutes): reached is on plan; short of it on a finished
 * day is drifting within 10 % and off plan beyond (display rule, common practice, no source).
 */
export function minimumProgress(input: {
  target: number;
  actual: number | null;
  inProgress: boolean;
}): AmountProgress {
  const { target, actual } = input;
  const base = { target, actual, low: target, high: target };
  if (actual === null) return { ...base, state: 'not-logged', difference: 0 };
  const difference = actual - target;
  if (difference >= 0) return { ...base, state: 'on-plan', difference };
  if (input.inProgress) return { ...base, state: 'to-go', difference };
  return { ...base, state: -difference <= target * 0.1 ? 'drifting' : 'off-plan', difference };
}

/** Minutes since midnight of an "HH:MM" clock time. */
export function clockMinutes(time: string): number {
  const [h = '0', m = '0'] = time.split(':');
  return Number(h) * 60 + Number(m);
}

export interface CutoffProgress {
  cutoff: FluidCutoff;
  /** mL logged later than the cut-off time. */
  afterMl: number;
  /** Whether the cut-off time has passed (always true on a finished day). */
  started: boolean;
  /** over: more than the allowance after the cut-off. */
  state: 'before' | 'within' | 'over';
}

/**
 * Fluids logged after the cut-off. "No fluids after 18:00" counts drinks later than 18:00; one at
 * 18:00 itself still belongs before it.
 */
export function cutoffProgress(
  fluids: readonly Pick<DayView['fluids'][number], 'time' | 'volumeMl'>[],
  cutoff: FluidCutoff,
  now: string | null,
): CutoffProgress {
  const at = clockMinutes(cutoff.time);
  // The server's timing rule (shared `amountAfter`), so "after" means the same on both sides.
  const afterMl = amountAfter(
    fluids.map((f) => ({ time: f.time, amount: f.volumeMl })),
    cutoff.time,
    cutoff.allowanceMl,
  ).logged;
  const started = now === null || clockMinutes(now) > at;
  const state = afterMl > cutoff.allowanceMl + 1e-9 ? 'over' : started || afterMl > 0 ? 'within' : 'before';
  return { cutoff, afterMl, started, state };
}

/** Minutes before a scheduled time from which a dose counts as due, and after which it is late. */
export const DUE_EARLY_MIN = 30;
export const DUE_LATE_MIN = 60;

type Taken = Pick<DayView['supplements'][number], 'id' | 'time' | 'name' | 'scheduleItemId'>;

export interface SupplementSlot {
  /** Stable per item and time ("<itemId>@08:00"). */
  key: string;
  item: ScheduleItem;
  time: string;
  /** The entry that ticks this slot, if any. */
  taken: Taken | null;
  /**
   * taken; due (from 30 min before to 60 min after the time); late (later, not taken, today);
   * upcoming (more than 30 min ahead); missed (a finished day, not ticked).
   */
  state: 'taken' | 'due' | 'late' | 'upcoming' | 'missed';
}

const sameName = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/**
 * Each schedule item × clock time, with the entry that ticks it. Entries tick an item by
 * `scheduleItemId` (or, when logged by hand without one, by the same name); an item's entries fill
 * its times in order, so the first dose logged covers the first dose planned (an entry records no
 * slot, only the item). `now` is null on a finished day.
 */
export function supplementSlots(
  schedule: readonly ScheduleItem[],
  entries: readonly Taken[],
  now: string | null,
): SupplementSlot[] {
  const used = new Set<string>();
  const slots: SupplementSlot[] = [];
  const byTime = [...entries].sort((a, b) => clockMinutes(a.time) - clockMinutes(b.time));
  // Linked entries are claimed first, so a hand-logged namesake never takes a linked entry's slot.
  for (const pass of ['linked', 'named'] as const) {
    for (const item of schedule) {
      const own =
        pass === 'linked'
          ? byTime.filter((e) => e.scheduleItemId === item.id)
          : byTime.filter((e) => e.scheduleItemId === null && sameName(e.name, item.item));
      if (pass === 'linked') {
        for (const time of [...item.times].sort((a, b) => clockMinutes(a) - clockMinutes(b))) {
          slots.push({ key: `${item.id}@${time}`, item, time, taken: null, state: 'upcoming' });
        }
      }
      for (const entry of own) {
        if (used.has(entry.id)) continue;
        const slot = slots.find((s) => s.item.id === item.id && s.taken === null);
        if (!slot) break;
        slot.taken = entry;
        used.add(entry.id);
      }
    }
  }
  const nowMin = now === null ? null : clockMinutes(now);
  for (const slot of slots) {
    const at = clockMinutes(slot.time);
    if (slot.taken) slot.state = 'taken';
    else if (nowMin === null) slot.state = 'missed';
    else if (nowMin < at - DUE_EARLY_MIN) slot.state = 'upcoming';
    else if (nowMin <= at + DUE_LATE_MIN) slot.state = 'due';
    else slot.state = 'late';
  }
  return slots.sort(
    (a, b) => clockMinutes(a.time) - clockMinutes(b.time) || a.item.item.localeCompare(b.item.item),
  );
}

/** Sodium logged, with how many meals carry a sodium figure; null total when none does. */
export function sodiumLogged(day: Pick<DayView, 'meals' | 'totals'>): {
  mg: number | null;
  known: number;
  meals: number;
} {
  const known = day.meals.filter((m) => m.sodiumMg !== null).length;
  return { mg: day.totals.sodiumMg, known, meals: day.meals.length };
}
