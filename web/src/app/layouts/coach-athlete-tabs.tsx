import { TabNav, TabNavLink } from '@/components/ui/tab-nav';
import { paths } from '@/config/paths';

/** The coach's tabs on one athlete: the same six on every athlete page. */
export function CoachAthleteTabs({ athleteId, className }: { athleteId: string; className?: string }) {
  return (
    <TabNav label="Athlete" className={className}>
      <TabNavLink to={paths.coachAthlete(athleteId)} end>
        Days
      </TabNavLink>
      <TabNavLink to={paths.coachAthleteTrends(athleteId)}>Trends</TabNavLink>
      <TabNavLink to={paths.coachAthletePhotos(athleteId)}>Photos</TabNavLink>
      <TabNavLink to={paths.coachAthleteBody(athleteId)}>Body</TabNavLink>
      <TabNavLink to={paths.coachAthletePlan(athleteId)}>Plan</TabNavLink>
      <TabNavLink to={paths.coachAthleteWeekly(athleteId)}>Weekly</TabNavLink>
    </TabNav>
  );
}
