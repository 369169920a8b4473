import { forgotPasswordRequest, LIMITS, type ForgotPasswordRequest } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import type { ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Form, SubmitButton } from '@/components/ui/form';
import { TextField } from '@/components/ui/text-field';
import { useRequestPasswordReset } from '../api/forgot-password';

/** The answer never says whether the account exists: the same words either way. */
export const RESET_SENT_MESSAGE = 'If an account exists for that e-mail, a link is on its way';

export function ForgotPasswordForm({ afterSent }: { afterSent?: ReactNode }) {
  const form = useForm<ForgotPasswordRequest>({
    resolver: zodResolver(forgotPasswordRequest),
    defaultValues: { email: '' },
  });
  const request = useRequestPasswordReset();

  if (request.isSuccess) {
    return (
      <div className="space-y-4">
        <Alert tone="success" title={`${RESET_SENT_MESSAGE}.`}>
          The link works once and for {LIMITS.resetTokenTtlMinutes} minutes. Check your spam folder if nothing
          arrives.
        </Alert>
        {afterSent}
      </div>
    );
  }

  return (
    <Form
      form={form}
      onSubmit={(values) => request.mutateAsync(values)}
      aria-label="Reset your password"
      className="space-y-5"
    >
      <TextField
        name="email"
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        maxLength={LIMITS.email.max}
        hint="We send a link to reset the password to this address."
        required
      />
      <SubmitButton size="lg" className="w-full" pendingLabel="Sending…">
        Send reset link
      </SubmitButton>
    </Form>
  );
}
