import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { authKeys } from '@/features/auth/api/keys';
import { useInvitationLookup } from '@/features/invitations/api/lookup-invitation';
import { AcceptInvitationForm } from '@/features/invitations/components/accept-invitation-form';
import { InvitationPreviewCard } from '@/features/invitations/components/invitation-preview-card';
import { PublicShell } from '../layouts/public-shell';
import { homePathFor } from '../session';

export function AcceptInvitationRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const lookup = useInvitationLookup(token);
  const me = useMe();
  const [spent, setSpent] = useState(false);

  const invalid =
    spent ||
    (lookup.isError && lookup.error.status === 410) ||
    (lookup.isError && lookup.error.status === 404);

  return (
    <PublicShell>
      <title>Join your team · Driftmark</title>
      <h1 className="mb-5 text-2xl font-bold text-ink">Join your team</h1>
      {invalid ? (
        <div className="space-y-5">
          <Alert tone="error" title="This invitation link has expired or was already used.">
            Invitation links work once and for a limited time. Ask the coach who invited you to send it again;
            the newest link is the one that works. If you already created your account, sign in.
          </Alert>
          <ButtonLink to={paths.signIn} variant="secondary">
            Go to sign in
          </ButtonLink>
        </div>
      ) : lookup.isPending ? (
        <div aria-busy="true" aria-label="Loading the invitation" className="space-y-3">
          <Skeleton className="h-40" />
          <Skeleton className="h-11" />
          <Skeleton className="h-11" />
        </div>
      ) : lookup.isError ? (
        <Alert
          tone="error"
          title="The invitation could not be loaded."
          action={
            <Button variant="secondary" size="sm" onClick={() => void lookup.refetch()}>
              Try again
            </Button>
          }
        >
          {lookup.error.message}
        </Alert>
      ) : (
        <>
          <InvitationPreviewCard preview={lookup.data} />
          {me.data ? (
            <Alert tone="info" className="mb-5">
              You are signed in as {me.data.email}. Creating this account signs you in as {lookup.data.email}{' '}
              instead.
            </Alert>
          ) : null}
          <h2 className="mb-1 text-lg font-semibold text-ink">Create your account</h2>
          <p className="mb-5 text-sm text-ink-muted">
            You sign in with <span className="font-semibold text-ink">{lookup.data.email}</span> and the
            password you choose here.
          </p>
          <AcceptInvitationForm
            token={token}
            suggestedName={lookup.data.name}
            onAccepted={(user) => {
              queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
              queryClient.setQueryData(authKeys.me, user);
              void navigate(homePathFor(user), { replace: true });
            }}
            onTokenInvalid={() => setSpent(true)}
          />
          <p className="mt-6 text-sm text-ink-muted">
            Already have an account? <Link to={paths.signIn}>Sign in</Link>
          </p>
        </>
      )}
    </PublicShell>
  );
}
