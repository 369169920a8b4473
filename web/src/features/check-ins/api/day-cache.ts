import type { DayView } from '@driftmark/shared';
import type { QueryClient } from '@tanstack/react-query';
import type { WithAbilities } from '@/lib/api-client';
import { checkInKeys } from './keys';

/**
 * After a write: every entry route answers with the whole day, so it replaces the cached day at
 * once; then the day and the athlete's history lists (totals, markers) are refreshed, nothing else.
 */
export async function applyDayChange(
  queryClient: QueryClient,
  athleteId: string,
  day: DayView,
): Promise<void> {
  const key = checkInKeys.day(athleteId, day.date);
  queryClient.setQueryData<WithAbilities<DayView>>(key, (prev) => ({
    data: day,
    abilities: prev?.abilities ?? {},
  }));
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: key }),
    queryClient.invalidateQueries({ queryKey: checkInKeys.histories(athleteId) }),
  ]);
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
