import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { countUnread } from '../utils/marks';
import { markKeys, type MarkRange } from './keys';
import { marksPath, type MarkList } from './mark-cache';

/** GET /api/athletes/:athleteId/marks?from&to: the athlete's marks overlapping the range, newest first. */
export function listMarks(athleteId: string, range: MarkRange = {}, signal?: AbortSignal): Promise<MarkList> {
  const q = new URLSearchParams();
  if (range.from) q.set('from', range.from);
  if (range.to) q.set('to', range.to);
  const query = q.toString();
  return api.getWithAbilities(`${marksPath(athleteId)}${query ? `?${query}` : ''}`, signal);
}

export function marksQueryOptions(athleteId: string, range: MarkRange = {}) {
  return queryOptions({
    queryKey: markKeys.list(athleteId, range),
    queryFn: ({ signal }) => listMarks(athleteId, range, signal),
  });
}

/** The marks in `data.data`; a chart and the list asking for the same range share one request. */
export function useMarks(athleteId: string, range: MarkRange = {}, options: { enabled?: boolean } = {}) {
  return useQuery({
    ...marksQueryOptions(athleteId, range),
    enabled: athleteId !== '' && (options.enabled ?? true),
  });
}

/** How many of the athlete's marks (all of them) hold something the viewer has not read: for a nav badge. */
export function useUnreadMarkCount(athleteId: string): number {
  const { data } = useQuery({
    ...marksQueryOptions(athleteId),
    enabled: athleteId !== '',
    select: (list) => countUnread(list.data),
  });
  return data ?? 0;
}
