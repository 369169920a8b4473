import { Navigate } from 'react-router';
import { SafetyNote } from '@/components/safety-note';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { CoachCard, EventCountdownCard } from '@/features/athletes/components/athlete-today';
import { CutTodayCard } from '@/features/cuts/components/cut-today-card';
import { DayCheckIn } from '@/features/check-ins/components/day-check-in';
import { useClock, useToday } from '@/features/check-ins/components/use-clock';
import { WeeklyDueBanner } from '@/features/weekly/components/weekly-due-banner';
import { firstName, formatDate, greetingFor, hourIn } from '@/lib/format';
import { useCurrentUser } from '../session';
import { useRecoveryTicks } from './use-recovery-ticks';

export function AthleteHomeRoute() {
  const me = useCurrentUser();
  const athleteId = me.athleteId ?? '';
  const athlete = useAthlete(athleteId);
  const timeZone = athlete.data?.data.timeZone ?? me.timeZone;
  const today = useToday(timeZone);
  const now = useClock(timeZone);
  const tickRecovery = useRecoveryTicks(athleteId, today);

  if (!me.intakeComplete) return <Navigate to={paths.intake} replace />;

  const countdown = athlete.isPending ? (
    <Skeleton className="h-36" />
  ) : athlete.isError ? (
    <Alert
      tone="error"
      title="Your event could not be loaded."
      action={
        <Button variant="secondary" onClick={() => void athlete.refetch()}>
          Try again
        </Button>
      }
    >
      {athlete.error.message}
    </Alert>
  ) : (
    <EventCountdownCard
      profile={athlete.data.data}
      today={today}
      weightUnit={me.units.weight}
      editHref={paths.intake}
    />
  );

  return (
    <>
      <title>Today · Driftmark</title>
      <header className="mb-5">
        <p className="text-sm font-medium text-ink-muted tabular-nums">{formatDate(today)}</p>
        <h1 className="text-2xl font-bold text-ink">
          {greetingFor(hourIn(timeZone))}, {firstName(me.name)}
        </h1>
      </header>
      <div className="space-y-4">
        <WeeklyDueBanner athleteId={athleteId} href={paths.athleteWeekly} />
        {athleteId ? (
          <CutTodayCard
            athleteId={athleteId}
            unit={me.units.weight}
            volumeUnit={me.units.volume}
            now={now}
            onToggle={tickRecovery}
            today={today}
          />
        ) : null}
        <DayCheckIn
          athleteId={athleteId}
          date={today}
          timeZone={timeZone}
          units={me.units}
          canEditFallback={athlete.data?.abilities.log ?? true}
          before={countdown}
          photosHref={paths.athletePhotos}
        />
        {athlete.data ? <CoachCard coachName={athlete.data.data.coach.name} teamName={me.team.name} /> : null}
        <SafetyNote />
      </div>
    </>
  );
}
