import type { DayView, ScheduleItem } from '@driftmark/shared';

/*
 * Display helpers for the day's targets card. The day's verdicts (on plan, drifting, off plan, not
 * logged, so far) are the server's (shared/src/rules/day-verdicts.ts): nothing here grades a day.
 * The supplement due window is a display rule of ours: common practice, no source.
 */

/** Minutes since midnight of an "HH:MM" clock time. */
export function clockMinutes(time: string): number {
  const [h = '0', m = '0'] = time.split(':');
  return Number(h) * 60 + Number(m);
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
