import { SafetyNote } from '@/components/safety-note';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PlusIcon, RosterIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useRoster } from '@/features/athletes/api/get-roster';
import { RosterSummary, RosterTable } from '@/features/athletes/components/roster-table';
import { useToday } from '@/features/check-ins/components/use-clock';
import { useCurrentUser } from '../session';

export function CoachRosterRoute() {
  const me = useCurrentUser();
  const roster = useRoster();
  const today = useToday(me.timeZone);
  const canInvite = me.abilities.invite.includes('athlete');
  const inviteButton = canInvite ? (
    <ButtonLink to={paths.coachInvitations} icon={<PlusIcon className="text-lg" />}>
      Invite an athlete
    </ButtonLink>
  ) : null;

  return (
    <>
      <title>Roster · Driftmark</title>
      <PageHeader
        eyebrow={me.team.name}
        title="Roster"
        description={
          me.role === 'assistant'
            ? 'Athletes shared with you, nearest event first. Sort by any column, search and filter.'
            : me.role === 'owner'
              ? 'Every athlete on the team, nearest event first. Sort by any column, search and filter.'
              : 'Your athletes and those shared with you, nearest event first. Sort by any column, search and filter.'
        }
        actions={roster.data && roster.data.length > 0 ? inviteButton : null}
      />
      {roster.isPending ? (
        <div aria-busy="true" aria-label="Loading the roster" className="space-y-2">
          <Skeleton className="h-20 max-w-xl" />
          <Skeleton className="h-12" />
          {[0, 1, 2, 3, 4].map((i) => (
            <Skeleton key={i} className="h-14" />
          ))}
        </div>
      ) : roster.isError ? (
        <Alert
          tone="error"
          title="The roster could not be loaded."
          action={
            <Button variant="secondary" size="sm" onClick={() => void roster.refetch()}>
              Try again
            </Button>
          }
        >
          {roster.error.message}
        </Alert>
      ) : roster.data.length === 0 ? (
        <EmptyState icon={<RosterIcon />} title="No athletes yet" action={inviteButton}>
          {canInvite
            ? 'Invite an athlete by e-mail. Once they accept and fill in the intake, they appear here with their event and countdown.'
            : 'When a coach shares an athlete with you, they appear here.'}
        </EmptyState>
      ) : (
        <>
          <RosterSummary rows={roster.data} />
          <RosterTable
            rows={roster.data}
            showCoach={me.role === 'owner'}
            weightUnit={me.units.weight}
            today={today}
          />
        </>
      )}
      <SafetyNote className="mt-8 max-w-3xl" />
    </>
  );
}
