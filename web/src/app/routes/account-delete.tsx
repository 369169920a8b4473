import { useSearchParams } from 'react-router';
import { paths } from '@/config/paths';
import { ConfirmDeletionPanel } from '@/features/data-rights/components/confirm-deletion-panel';
import { PublicShell } from '../layouts/public-shell';

/** /account/delete?token= from the deletion e-mail: public, works signed out. */
export function AccountDeleteRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  return (
    <PublicShell>
      <title>Delete your account · Driftmark</title>
      <h1 className="text-2xl font-bold text-ink">Delete your account</h1>
      <p className="mt-1 mb-6 text-ink-muted">The last step: confirm and everything is removed.</p>
      <div className="rounded-lg border border-line bg-surface p-5 shadow-card sm:p-6">
        <ConfirmDeletionPanel token={token} signInHref={paths.signIn} />
      </div>
    </PublicShell>
  );
}
