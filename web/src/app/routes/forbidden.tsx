import type { ReactNode } from 'react';
import { useNavigate } from 'react-router';
import { Button, ButtonLink } from '@/components/ui/button';
import { CenteredShell } from '@/components/ui/app-shell';
import { ShieldIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { useSignOut } from '@/features/auth/api/sign-out';

/** A refusal (403): says plainly whose page this is and offers the way home. */
export function ForbiddenPage({ title, children }: { title: string; children: ReactNode }) {
  const navigate = useNavigate();
  const signOut = useSignOut({ onSuccess: () => void navigate(paths.signIn, { replace: true }) });
  return (
    <CenteredShell>
      <title>{`${title} · Driftmark`}</title>
      <div className="rounded-lg border border-line bg-surface p-6 shadow-card">
        <p className="flex items-center gap-2 text-sm font-semibold text-caution">
          <ShieldIcon className="text-lg" />
          Not available to your account
        </p>
        <h1 className="mt-2 text-2xl font-bold text-ink">{title}</h1>
        <p className="mt-3 text-ink-muted">{children}</p>
        <div className="mt-6 flex flex-wrap gap-3">
          <ButtonLink to={paths.home}>Go to your home page</ButtonLink>
          <Button variant="ghost" loading={signOut.isPending} onClick={() => signOut.mutate()}>
            Sign in as someone else
          </Button>
        </div>
      </div>
    </CenteredShell>
  );
}
