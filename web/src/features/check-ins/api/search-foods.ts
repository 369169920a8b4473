import type { FoodView } from '@driftmark/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { foodKeys } from './keys';

/** Shortest search the list answers. */
export const FOOD_SEARCH_MIN_CHARS = 2;
export const FOOD_SEARCH_LIMIT = 12;

/** GET /api/foods?q=&limit=: the team's foods, our everyday foods and the reference table, per 100 g. */
/** Foods listed with the box empty (recent and frequent): fewer, to keep the phone's form short. */
export const FOOD_RECENT_LIMIT = 8;

export function searchFoods(q: string, signal?: AbortSignal): Promise<FoodView[]> {
  const params = new URLSearchParams({ q, limit: String(q ? FOOD_SEARCH_LIMIT : FOOD_RECENT_LIMIT) });
  return api.get<FoodView[]>(`/api/foods?${params}`, signal);
}

export function foodSearchQueryOptions(q: string) {
  return queryOptions({
    queryKey: foodKeys.search(q),
    queryFn: ({ signal }) => searchFoods(q, signal),
    // The food list changes rarely; a repeated search needs no new request.
    staleTime: 5 * 60_000,
  });
}

/** An empty term asks for the athlete's recent and frequent foods. */
export function useFoodSearch(q: string) {
  const term = q.trim();
  return useQuery({
    ...foodSearchQueryOptions(term),
    enabled: term.length === 0 || term.length >= FOOD_SEARCH_MIN_CHARS,
    placeholderData: keepPreviousData,
  });
}
