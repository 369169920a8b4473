import { Navigate } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { BodyCompositionWorkspace } from '@/features/body-composition/components/body-composition-workspace';
import { planKeys } from '@/features/plans/api/keys';
import { todayIn } from '@/lib/format';
import { useCurrentUser } from '../session';

/** The athlete's own body composition: estimates, lean and fat mass, and their own measurements. */
export function AthleteBodyRoute() {
  const me = useCurrentUser();
  const athleteId = me.athleteId ?? '';
  const athlete = useAthlete(athleteId);

  if (!me.intakeComplete) return <Navigate to={paths.intake} replace />;

  return (
    <>
      <title>Body composition · Driftmark</title>
      <PageHeader
        title="Body composition"
        description="Skinfold or circumference estimates, with lean and fat mass from your trend weight."
      />
      {athlete.isPending ? (
        <div aria-busy="true" aria-label="Loading your body composition" className="space-y-4">
          <Skeleton className="h-40" />
        </div>
      ) : athlete.isError ? (
        <Alert
          tone="error"
          title="Your body composition could not be loaded."
          action={
            <Button variant="secondary" onClick={() => void athlete.refetch()}>
              Try again
            </Button>
          }
        >
          {athlete.error.message}
        </Alert>
      ) : (
        <BodyCompositionWorkspace
          athleteId={athleteId}
          athlete={athlete.data.data}
          today={todayIn(athlete.data.data.timeZone)}
          unit={me.units.weight}
          measuredBy="self"
          linkedKeys={[planKeys.athlete(athleteId)]}
        />
      )}
    </>
  );
}
