import { useParams } from 'react-router';
import { paths } from '@/config/paths';
import { athleteKeys } from '@/features/athletes/api/keys';
import { usePlan } from '@/features/plans/api/get-plan';
import { reviewKeys } from '@/features/review/api/keys';
import { CoachWeekly } from '@/features/weekly/components/coach-weekly';
import { formatDate } from '@/lib/format';
import { CoachAthleteFrame } from '../layouts/coach-athlete-frame';
import { useCurrentUser } from '../session';

/** A coach's view of one athlete's weekly check-ins: the check-in day, the list, one in detail with the reply. */
export function CoachAthleteWeeklyRoute() {
  const me = useCurrentUser();
  const { athleteId = '', checkInId } = useParams();
  const plan = usePlan(athleteId);
  const planVersions = (plan.data?.data.versions ?? []).map((v) => ({
    value: v.id,
    label: `Version ${v.number} from ${formatDate(v.effectiveFrom, 'short')}`,
  }));

  return (
    <CoachAthleteFrame athleteId={athleteId} title="Weekly" section="Weekly check-ins" what="the check-ins">
      {(athlete) => (
        <CoachWeekly
          athleteId={athleteId}
          checkInId={checkInId}
          weightUnit={me.units.weight}
          timeZone={me.timeZone}
          detailHref={(id) => paths.coachAthleteWeekly(athleteId, id)}
          planHref={paths.coachAthletePlan(athleteId)}
          planVersions={planVersions}
          canManage={athlete.abilities.update === true}
          linkedKeys={[athleteKeys.detail(athleteId), reviewKeys.all]}
        />
      )}
    </CoachAthleteFrame>
  );
}
