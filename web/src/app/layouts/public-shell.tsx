import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { SplitShell } from '@/components/ui/app-shell';
import { paths } from '@/config/paths';
import { useDevInboxAvailable } from '@/features/dev-inbox/api/get-mail-list';
import { DriftPicture } from './drift-picture';

/** Signed-out pages: one column (with a picture beside it on wide screens), and in demo mode a way to the captured e-mails. */
export function PublicShell({ children }: { children: ReactNode }) {
  const devInbox = useDevInboxAvailable();
  return (
    <SplitShell
      aside={<DriftPicture />}
      footer={
        devInbox ? (
          <p>
            Demo mode: e-mails are captured in the <Link to={paths.devInbox}>demo inbox</Link>.
          </p>
        ) : null
      }
    >
      {children}
    </SplitShell>
  );
}
