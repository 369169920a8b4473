import type { LabelFoodResult } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { LinkedKeys } from './keys';

/**
 * POST /api/athletes/:athleteId/foods/barcode: the server looks the product up (nothing about the
 * athlete leaves it) and answers the athlete's personal food, new or already theirs.
 */
export function lookupBarcode(athleteId: string, barcode: string): Promise<LabelFoodResult> {
  return api.post<LabelFoodResult>(`/api/athletes/${encodeURIComponent(athleteId)}/foods/barcode`, {
    barcode,
  });
}

export function useLookupBarcode(athleteId: string, options: { linkedKeys?: LinkedKeys } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (barcode: string) => lookupBarcode(athleteId, barcode),
    onSuccess: async () => {
      await Promise.all(
        (options.linkedKeys ?? []).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      );
    },
  });
}
