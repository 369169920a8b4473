import { unsubscribeRequest } from '@driftmark/shared';
import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { useUnsubscribeView } from '../api/get-unsubscribe';
import { useUnsubscribe } from '../api/unsubscribe';

/** A token the API could never have issued, or an answer that says the link is no good. */
function isDeadLink(error: unknown): boolean {
  return (
    isApiError(error) &&
    (error.code === 'token_invalid' || error.code === 'not_found' || error.code === 'validation_failed')
  );
}

function InvalidLink() {
  return (
    <Alert tone="error" title="This unsubscribe link does not work.">
      It may be incomplete or too old. Every e-mail from Driftmark carries a fresh link, or sign in and choose
      your e-mails in <Link to={paths.settingsEmail}>Settings</Link>.
    </Alert>
  );
}

/**
 * The page an unsubscribe link opens: names the e-mails the link stops and the address, stops them
 * with one button, then says how to turn them back on (Settings, E-mail card).
 */
export function UnsubscribePanel({ token }: { token: string }) {
  const wellFormed = unsubscribeRequest.safeParse({ token }).success;
  const view = useUnsubscribeView(token, { enabled: wellFormed });
  const stop = useUnsubscribe(token);

  if (!wellFormed) return <InvalidLink />;
  if (view.isPending) {
    return (
      <div aria-busy="true" aria-label="Checking the link" className="space-y-3">
        <Skeleton className="h-6 w-3/4" />
        <Skeleton className="h-12 w-48" />
      </div>
    );
  }
  if (view.isError) {
    if (isDeadLink(view.error)) return <InvalidLink />;
    return (
      <Alert
        tone="error"
        title="The link could not be checked."
        action={
          <Button variant="secondary" size="sm" onClick={() => void view.refetch()}>
            Try again
          </Button>
        }
      >
        {view.error.message}
      </Alert>
    );
  }

  const { label, email, done } = view.data;
  if (done) {
    return (
      <div className="space-y-4" data-testid="unsubscribe-done">
        <Alert tone="success" title="Done: these e-mails are stopped.">
          <span className="font-semibold text-ink">{label}</span> will no longer be sent to{' '}
          <span className="wrap-anywhere">{email}</span>.
        </Alert>
        <p className="text-sm text-ink-muted">
          Changed your mind? <Link to={paths.settingsEmail}>Turn them back on in Settings</Link>
        </p>
      </div>
    );
  }

  return (
    <div className="space-y-5" data-testid="unsubscribe-confirm">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
        <dt className="text-ink-faint">E-mails</dt>
        <dd className="font-semibold text-ink">{label}</dd>
        <dt className="text-ink-faint">Sent to</dt>
        <dd className="text-ink wrap-anywhere">{email}</dd>
      </dl>
      {stop.isError ? (
        isDeadLink(stop.error) ? (
          <InvalidLink />
        ) : (
          <Alert tone="error">{stop.error.message}</Alert>
        )
      ) : null}
      <Button size="lg" className="w-full sm:w-auto" loading={stop.isPending} onClick={() => stop.mutate()}>
        Stop these e-mails
      </Button>
      <p className="text-sm text-ink-muted">
        Other e-mails from Driftmark keep coming. To choose all of them,{' '}
        <Link to={paths.settingsEmail}>open Settings</Link>.
      </p>
    </div>
  );
}
