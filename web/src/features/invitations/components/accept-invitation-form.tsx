import { acceptInvitationRequest, LIMITS, type AcceptInvitationRequest, type Me } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Form, SubmitButton } from '@/components/ui/form';
import { PasswordField } from '@/components/ui/password-field';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { useAcceptInvitation } from '../api/accept-invitation';

interface AcceptInvitationFormProps {
  token: string;
  suggestedName: string;
  onAccepted: (me: Me) => void;
  /** The link stopped working between opening and submitting (410). */
  onTokenInvalid: () => void;
}

export function AcceptInvitationForm({
  token,
  suggestedName,
  onAccepted,
  onTokenInvalid,
}: AcceptInvitationFormProps) {
  const form = useForm<AcceptInvitationRequest>({
    resolver: zodResolver(acceptInvitationRequest),
    defaultValues: { token, name: suggestedName, password: '' },
  });
  const accept = useAcceptInvitation({ onSuccess: onAccepted });

  return (
    <Form
      form={form}
      onSubmit={async (values) => {
        try {
          await accept.mutateAsync(values);
        } catch (error) {
          if (isApiError(error) && error.code === 'token_invalid') {
            onTokenInvalid();
            return;
          }
          throw error;
        }
      }}
      mapServerField={(path) => (path === 'token' ? null : path)}
      aria-label="Create your account"
      className="space-y-5"
    >
      <input type="hidden" {...form.register('token')} />
      <TextField
        name="name"
        label="Your name"
        autoComplete="name"
        maxLength={LIMITS.name.max}
        hint="Shown to your coach and team."
        required
      />
      <PasswordField
        name="password"
        label="Password"
        autoComplete="new-password"
        hint={`At least ${LIMITS.password.min} characters. A few unrelated words make a strong, memorable passphrase.`}
        required
      />
      <SubmitButton size="lg" className="w-full" pendingLabel="Creating your account…">
        Create account
      </SubmitButton>
    </Form>
  );
}
