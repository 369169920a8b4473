/** A history range: the newest date and how many days a page covers. */
export interface HistoryRange {
  to: string;
  pageDays: number;
}

export const checkInKeys = {
  all: ['check-ins'] as const,
  /** Everything of one athlete (days and history). */
  athlete: (athleteId: string) => [...checkInKeys.all, athleteId] as const,
  /** One day (GET …/days/:date). */
  day: (athleteId: string, date: string) => [...checkInKeys.athlete(athleteId), 'day', date] as const,
  /** Every history list of one athlete, whatever its range: what a change to any day invalidates. */
  histories: (athleteId: string) => [...checkInKeys.athlete(athleteId), 'history'] as const,
  history: (athleteId: string, range: HistoryRange) =>
    [...checkInKeys.histories(athleteId), range.to, range.pageDays] as const,
};

export { foodKeys } from '../../../lib/food-search';
