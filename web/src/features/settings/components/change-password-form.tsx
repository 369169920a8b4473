import { changePasswordRequest, LIMITS, type ChangePasswordRequest, type Me } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Form, SubmitButton } from '@/components/ui/form';
import { PasswordField } from '@/components/ui/password-field';
import { useChangePassword } from '../api/change-password';

export function ChangePasswordForm({ onChanged }: { onChanged: (me: Me) => void }) {
  const [done, setDone] = useState(false);
  const form = useForm<ChangePasswordRequest>({
    resolver: zodResolver(changePasswordRequest),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const change = useChangePassword({
    onSuccess: (me) => {
      setDone(true);
      form.reset({ currentPassword: '', newPassword: '' });
      onChanged(me);
    },
  });

  return (
    <Form
      form={form}
      onSubmit={(values) => {
        setDone(false);
        return change.mutateAsync(values);
      }}
      aria-label="Change password"
      className="space-y-5"
    >
      {done ? (
        <Alert tone="success" title="Password changed.">
          Every other device signed in to your account has been signed out.
        </Alert>
      ) : null}
      <PasswordField
        name="currentPassword"
        label="Current password"
        autoComplete="current-password"
        required
      />
      <PasswordField
        name="newPassword"
        label="New password"
        autoComplete="new-password"
        hint={`At least ${LIMITS.password.min} characters. Other devices are signed out when you save.`}
        required
      />
      <SubmitButton variant="secondary" pendingLabel="Changing…">
        Change password
      </SubmitButton>
    </Form>
  );
}
