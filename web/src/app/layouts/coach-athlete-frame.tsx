import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { AthleteProfile } from '@driftmark/shared';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ArrowLeftIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { CoachAthleteTabs } from './coach-athlete-tabs';
import { CountdownMismatchBanner } from './countdown-mismatch-banner';

type AthleteResponse = NonNullable<ReturnType<typeof useAthlete>['data']>;

/**
 * One coach page about one athlete: back to the roster, the page header, the athlete tabs, and the
 * athlete's loading and error states; `children` renders once the athlete is loaded.
 */
export function CoachAthleteFrame({
  athleteId,
  title,
  section,
  what,
  children,
}: {
  athleteId: string;
  /** Short name for the document title ("Photos"). */
  title: string;
  /** The page's eyebrow ("Condition photos"). */
  section: string;
  /** What is loading, in words ("the photos"). */
  what: string;
  children: (athlete: { data: AthleteProfile; abilities: AthleteResponse['abilities'] }) => ReactNode;
}) {
  const athlete = useAthlete(athleteId);
  const name = athlete.data?.data.name;

  return (
    <>
      <title>{name ? `${name} · ${title} · Driftmark` : `${title} · Driftmark`}</title>
      <Link
        to={paths.coachRoster}
        className="mb-3 inline-flex min-h-touch items-center gap-1.5 text-sm font-semibold no-underline"
      >
        <ArrowLeftIcon /> Roster
      </Link>
      <PageHeader eyebrow={section} title={name ?? 'Athlete'} className="mb-4" />
      <CoachAthleteTabs athleteId={athleteId} className="mb-5" />
      {athlete.isPending ? (
        <div aria-busy="true" aria-label={`Loading ${what}`} className="space-y-4">
          <Skeleton className="h-11 max-w-md" />
          <Skeleton className="h-64" />
        </div>
      ) : athlete.isError ? (
        <Alert
          tone="error"
          title={
            athlete.error.status === 404
              ? 'No such athlete on your roster.'
              : `${capital(what)} could not be loaded.`
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
        <>
          <CountdownMismatchBanner
            athlete={athlete.data.data}
            abilities={athlete.data.abilities}
            className="mb-5"
          />
          {children(athlete.data)}
        </>
      )}
    </>
  );
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
