import { LIMITS, resetPasswordRequest, type ResetPasswordRequest } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Form, SubmitButton } from '@/components/ui/form';
import { PasswordField } from '@/components/ui/password-field';
import { isApiError } from '@/lib/api-client';
import { useResetPassword } from '../api/reset-password';

interface ResetPasswordFormProps {
  token: string;
  onDone: () => void;
  /** The link was used, has expired or never existed (410). */
  onTokenInvalid: () => void;
}

export function ResetPasswordForm({ token, onDone, onTokenInvalid }: ResetPasswordFormProps) {
  const form = useForm<ResetPasswordRequest>({
    resolver: zodResolver(resetPasswordRequest),
    defaultValues: { token, password: '' },
  });
  const reset = useResetPassword();

  return (
    <Form
      form={form}
      onSubmit={async (values) => {
        try {
          await reset.mutateAsync(values);
          onDone();
        } catch (error) {
          if (isApiError(error) && error.code === 'token_invalid') {
            onTokenInvalid();
            return;
          }
          throw error;
        }
      }}
      mapServerField={(path) => (path === 'token' ? null : path)}
      aria-label="Reset password"
      className="space-y-5"
    >
      <input type="hidden" {...form.register('token')} />
      <PasswordField
        name="password"
        label="New password"
        autoComplete="new-password"
        hint={`At least ${LIMITS.password.min} characters. A few unrelated words make a strong, memorable passphrase.`}
        required
      />
      <SubmitButton size="lg" className="w-full" pendingLabel="Saving…">
        Save new password
      </SubmitButton>
    </Form>
  );
}
