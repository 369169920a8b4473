import { ROLE_LABELS } from '@driftmark/shared';
import { Link, Outlet } from 'react-router';
import { SidebarNav, SidebarNavLink, SidebarShell } from '@/components/ui/app-shell';
import {
  BowlIcon,
  CodeIcon,
  CountdownIcon,
  EnvelopeIcon,
  FlagIcon,
  InboxIcon,
  RosterIcon,
  SlidersIcon,
} from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { useDevInboxAvailable } from '@/features/dev-inbox/api/get-mail-list';
import { useCurrentUser } from '../session';
import { SignOutButton } from './sign-out-button';

/** Coach screens: desktop first, a side bar with the team and the work areas. */
export function StaffShell() {
  const me = useCurrentUser();
  const devInbox = useDevInboxAvailable();
  return (
    <SidebarShell
      teamName={me.team.name}
      nav={
        <SidebarNav label="Coach">
          <SidebarNavLink to={paths.coachHome} end icon={<FlagIcon />}>
            Review queue
          </SidebarNavLink>
          <SidebarNavLink to={paths.coachRoster} icon={<RosterIcon />}>
            Roster
          </SidebarNavLink>
          <SidebarNavLink to={paths.coachInvitations} icon={<EnvelopeIcon />}>
            Invitations
          </SidebarNavLink>
          <SidebarNavLink to={paths.coachTemplates} icon={<CountdownIcon />}>
            Countdown templates
          </SidebarNavLink>
          {me.role === 'assistant' ? null : (
            <SidebarNavLink to={paths.coachFoodNew} icon={<BowlIcon />}>
              Team foods
            </SidebarNavLink>
          )}
          <SidebarNavLink to={paths.settings} icon={<SlidersIcon />}>
            Settings
          </SidebarNavLink>
          <SidebarNavLink to={paths.coachApiReference} icon={<CodeIcon />}>
            API reference
          </SidebarNavLink>
        </SidebarNav>
      }
      footer={
        <div className="space-y-2">
          <div className="px-3">
            <p className="truncate text-sm font-semibold text-ink">{me.name}</p>
            <p className="truncate text-xs text-ink-muted">{ROLE_LABELS[me.role]}</p>
          </div>
          <SignOutButton size="sm" />
          {devInbox ? (
            <Link
              to={paths.devInbox}
              className="flex min-h-9 items-center gap-2 rounded-md px-3 text-xs font-semibold text-ink-muted no-underline hover:bg-surface"
            >
              <InboxIcon className="text-base" />
              Demo inbox
            </Link>
          ) : null}
        </div>
      }
    >
      <Outlet />
    </SidebarShell>
  );
}
