import { useQueryClient } from '@tanstack/react-query';
import { Navigate } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { checkInKeys } from '@/features/check-ins/api/keys';
import { PhotosWorkspace } from '@/features/photos/components/photos-workspace';
import { todayIn } from '@/lib/format';
import { useCurrentUser } from '../session';

/** The athlete's own condition photos: upload, gallery, compare. */
export function AthletePhotosRoute() {
  const me = useCurrentUser();
  const athleteId = me.athleteId ?? '';
  const athlete = useAthlete(athleteId);
  const queryClient = useQueryClient();

  if (!me.intakeComplete) return <Navigate to={paths.intake} replace />;

  return (
    <>
      <title>Photos · Driftmark</title>
      <PageHeader
        title="Photos"
        description="Condition photos by day and pose; compare the same pose week to week."
      />
      {athlete.isPending ? (
        <div aria-busy="true" aria-label="Loading your photos" className="space-y-4">
          <Skeleton className="h-11" />
          <Skeleton className="h-64" />
        </div>
      ) : athlete.isError ? (
        <Alert
          tone="error"
          title="Your photos could not be loaded."
          action={
            <Button variant="secondary" onClick={() => void athlete.refetch()}>
              Try again
            </Button>
          }
        >
          {athlete.error.message}
        </Alert>
      ) : (
        <PhotosWorkspace
          athleteId={athleteId}
          today={todayIn(athlete.data.data.timeZone)}
          canUpload={athlete.data.abilities.log === true}
          photoConsent={athlete.data.data.photoConsent}
          consentAction={
            <ButtonLink to={paths.intake} variant="secondary">
              Open your details
            </ButtonLink>
          }
          // The day view lists the day's photos too.
          onUploaded={() => void queryClient.invalidateQueries({ queryKey: checkInKeys.athlete(athleteId) })}
        />
      )}
    </>
  );
}
