import { useParams } from 'react-router';
import { CoachAthleteFrame } from '../layouts/coach-athlete-frame';
import { BodyCompositionWorkspace } from '@/features/body-composition/components/body-composition-workspace';
import { useToday } from '@/features/check-ins/components/use-clock';
import { planKeys } from '@/features/plans/api/keys';
import { useCurrentUser } from '../session';

/** A coach's view of one athlete's body composition: estimates, lean and fat mass, new measurements. */
export function CoachAthleteBodyRoute() {
  const me = useCurrentUser();
  const { athleteId = '' } = useParams();
  return (
    <CoachAthleteFrame athleteId={athleteId} title="Body" section="Body composition" what="the measurements">
      {(athlete) => <CoachBody athleteId={athleteId} athlete={athlete.data} me={me} />}
    </CoachAthleteFrame>
  );
}

function CoachBody({
  athleteId,
  athlete,
  me,
}: {
  athleteId: string;
  athlete: { sex: 'female' | 'male' | null; heightCm: number | null; timeZone: string };
  me: ReturnType<typeof useCurrentUser>;
}) {
  const today = useToday(athlete.timeZone);
  return (
    <BodyCompositionWorkspace
      athleteId={athleteId}
      athlete={athlete}
      today={today}
      unit={me.units.weight}
      measuredBy={me.name}
      // A new lean mass changes what g/kg-of-lean-mass protein targets resolve to.
      linkedKeys={[planKeys.athlete(athleteId)]}
    />
  );
}
