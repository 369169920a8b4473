import type { FoodView } from '@driftmark/shared';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { planFoodKeys } from './keys';

const LIMIT = 8;

/** GET /api/foods?q=&limit=: the team's foods and the reference table, per 100 g. */
export function searchPlanFoods(q: string, signal?: AbortSignal): Promise<FoodView[]> {
  const params = new URLSearchParams({ q, limit: String(LIMIT) });
  return api.get<FoodView[]>(`/api/foods?${params}`, signal);
}

export function usePlanFoodSearch(q: string) {
  const term = q.trim();
  return useQuery({
    queryKey: planFoodKeys.search(term),
    queryFn: ({ signal }) => searchPlanFoods(term, signal),
    enabled: term.length >= 2,
    staleTime: 5 * 60_000,
    placeholderData: keepPreviousData,
  });
}
