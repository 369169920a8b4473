import { Navigate } from 'react-router';
import { SafetyNote } from '@/components/safety-note';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import {
  CheckInPreviewCard,
  CoachCard,
  EventCountdownCard,
} from '@/features/athletes/components/athlete-today';
import { firstName, formatDate, greetingFor, hourIn, todayIn } from '@/lib/format';
import { useCurrentUser } from '../session';

export function AthleteHomeRoute() {
  const me = useCurrentUser();
  const athlete = useAthlete(me.athleteId ?? '');

  if (!me.intakeComplete) return <Navigate to={paths.intake} replace />;

  const timeZone = athlete.data?.data.timeZone ?? me.timeZone;
  const today = todayIn(timeZone);

  return (
    <>
      <title>Today · Driftmark</title>
      <header className="mb-5">
        <p className="text-sm font-medium text-ink-muted tabular-nums">{formatDate(today)}</p>
        <h1 className="text-2xl font-bold text-ink">
          {greetingFor(hourIn(timeZone))}, {firstName(me.name)}
        </h1>
      </header>
      {athlete.isPending ? (
        <div aria-busy="true" aria-label="Loading your day" className="space-y-4">
          <Skeleton className="h-36" />
          <Skeleton className="h-56" />
          <Skeleton className="h-20" />
        </div>
      ) : athlete.isError ? (
        <Alert
          tone="error"
          title="Your day could not be loaded."
          action={
            <Button variant="secondary" onClick={() => void athlete.refetch()}>
              Try again
            </Button>
          }
        >
          {athlete.error.message}
        </Alert>
      ) : (
        <div className="space-y-4">
          <EventCountdownCard
            profile={athlete.data.data}
            today={today}
            weightUnit={me.units.weight}
            editHref={paths.intake}
          />
          <CheckInPreviewCard />
          <CoachCard coachName={athlete.data.data.coach.name} teamName={me.team.name} />
          <SafetyNote />
        </div>
      )}
    </>
  );
}
