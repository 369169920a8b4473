import type { DaySummary } from '@driftmark/shared';
import { daysBetween } from '@driftmark/shared';
import { addDays } from './dates';

export type HistoryItem =
  | { kind: 'day'; day: DaySummary }
  /** Days without anything logged between two logged days (or before the first one shown). */
  | { kind: 'gap'; from: string; to: string; days: number };

/**
 * Logged days newest first, with the stretches nothing was logged shown as gaps, so a missed
 * week reads as a missed week. `to` is the newest date covered (the athlete's today): days from
 * it back to the first logged day count as a gap too, except today itself (still under way).
 */
export function withGaps(days: readonly DaySummary[], to: string): HistoryItem[] {
  const sorted = [...days].sort((a, b) => (a.date < b.date ? 1 : a.date > b.date ? -1 : 0));
  const items: HistoryItem[] = [];
  // The newest day that could hold entries and is not shown yet: yesterday, when today is empty.
  let expected = sorted[0]?.date === to ? to : addDays(to, -1);
  for (const day of sorted) {
    if (day.date > expected) continue;
    const missing = daysBetween(day.date, expected);
    if (missing > 0) {
      items.push({ kind: 'gap', from: addDays(day.date, 1), to: expected, days: missing });
    }
    items.push({ kind: 'day', day });
    expected = addDays(day.date, -1);
  }
  return items;
}

/** The marker a day's row carries: urgent symptoms first, then any symptom. */
export function symptomMarker(day: Pick<DaySummary, 'urgent' | 'symptomCount'>): 'urgent' | 'symptom' | null {
  if (day.urgent) return 'urgent';
  return day.symptomCount > 0 ? 'symptom' : null;
}
