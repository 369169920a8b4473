import { Navigate } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { DayHistory } from '@/features/check-ins/components/day-history';
import { useToday } from '@/features/check-ins/components/use-clock';
import { useCurrentUser } from '../session';

export function AthleteHistoryRoute() {
  const me = useCurrentUser();
  const today = useToday(me.timeZone);
  if (!me.intakeComplete) return <Navigate to={paths.intake} replace />;

  return (
    <>
      <title>History · Driftmark</title>
      <PageHeader
        title="History"
        description="Your logged days, newest first. Open a day to see or change it."
      />
      <DayHistory athleteId={me.athleteId ?? ''} today={today} units={me.units} dayHref={paths.athleteDay} />
    </>
  );
}
