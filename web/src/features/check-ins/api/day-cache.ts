import type { DayView } from '@driftmark/shared';
import { useQueryClient, type QueryClient, type QueryKey } from '@tanstack/react-query';
import { createContext, useContext } from 'react';
import type { WithAbilities } from '@/lib/api-client';
import { checkInKeys } from './keys';

/** The entry lists of a day that writes answer into. */
export type EntryList = 'fluids' | 'meals' | 'supplements' | 'symptoms';
export type EntryOf<L extends EntryList> = DayView[L][number];

/**
 * What a change to an athlete's day makes stale outside this feature (their trend), given by the
 * app, which composes the features: `<DayLinkedKeys.Provider value={(id) => [...]}>`.
 */
export const DayLinkedKeys = createContext<(athleteId: string) => readonly QueryKey[]>(() => []);

function patchDay(
  queryClient: QueryClient,
  athleteId: string,
  date: string,
  change: (day: DayView) => DayView,
): void {
  queryClient.setQueryData<WithAbilities<DayView>>(checkInKeys.day(athleteId, date), (prev) =>
    prev ? { ...prev, data: change(prev.data) } : prev,
  );
}

/** The list with `entry` in place of the one with its id (or added), in the server's time order. */
export function withEntry<T extends { id: string; time: string }>(list: readonly T[], entry: T): T[] {
  const next = list.some((e) => e.id === entry.id)
    ? list.map((e) => (e.id === entry.id ? entry : e))
    : [...list, entry];
  // A stable sort: entries at the same minute keep the order they were made in, as the server's.
  return next.sort((a, b) => (a.time < b.time ? -1 : a.time > b.time ? 1 : 0));
}

/**
 * After a write. Every check-in write answers with what it wrote (the entry, the weigh-in, the
 * evening card), never the day: that goes straight into the cached day, and the day itself is
 * fetched again for what only the server works out (totals, drift and cut-off verdicts, cautions,
 * flags), with the athlete's history lists and what the app links to a day (the trend).
 */
export function useDayCache(athleteId: string) {
  const queryClient = useQueryClient();
  const linked = useContext(DayLinkedKeys);

  const refresh = async (date: string) => {
    await Promise.all([
      queryClient.invalidateQueries({ queryKey: checkInKeys.day(athleteId, date) }),
      queryClient.invalidateQueries({ queryKey: checkInKeys.histories(athleteId) }),
      ...linked(athleteId).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
    ]);
  };

  return {
    /** A created or edited entry. */
    entry: async <L extends EntryList>(date: string, list: L, entry: EntryOf<L>) => {
      patchDay(queryClient, athleteId, date, (day) => ({
        ...day,
        [list]: withEntry<EntryOf<L>>(day[list] as EntryOf<L>[], entry),
      }));
      await refresh(date);
    },
    /** A deleted entry. */
    removed: async (date: string, list: EntryList, entryId: string) => {
      patchDay(queryClient, athleteId, date, (day) => ({
        ...day,
        [list]: (day[list] as { id: string }[]).filter((e) => e.id !== entryId),
      }));
      await refresh(date);
    },
    /** The day's weigh-in or evening card as saved (null once deleted). */
    part: async <P extends 'weighIn' | 'evening'>(date: string, part: P, value: DayView[P]) => {
      patchDay(queryClient, athleteId, date, (day) => ({ ...day, [part]: value }));
      await refresh(date);
    },
  };
}

/**
 * Entry routes: creates go under the day (`…/days/:date/fluids`), while an entry, once it exists,
 * is addressed by its id alone (`…/fluids/:entryId`), whatever its date.
 */
export function entryPath(athleteId: string, date: string, kind: string): string {
  return `/api/athletes/${encodeURIComponent(athleteId)}/days/${encodeURIComponent(date)}/${kind}`;
}

export function entryByIdPath(athleteId: string, kind: string, entryId: string): string {
  return `/api/athletes/${encodeURIComponent(athleteId)}/${kind}/${encodeURIComponent(entryId)}`;
}
