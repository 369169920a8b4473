import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { bodyCompositionKeys } from './keys';

/**
 * Keys outside this feature a measurement write makes stale (the plan's baseline takes the latest
 * lean mass). Features do not import each other, so the route that composes them hands these in.
 */
export type LinkedKeys = readonly QueryKey[];

export interface MeasurementWriteOptions<T> {
  /** Runs after this hook's own invalidation. */
  onSuccess?: (result: T) => void;
  linkedKeys?: LinkedKeys;
}

export async function afterMeasurementWrite(
  queryClient: QueryClient,
  athleteId: string,
  linkedKeys: LinkedKeys = [],
): Promise<void> {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: bodyCompositionKeys.athlete(athleteId) }),
    ...linkedKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey })),
  ]);
}
