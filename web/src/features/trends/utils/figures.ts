import type { AdherenceWeekInRange, DriftMetric } from '@driftmark/shared';

/** A true minus sign (U+2212) and an explicit plus, for rates that read as directions. */
export function signed(value: number, digits = 1): string {
  const text = Math.abs(value).toFixed(digits);
  if (Number(text) === 0) return (0).toFixed(digits);
  return `${value < 0 ? '\u2212' : '+'}${text}`;
}

export interface WeekSummary {
  weekStart: string;
  /** The week's span inside the range and whether it is partial, as the server gives them. */
  from: string;
  to: string;
  days: number;
  partial: boolean;
  metric: DriftMetric;
  onPlanDays: number;
  loggedDays: number;
  targetDays: number;
  adherence: number | null;
}

/** The newest week that had targets, metric by metric (for the plain-words summary). */
export function latestWeek(adherence: readonly AdherenceWeekInRange[]): WeekSummary[] {
  const withTargets = adherence.filter((w) => w.targetDays > 0);
  if (withTargets.length === 0) return [];
  const newest = withTargets.reduce((a, w) => (w.weekStart > a ? w.weekStart : a), withTargets[0]!.weekStart);
  // The server's rows carry every field a summary needs (and a few more the summary ignores).
  return withTargets.filter((w) => w.weekStart === newest);
}

/**
 * The adherence table's rows: weeks newest first (each with its span inside the range, as the server
 * labels it), and the metrics that had a target in any of them.
 */
export function adherenceGrid(adherence: readonly AdherenceWeekInRange[], order: readonly DriftMetric[]) {
  const spans = new Map(
    adherence.map((w) => [
      w.weekStart,
      { weekStart: w.weekStart, from: w.from, to: w.to, days: w.days, partial: w.partial },
    ]),
  );
  const weeks = [...spans.values()].sort((a, b) => b.weekStart.localeCompare(a.weekStart));
  const metrics = order.filter((m) => adherence.some((w) => w.metric === m && w.targetDays > 0));
  const cell = new Map(adherence.map((w) => [`${w.weekStart}|${w.metric}`, w]));
  return {
    weeks,
    metrics,
    at: (weekStart: string, metric: DriftMetric) => cell.get(`${weekStart}|${metric}`) ?? null,
  };
}
