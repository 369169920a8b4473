import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useSearchParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { authKeys } from '@/features/auth/api/keys';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';
import { PublicShell } from '../layouts/public-shell';

type State = 'form' | 'done' | 'invalid';

/** Shortest token the API can have issued (shared resetPasswordRequest). */
const MIN_TOKEN_LENGTH = 20;

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const queryClient = useQueryClient();
  const [state, setState] = useState<State>(token.length >= MIN_TOKEN_LENGTH ? 'form' : 'invalid');

  return (
    <PublicShell>
      <title>Choose a new password · Driftmark</title>
      <h1 className="text-2xl font-bold text-ink">Choose a new password</h1>
      {state === 'invalid' ? (
        <div className="mt-6 space-y-5">
          <Alert tone="error" title="This reset link has expired or was already used.">
            Links work once and for a limited time. Ask for a new one; the newest link is the one that works.
          </Alert>
          <ButtonLink to={paths.forgotPassword}>Ask for a new link</ButtonLink>
        </div>
      ) : state === 'done' ? (
        <div className="mt-6 space-y-5">
          <Alert tone="success" title="Your password is changed.">
            For your safety every device was signed out. Sign in with the new password.
          </Alert>
          <ButtonLink to={paths.signIn}>Sign in</ButtonLink>
        </div>
      ) : (
        <>
          <p className="mt-1 mb-6 text-ink-muted">Signing in again on your other devices will need it too.</p>
          <div className="rounded-lg border border-line bg-surface p-5 shadow-card sm:p-6">
            <ResetPasswordForm
              token={token}
              onDone={() => {
                // The server ended every session of this account, this browser's included.
                queryClient.setQueryData(authKeys.me, null);
                setState('done');
              }}
              onTokenInvalid={() => setState('invalid')}
            />
          </div>
          <p className="mt-6 text-sm">
            <Link to={paths.signIn}>Back to sign in</Link>
          </p>
        </>
      )}
    </PublicShell>
  );
}
