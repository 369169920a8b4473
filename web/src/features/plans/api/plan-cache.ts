import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { planKeys } from './keys';

/**
 * Keys outside this feature that a plan write makes stale (the athlete's day views carry the
 * targets in force and the cautions; the profile carries the event). Features do not import each
 * other, so the route that composes them hands these in.
 */
export type LinkedKeys = readonly QueryKey[];

export interface PlanWriteOptions<T> {
  /** Runs after this hook's own invalidation. */
  onSuccess?: (result: T) => void;
  linkedKeys?: LinkedKeys;
}

export function planPath(athleteId: string, rest = ''): string {
  return `/api/athletes/${encodeURIComponent(athleteId)}/plan${rest}`;
}

/** After a plan write: the athlete's plan queries and the linked keys (their days), nothing else. */
export async function afterPlanWrite(
  queryClient: QueryClient,
  athleteId: string,
  linkedKeys: LinkedKeys = [],
): Promise<void> {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: planKeys.athlete(athleteId) }),
    ...linkedKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey })),
  ]);
}
