import { Link, useParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ArrowLeftIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { CoachAthleteTabs } from '../layouts/coach-athlete-tabs';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { PhotosWorkspace } from '@/features/photos/components/photos-workspace';
import { todayIn } from '@/lib/format';
import { useCurrentUser } from '../session';

/** A coach's view of one athlete's condition photos: gallery and compare (uploads are the athlete's). */
export function CoachAthletePhotosRoute() {
  const me = useCurrentUser();
  const { athleteId = '' } = useParams();
  const athlete = useAthlete(athleteId);
  const name = athlete.data?.data.name;

  return (
    <>
      <title>{name ? `${name} · Photos · Driftmark` : 'Photos · Driftmark'}</title>
      <Link
        to={paths.coachRoster}
        className="mb-3 inline-flex min-h-touch items-center gap-1.5 text-sm font-semibold no-underline"
      >
        <ArrowLeftIcon /> Roster
      </Link>
      <PageHeader eyebrow="Condition photos" title={name ?? 'Athlete'} className="mb-4" />
      <CoachAthleteTabs athleteId={athleteId} className="mb-5" />
      {athlete.isPending ? (
        <div aria-busy="true" aria-label="Loading the photos" className="space-y-4">
          <Skeleton className="h-11 max-w-md" />
          <Skeleton className="h-64" />
        </div>
      ) : athlete.isError ? (
        <Alert
          tone="error"
          title={
            athlete.error.status === 404
              ? 'No such athlete on your roster.'
              : 'The photos could not be loaded.'
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
        <PhotosWorkspace
          athleteId={athleteId}
          today={todayIn(athlete.data.data.timeZone)}
          canUpload={athlete.data.abilities.log === true}
          photoConsent={athlete.data.data.photoConsent}
          canEditPoses={me.role === 'owner' || me.role === 'coach'}
        />
      )}
    </>
  );
}
