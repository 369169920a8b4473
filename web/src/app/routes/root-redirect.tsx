import { Navigate } from 'react-router';
import { PageLoader } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { homePathFor } from '../session';
import { LoadFailedPage } from './load-failed';

/** "/": athletes to their day (or the intake first), staff to the roster, everyone else to sign-in. */
export function RootRedirect() {
  const me = useMe();
  if (me.isPending) return <PageLoader label="Opening Driftmark…" />;
  if (me.isError) return <LoadFailedPage error={me.error} onRetry={() => void me.refetch()} />;
  return <Navigate to={me.data ? homePathFor(me.data) : paths.signIn} replace />;
}
