import type { MarkView } from '@driftmark/shared';
import type { QueryClient, QueryKey } from '@tanstack/react-query';
import type { WithAbilities } from '@/lib/api-client';
import { markKeys } from './keys';

/**
 * Keys outside this feature that a mark write makes stale (the athlete's trend draws the marks; the
 * review queue counts unread replies). Features do not import each other, so the route that
 * composes them hands these in.
 */
export type LinkedKeys = readonly QueryKey[];

export interface MarkWriteOptions<T> {
  /** Runs after this hook's own invalidation. */
  onSuccess?: (result: T) => void;
  linkedKeys?: LinkedKeys;
}

/** What a list query holds: the marks, newest first, and what the server lets the viewer do. */
export type MarkList = WithAbilities<MarkView[]>;

export function marksPath(athleteId: string): string {
  return `/api/athletes/${encodeURIComponent(athleteId)}/marks`;
}

export function markPath(markId: string, rest = ''): string {
  return `/api/marks/${encodeURIComponent(markId)}${rest}`;
}

/** After a mark write: that athlete's mark lists and the linked keys, nothing else. */
export async function afterMarkWrite(
  queryClient: QueryClient,
  athleteId: string,
  linkedKeys: LinkedKeys = [],
): Promise<void> {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: markKeys.athlete(athleteId) }),
    ...linkedKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey })),
  ]);
}

/** Changes one mark in every cached list of the athlete (whatever the range) without a refetch. */
export function patchCachedMark(
  queryClient: QueryClient,
  athleteId: string,
  markId: string,
  patch: (mark: MarkView) => MarkView,
): void {
  queryClient.setQueriesData<MarkList>({ queryKey: markKeys.athlete(athleteId) }, (list) =>
    list ? { ...list, data: list.data.map((m) => (m.id === markId ? patch(m) : m)) } : list,
  );
}
