import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { isApiError } from '@/lib/api-client';
import { useConfirmDeletion } from '../api/confirm-deletion';

/** The landing page of the e-mailed deletion link: one last confirm, then the account is gone. */
export function ConfirmDeletionPanel({ token, signInHref }: { token: string; signInHref: string }) {
  const confirm = useConfirmDeletion(token);

  if (!token) {
    return (
      <Alert tone="error" title="This link is incomplete.">
        Open the link from the e-mail again, or ask for a new one in Settings.
      </Alert>
    );
  }
  if (confirm.isSuccess) {
    return (
      <div role="status">
        <p className="font-semibold text-ink">Your account has been deleted.</p>
        <p className="mt-1 text-sm text-ink-muted">
          Your data and photos are gone. A confirmation is on its way to your inbox.
        </p>
        <Link to={signInHref} className="mt-4 inline-block text-sm font-semibold">
          Back to sign-in
        </Link>
      </div>
    );
  }
  return (
    <div>
      <p className="mb-4 text-ink">
        This deletes your account, your days, plans, marks, replies, weekly check-ins and photos. It cannot be
        undone.
      </p>
      <Button variant="danger" loading={confirm.isPending} onClick={() => confirm.mutate()}>
        Delete my account for good
      </Button>
      {confirm.error ? (
        <p role="alert" className="mt-3 text-sm font-medium text-off-plan">
          {isApiError(confirm.error) ? confirm.error.message : 'That did not work. Please try again.'}
        </p>
      ) : null}
    </div>
  );
}
