// Calendar dates and the clock in a zone: one implementation, in shared/src/calendar.ts.
import { addDays } from '@driftmark/shared';

export { addDays, clockIn, isIsoDate } from '@driftmark/shared';

/**
 * The pages of the history list: the newest `pageDays` days up to `to`, then the block before it,
 * and so on (inclusive ranges, newest first).
 */
export function historyPageRange(to: string, page: number, pageDays: number): { from: string; to: string } {
  const end = addDays(to, -page * pageDays);
  return { from: addDays(end, -(pageDays - 1)), to: end };
}
