import { LIMITS, signInRequest, type Me, type SignInRequest } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { Form, SubmitButton } from '@/components/ui/form';
import { PasswordField } from '@/components/ui/password-field';
import { TextField } from '@/components/ui/text-field';
import { paths } from '@/config/paths';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: (me: Me) => void }) {
  const form = useForm<SignInRequest>({
    resolver: zodResolver(signInRequest),
    defaultValues: { email: '', password: '' },
  });
  const signIn = useSignIn({ onSuccess: onSignedIn });

  return (
    <Form
      form={form}
      onSubmit={(values) => signIn.mutateAsync(values)}
      aria-label="Sign in"
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
        required
      />
      <div>
        <PasswordField name="password" label="Password" autoComplete="current-password" required />
        <p className="mt-2 text-sm">
          <Link to={paths.forgotPassword}>Forgot your password?</Link>
        </p>
      </div>
      <SubmitButton size="lg" className="w-full" pendingLabel="Signing in…">
        Sign in
      </SubmitButton>
    </Form>
  );
}
