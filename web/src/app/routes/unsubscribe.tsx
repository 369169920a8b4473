import { useSearchParams } from 'react-router';
import { UnsubscribePanel } from '@/features/settings/components/unsubscribe-panel';
import { PublicShell } from '../layouts/public-shell';

/** /unsubscribe?token= from an e-mail's footer: public, works signed out. */
export function UnsubscribeRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  return (
    <PublicShell>
      <title>Stop e-mails · Driftmark</title>
      <h1 className="text-2xl font-bold text-ink">Stop e-mails</h1>
      <p className="mt-1 mb-6 text-ink-muted">One kind of e-mail, stopped with one button.</p>
      <div className="rounded-lg border border-line bg-surface p-5 shadow-card sm:p-6">
        <UnsubscribePanel token={token} />
      </div>
    </PublicShell>
  );
}
