import { trendViewFromResponse, type TrendResponse, type TrendView } from '@driftmark/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { trendKeys } from './keys';

export function trendPath(athleteId: string, from: string, to: string): string {
  const query = new URLSearchParams({ from, to });
  return `/api/athletes/${encodeURIComponent(athleteId)}/trend?${query.toString()}`;
}

/**
 * The tag each trend the cache holds came with; it goes when the cache drops the data (a sign-out
 * clears the cache), since nothing else keeps the data object alive.
 */
const etags = new WeakMap<TrendView, string>();

/**
 * GET /api/athletes/:athleteId/trend?from&to: one row per day with drift, the rate, projection and
 * adherence. With the view already held for that range, its tag goes along and a 304 (the server's
 * figures unchanged) keeps it without the body being sent again.
 */
export async function getTrend(
  athleteId: string,
  from: string,
  to: string,
  signal?: AbortSignal,
  held?: TrendView,
): Promise<TrendView> {
  const result = await api.getConditional<TrendResponse>(
    trendPath(athleteId, from, to),
    held ? etags.get(held) : undefined,
    signal,
  );
  if (result.notModified) return held!;
  // The days come as columns; the screens read them as rows.
  const view = trendViewFromResponse(result.data);
  if (result.etag) etags.set(view, result.etag);
  return view;
}

export function trendQueryOptions(athleteId: string, from: string, to: string) {
  const queryKey = trendKeys.detail(athleteId, from, to);
  return queryOptions({
    queryKey,
    queryFn: ({ signal, client }) =>
      getTrend(athleteId, from, to, signal, client.getQueryData<TrendView>(queryKey)),
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
