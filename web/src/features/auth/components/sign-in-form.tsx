import { LIMITS, type Me, type SignInRequest } from '@driftmark/shared';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { Form, SubmitButton } from '@/components/ui/form';
import { PasswordField } from '@/components/ui/password-field';
import { TextField } from '@/components/ui/text-field';
import { paths } from '@/config/paths';
import { lazyResolver } from '@/lib/lazy-resolver';
import { useSignIn } from '../api/sign-in';

// The shared schema with zod is the largest part of this page: it loads once the form is drawn.
const resolver = lazyResolver<SignInRequest, SignInRequest>(() =>
  import('../utils/sign-in-resolver').then((m) => m.signInResolver),
);

interface SignInFormProps {
  onSignedIn: (me: Me) => void;
  /** Called as the request leaves, e.g. to load the next screen's code while the password is checked. */
  onSubmitting?: () => void;
}

export function SignInForm({ onSignedIn, onSubmitting }: SignInFormProps) {
  const form = useForm<SignInRequest>({ resolver, defaultValues: { email: '', password: '' } });
  useEffect(() => resolver.preload(), []);
  const signIn = useSignIn({ onSuccess: onSignedIn });

  return (
    <Form
      form={form}
      onSubmit={(values) => {
        onSubmitting?.();
        return signIn.mutateAsync(values);
      }}
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
