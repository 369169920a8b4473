import { Link, useParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ArrowLeftIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { athleteKeys } from '@/features/athletes/api/keys';
import { usePlan } from '@/features/plans/api/get-plan';
import { reviewKeys } from '@/features/review/api/keys';
import { CoachWeekly } from '@/features/weekly/components/coach-weekly';
import { formatDate } from '@/lib/format';
import { CoachAthleteTabs } from '../layouts/coach-athlete-tabs';
import { useCurrentUser } from '../session';

/** A coach's view of one athlete's weekly check-ins: the check-in day, the list, one in detail with the reply. */
export function CoachAthleteWeeklyRoute() {
  const me = useCurrentUser();
  const { athleteId = '', checkInId } = useParams();
  const athlete = useAthlete(athleteId);
  const plan = usePlan(athleteId);
  const name = athlete.data?.data.name;
  const planVersions = (plan.data?.data.versions ?? []).map((v) => ({
    value: v.id,
    label: `Version ${v.number} from ${formatDate(v.effectiveFrom, 'short')}`,
  }));

  return (
    <>
      <title>{name ? `${name} · Weekly · Driftmark` : 'Weekly · Driftmark'}</title>
      <Link
        to={paths.coachRoster}
        className="mb-3 inline-flex min-h-touch items-center gap-1.5 text-sm font-semibold no-underline"
      >
        <ArrowLeftIcon /> Roster
      </Link>
      <PageHeader eyebrow="Weekly check-ins" title={name ?? 'Athlete'} className="mb-4" />
      <CoachAthleteTabs athleteId={athleteId} className="mb-5" />
      {athlete.isPending ? (
        <div aria-busy="true" aria-label="Loading the check-ins" className="space-y-4">
          <Skeleton className="h-11 max-w-md" />
          <Skeleton className="h-64" />
        </div>
      ) : athlete.isError ? (
        <Alert
          tone="error"
          title={
            athlete.error.status === 404
              ? 'No such athlete on your roster.'
              : 'The check-ins could not be loaded.'
          }
          action={
            athlete.error.status === 404 ? undefined : (
              <Button variant="secondary" onClick={() => void athlete.refetch()}>
                Try again
              </Button>
            )
          }
        >
          {athlete.error.message}
        </Alert>
      ) : (
        <CoachWeekly
          athleteId={athleteId}
          checkInId={checkInId}
          weightUnit={me.units.weight}
          timeZone={me.timeZone}
          detailHref={(id) => paths.coachAthleteWeekly(athleteId, id)}
          planHref={paths.coachAthletePlan(athleteId)}
          planVersions={planVersions}
          canManage={athlete.data.abilities.update === true}
          linkedKeys={[athleteKeys.detail(athleteId), reviewKeys.all]}
        />
      )}
    </>
  );
}
