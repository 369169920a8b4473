import { addDays } from './dates';

/** The ranges a coach (or athlete) picks between on the trend screens. */
export const TREND_RANGES = ['2w', '6w', 'season'] as const;
export type TrendRange = (typeof TREND_RANGES)[number];
export const TREND_RANGE_LABELS: Record<TrendRange, string> = {
  '2w': '2 weeks',
  '6w': '6 weeks',
  season: 'Season',
};

/** The season looks back at least this far (16 weeks) … */
export const SEASON_MIN_DAYS = 16 * 7;
/** … and never further than this (the mark range limit and a readable chart). */
export const SEASON_MAX_DAYS = 400;

export function isTrendRange(value: string | null | undefined): value is TrendRange {
  return (TREND_RANGES as readonly string[]).includes(value ?? '');
}

/**
 * The dates a range covers, ending today (both ends included). The season starts at the first plan
 * version or 16 weeks back, whichever is earlier, and covers at most 400 days.
 */
export function rangeDates(
  range: TrendRange,
  today: string,
  firstPlanDate: string | null = null,
): { from: string; to: string } {
  if (range === '2w') return { from: addDays(today, -13), to: today };
  if (range === '6w') return { from: addDays(today, -41), to: today };
  const sixteenWeeks = addDays(today, -(SEASON_MIN_DAYS - 1));
  const earliest = addDays(today, -(SEASON_MAX_DAYS - 1));
  let from = firstPlanDate !== null && firstPlanDate < sixteenWeeks ? firstPlanDate : sixteenWeeks;
  if (from < earliest) from = earliest;
  return { from, to: today };
}

/** The first plan version's start (where a season begins), from the versions' `effectiveFrom`. */
export function firstPlanDate(versions: readonly { effectiveFrom: string }[] | undefined): string | null {
  if (!versions || versions.length === 0) return null;
  return versions.reduce(
    (min, v) => (v.effectiveFrom < min ? v.effectiveFrom : min),
    versions[0]!.effectiveFrom,
  );
}
