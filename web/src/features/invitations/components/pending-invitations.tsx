import { ROLE_LABELS, type InvitationSummary } from '@driftmark/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { EnvelopeIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { formatInstantDate } from '@/lib/format';
import { useInvitations } from '../api/get-invitations';
import { useResendInvitation } from '../api/resend-invitation';
import { useRevokeInvitation } from '../api/revoke-invitation';

const LIST_ID = 'pending-invitations-heading';

export function PendingInvitations({ timeZone }: { timeZone: string }) {
  const invitations = useInvitations();
  // One clock reading per visit: whether a link has expired does not need to tick live.
  const [now] = useState(() => Date.now());

  return (
    <section aria-labelledby={LIST_ID}>
      <h2 id={LIST_ID} className="mb-3 text-lg font-semibold text-ink">
        Pending invitations
      </h2>
      {invitations.isPending ? (
        <div className="space-y-2" aria-busy="true" aria-label="Loading invitations">
          {[0, 1, 2].map((i) => (
            <Skeleton key={i} className="h-16" />
          ))}
        </div>
      ) : invitations.isError ? (
        <Alert
          tone="error"
          title="The invitations could not be loaded."
          action={
            <Button size="sm" variant="secondary" onClick={() => void invitations.refetch()}>
              Try again
            </Button>
          }
        >
          {invitations.error.message}
        </Alert>
      ) : invitations.data.length === 0 ? (
        <EmptyState icon={<EnvelopeIcon />} title="No invitations waiting" level={3}>
          Nobody is waiting to accept an invitation. Each one you send is listed here until the link is used,
          revoked or replaced.
        </EmptyState>
      ) : (
        <ul
          aria-labelledby={LIST_ID}
          className="divide-y divide-line overflow-hidden rounded-lg border border-line bg-surface shadow-card"
        >
          {invitations.data.map((invitation) => (
            <InvitationRow key={invitation.id} invitation={invitation} timeZone={timeZone} now={now} />
          ))}
        </ul>
      )}
    </section>
  );
}

function InvitationRow({
  invitation,
  timeZone,
  now,
}: {
  invitation: InvitationSummary;
  timeZone: string;
  now: number;
}) {
  const resend = useResendInvitation();
  const revoke = useRevokeInvitation();
  const [confirming, setConfirming] = useState(false);
  const expired = new Date(invitation.expiresAt).getTime() < now;
  const failure = resend.error ?? revoke.error;

  return (
    <li className="flex flex-wrap items-center gap-x-6 gap-y-3 px-4 py-3">
      <div className="min-w-0 flex-1">
        <p className="flex flex-wrap items-center gap-2">
          <span className="font-semibold text-ink">{invitation.name}</span>
          <Badge tone="neutral">{ROLE_LABELS[invitation.role]}</Badge>
          {expired ? <Badge tone="not-logged">Link expired</Badge> : null}
        </p>
        <p className="truncate text-sm text-ink-muted">{invitation.email}</p>
        <p className="text-xs text-ink-faint tabular-nums">
          Invited by {invitation.invitedBy.name} · {expired ? 'expired' : 'valid until'}{' '}
          {formatInstantDate(invitation.expiresAt, timeZone)}
        </p>
        {resend.isSuccess && !resend.isPending ? (
          <p role="status" className="mt-1 text-sm font-medium text-on-plan">
            Sent again with a new link.
          </p>
        ) : null}
        {failure ? (
          <p role="alert" className="mt-1 text-sm font-medium text-off-plan">
            {isApiError(failure) ? failure.message : 'That did not work. Please try again.'}
          </p>
        ) : null}
      </div>
      {confirming ? (
        <div
          className="flex items-center gap-2"
          role="group"
          aria-label={`Revoke the invitation to ${invitation.email}?`}
        >
          <span className="text-sm text-ink">Revoke this link?</span>
          <Button
            size="sm"
            variant="danger"
            loading={revoke.isPending}
            onClick={() => revoke.mutate(invitation.id)}
          >
            Yes, revoke
          </Button>
          <Button size="sm" variant="ghost" onClick={() => setConfirming(false)}>
            Keep
          </Button>
        </div>
      ) : (
        <div className="flex items-center gap-2">
          <Button
            size="sm"
            variant="secondary"
            loading={resend.isPending}
            onClick={() => resend.mutate(invitation.id)}
            aria-label={`Resend the invitation to ${invitation.email}`}
          >
            Resend
          </Button>
          <Button
            size="sm"
            variant="ghost"
            onClick={() => setConfirming(true)}
            aria-label={`Revoke the invitation to ${invitation.email}`}
          >
            Revoke
          </Button>
        </div>
      )}
    </li>
  );
}
