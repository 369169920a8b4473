import { Link } from 'react-router';
import { paths } from '@/config/paths';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';
import { useDevInboxAvailable } from '@/features/dev-inbox/api/get-mail-list';
import { PublicShell } from '../layouts/public-shell';

export function ForgotPasswordRoute() {
  const devInbox = useDevInboxAvailable();
  return (
    <PublicShell>
      <title>Forgot password · Driftmark</title>
      <h1 className="text-2xl font-bold text-ink">Forgot your password?</h1>
      <p className="mt-1 mb-6 text-ink-muted">
        Tell us the e-mail you sign in with and we send a link to set a new one.
      </p>
      <div className="rounded-lg border border-line bg-surface p-5 shadow-card sm:p-6">
        <ForgotPasswordForm
          afterSent={
            devInbox ? (
              <p className="text-sm text-ink-muted">
                Demo mode: open the <Link to={paths.devInbox}>demo inbox</Link> to read it.
              </p>
            ) : null
          }
        />
      </div>
      <p className="mt-6 text-sm">
        <Link to={paths.signIn}>Back to sign in</Link>
      </p>
    </PublicShell>
  );
}
