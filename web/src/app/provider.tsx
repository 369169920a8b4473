import { QueryClientProvider } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { RouterProvider } from 'react-router';
import { signInWithNext } from '@/config/paths';
import { authKeys } from '@/features/auth/api/keys';
import { DayLinkedKeys } from '@/features/check-ins/api/day-cache';
import { cutKeys } from '@/features/cuts/api/keys';
import { trendKeys } from '@/features/trends/api/keys';
import { setUnauthenticatedHandler } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { router } from './router';

/**
 * What a check-in write makes stale beyond the day and its history: the athlete's trend ranges,
 * and the making-weight view (its recovery checklist is ticked by the day's fluids and meals).
 */
const dayLinkedKeys = (athleteId: string) => [trendKeys.athlete(athleteId), cutKeys.detail(athleteId)];

// A 401 from any call but /api/me and sign-in means the session ended (expired, revoked on
// another device): forget the user and go to sign-in, coming back here afterwards.
setUnauthenticatedHandler((next, reason) => {
  queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
  queryClient.setQueryData(authKeys.me, null);
  if (window.location.pathname !== '/sign-in')
    void router.navigate(signInWithNext(next, reason), { replace: true });
});

export function App() {
  return (
    <StrictMode>
      <QueryClientProvider client={queryClient}>
        <DayLinkedKeys.Provider value={dayLinkedKeys}>
          <RouterProvider router={router} />
        </DayLinkedKeys.Provider>
      </QueryClientProvider>
    </StrictMode>
  );
}
