import type { FoodView } from '@driftmark/shared';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { api } from './api-client';

/** The food list (GET /api/foods): labelling or logging a food invalidates `all`. */
export const foodKeys = {
  all: ['foods'] as const,
  search: (q: string, limit: number) => [...foodKeys.all, 'search', q, limit] as const,
};

/** Shortest search the list answers. */
export const FOOD_SEARCH_MIN_CHARS = 2;

/** GET /api/foods?q=&limit=: the team's foods, our everyday foods and the reference table, per 100 g. */
export function searchFoods(q: string, limit: number, signal?: AbortSignal): Promise<FoodView[]> {
  const params = new URLSearchParams({ q, limit: String(limit) });
  return api.get<FoodView[]>(`/api/foods?${params}`, signal);
}

/**
 * The food search both the day's food picker and the meal-plan editor use. `limits.search` foods
 * for a typed term; with the box empty, `limits.recent` recent and frequent foods when given,
 * otherwise nothing is asked.
 */
export function useFoodSearch(q: string, limits: { search: number; recent?: number }) {
  const term = q.trim();
  const limit = term ? limits.search : (limits.recent ?? 0);
  return useQuery({
    queryKey: foodKeys.search(term, limit),
    queryFn: ({ signal }) => searchFoods(term, limit, signal),
    enabled: term.length === 0 ? limit > 0 : term.length >= FOOD_SEARCH_MIN_CHARS,
    // The food list changes rarely; a repeated search needs no new request.
    staleTime: 5 * 60_000,
    placeholderData: keepPreviousData,
  });
}
