import type { TrendView } from '@driftmark/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { trendKeys } from './keys';

export function trendPath(athleteId: string, from: string, to: string): string {
  const query = new URLSearchParams({ from, to });
  return `/api/athletes/${encodeURIComponent(athleteId)}/trend?${query.toString()}`;
}

/** GET /api/athletes/:athleteId/trend?from&to: one row per day with drift, the rate, projection and adherence. */
export function getTrend(
  athleteId: string,
  from: string,
  to: string,
  signal?: AbortSignal,
): Promise<TrendView> {
  return api.get<TrendView>(trendPath(athleteId, from, to), signal);
}

export function trendQueryOptions(athleteId: string, from: string, to: string) {
  return queryOptions({
    queryKey: trendKeys.detail(athleteId, from, to),
    queryFn: ({ signal }) => getTrend(athleteId, from, to, signal),
  });
}

/** Keeps the previous range on screen while another range loads, so the charts do not jump to a skeleton. */
export function useTrend(athleteId: string, from: string, to: string, options: { enabled?: boolean } = {}) {
  return useQuery({
    ...trendQueryOptions(athleteId, from, to),
    enabled: athleteId !== '' && from !== '' && to !== '' && (options.enabled ?? true),
    placeholderData: keepPreviousData,
  });
}
