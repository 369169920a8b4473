import { isStaffRole } from '@driftmark/shared';
import { Navigate, Outlet, useLocation } from 'react-router';
import { PageLoader } from '@/components/ui/spinner';
import { signInWithNext } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { ForbiddenPage } from './routes/forbidden';
import { LoadFailedPage } from './routes/load-failed';
import { sessionEndReason } from '@/lib/session-end';
import { useCurrentUser } from './session';

/**
 * Waits for the session; sends signed-out visitors to sign-in and back here afterwards, saying why
 * when the server said this browser's session ended.
 */
export function RequireSignedIn() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <PageLoader label="Checking your session…" />;
  if (me.isError) return <LoadFailedPage error={me.error} onRetry={() => void me.refetch()} />;
  if (!me.data)
    return (
      <Navigate to={signInWithNext(`${location.pathname}${location.search}`, sessionEndReason())} replace />
    );
  return <Outlet />;
}

export function RequireAthlete() {
  const me = useCurrentUser();
  if (me.role !== 'athlete') {
    return (
      <ForbiddenPage title="This page is for athletes">
        You are signed in as {me.name}, a member of the coaching staff. Athlete pages show one athlete&apos;s
        own day; your athletes&apos; details are on your roster.
      </ForbiddenPage>
    );
  }
  return <Outlet />;
}

export function RequireStaff() {
  const me = useCurrentUser();
  if (!isStaffRole(me.role)) {
    return (
      <ForbiddenPage title="This page is for coaches">
        You are signed in as {me.name}, an athlete. Coach pages show a whole team; your own day, countdown and
        settings are on your home page.
      </ForbiddenPage>
    );
  }
  return <Outlet />;
}
