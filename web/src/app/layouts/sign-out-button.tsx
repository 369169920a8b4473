import { useNavigate } from 'react-router';
import { Button } from '@/components/ui/button';
import { SignOutIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { useSignOut } from '@/features/auth/api/sign-out';
import { cn } from '@/lib/cn';

export function SignOutButton({ className, size = 'md' }: { className?: string; size?: 'sm' | 'md' }) {
  const navigate = useNavigate();
  const signOut = useSignOut({ onSuccess: () => void navigate(paths.signIn, { replace: true }) });
  return (
    <div className={cn('flex flex-col', className)}>
      <Button
        variant="ghost"
        size={size}
        icon={<SignOutIcon className="text-lg" />}
        loading={signOut.isPending}
        onClick={() => signOut.mutate()}
        className="justify-start"
      >
        Sign out
      </Button>
      {signOut.isError ? (
        <p role="alert" className="px-2 text-xs font-medium text-off-plan">
          {signOut.error.message}
        </p>
      ) : null}
    </div>
  );
}
