/** Calendar dates (YYYY-MM-DD) as people in a given time zone see them: shared/src/calendar.ts. */
import { todayIn } from '@driftmark/shared';

export { addDays, daysBetween } from '@driftmark/shared';

/** The date it is at `at` in `timeZone`. */
export function localDate(at: Date, timeZone: string): string {
  return todayIn(timeZone, at);
}
