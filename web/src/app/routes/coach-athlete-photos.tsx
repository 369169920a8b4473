import { useParams } from 'react-router';
import { CoachAthleteFrame } from '../layouts/coach-athlete-frame';
import { PhotosWorkspace } from '@/features/photos/components/photos-workspace';
import { todayIn } from '@/lib/format';
import { useCurrentUser } from '../session';

/** A coach's view of one athlete's condition photos: gallery and compare (uploads are the athlete's). */
export function CoachAthletePhotosRoute() {
  const me = useCurrentUser();
  const { athleteId = '' } = useParams();

  return (
    <CoachAthleteFrame athleteId={athleteId} title="Photos" section="Condition photos" what="the photos">
      {(athlete) => (
        <PhotosWorkspace
          athleteId={athleteId}
          today={todayIn(athlete.data.timeZone)}
          canUpload={athlete.abilities.log === true}
          photoConsent={athlete.data.photoConsent}
          canEditPoses={me.role === 'owner' || me.role === 'coach'}
        />
      )}
    </CoachAthleteFrame>
  );
}
