import type { DaySummary } from '@driftmark/shared';
import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { historyPageRange } from '../utils/dates';
import { checkInKeys, type HistoryRange } from './keys';

/** Days a history page covers (the API allows up to 400 per request). */
export const HISTORY_PAGE_DAYS = 60;
/** How far back "load more" goes at most. */
export const HISTORY_MAX_PAGES = 30;

/** GET /api/athletes/:athleteId/days?from&to: days with anything logged, newest first. */
export function getHistory(
  athleteId: string,
  range: { from: string; to: string },
  signal?: AbortSignal,
): Promise<DaySummary[]> {
  const q = new URLSearchParams(range);
  return api.get<DaySummary[]>(`/api/athletes/${encodeURIComponent(athleteId)}/days?${q}`, signal);
}

export interface HistoryPage {
  from: string;
  to: string;
  days: DaySummary[];
}

export function historyQueryOptions(athleteId: string, range: HistoryRange) {
  return infiniteQueryOptions({
    queryKey: checkInKeys.history(athleteId, range),
    initialPageParam: 0,
    queryFn: async ({ pageParam, signal }): Promise<HistoryPage> => {
      const pageRange = historyPageRange(range.to, pageParam, range.pageDays);
      return { ...pageRange, days: await getHistory(athleteId, pageRange, signal) };
    },
    getNextPageParam: (_last, pages) => (pages.length < HISTORY_MAX_PAGES ? pages.length : undefined),
  });
}

/** The last `pageDays` days up to `to` (the athlete's today), then older pages on demand. */
export function useHistory(athleteId: string, to: string, pageDays = HISTORY_PAGE_DAYS) {
  return useInfiniteQuery({
    ...historyQueryOptions(athleteId, { to, pageDays }),
    enabled: athleteId !== '' && to !== '',
  });
}
