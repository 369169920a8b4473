import { Navigate, useNavigate, useSearchParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { PageLoader } from '@/components/ui/spinner';
import { useMe } from '@/features/auth/api/get-me';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { safeNextPath } from '@/lib/safe-next';
import {
  clearSessionEnd,
  parseSessionEndReason,
  SESSION_END_MESSAGES,
  sessionEndReason,
} from '@/lib/session-end';
import { PublicShell } from '../layouts/public-shell';
import { homePathFor } from '../session';

/**
 * Most accounts are athletes: Today's code loads while the server checks the password (a few hundred
 * milliseconds), instead of after the answer.
 */
function preloadToday() {
  void import('./athlete-home').catch(() => undefined);
}

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const next = params.get('next');
  // Why the last session ended: from the redirect, or from this page's own check of a stale cookie.
  const reason = parseSessionEndReason(params.get('reason')) ?? sessionEndReason();
  const ended = reason ? SESSION_END_MESSAGES[reason] : null;

  // Already signed in (a second tab, the back button): straight on.
  if (me.data) return <Navigate to={safeNextPath(next, homePathFor(me.data))} replace />;

  return (
    <PublicShell>
      <title>Sign in · Driftmark</title>
      <h1 className="text-2xl font-bold text-ink">Sign in</h1>
      <p className="mt-1 mb-6 text-ink-muted">Athletes and coaches use the same door.</p>
      {ended ? (
        <Alert tone="caution" title={ended.title} className="mb-5">
          {ended.body}
        </Alert>
      ) : null}
      {me.isPending ? (
        <PageLoader label="Checking your session…" />
      ) : (
        <div className="rounded-lg border border-line bg-surface p-5 shadow-card sm:p-6">
          <SignInForm
            onSubmitting={preloadToday}
            onSignedIn={(user) => {
              clearSessionEnd();
              void navigate(safeNextPath(next, homePathFor(user)), { replace: true });
            }}
          />
        </div>
      )}
      <p className="mt-6 text-sm text-ink-muted">
        New here? Your coach sends you an invitation by e-mail; its link creates your account.
      </p>
    </PublicShell>
  );
}
