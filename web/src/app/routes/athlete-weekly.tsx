import { Navigate } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { AthleteWeekly } from '@/features/weekly/components/athlete-weekly';
import { useCurrentUser } from '../session';

/** The athlete's weekly check-in (phone first). */
export function AthleteWeeklyRoute() {
  const me = useCurrentUser();
  if (!me.intakeComplete) return <Navigate to={paths.intake} replace />;
  return (
    <>
      <title>Weekly check-in · Driftmark</title>
      <PageHeader title="Weekly check-in" className="mb-4" />
      <AthleteWeekly athleteId={me.athleteId ?? ''} weightUnit={me.units.weight} timeZone={me.timeZone} />
    </>
  );
}
