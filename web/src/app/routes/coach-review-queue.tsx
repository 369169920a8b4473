import { useQueryClient } from '@tanstack/react-query';
import { SafetyNote } from '@/components/safety-note';
import { ButtonLink } from '@/components/ui/button';
import { RosterIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { rosterKeys } from '@/features/athletes/api/keys';
import { ReviewQueue } from '@/features/review/components/review-queue';
import { useCurrentUser } from '../session';

/** The coach's default screen: who needs a look, most urgent first. */
export function CoachReviewQueueRoute() {
  const me = useCurrentUser();
  const queryClient = useQueryClient();
  return (
    <>
      <title>Review queue · Driftmark</title>
      <PageHeader
        eyebrow={me.team.name}
        title="Review queue"
        description="Athletes who need a look: safety flags first, then missed check-ins, drift from plan and replies to your marks. Marking one reviewed clears what is there now."
        actions={
          <ButtonLink to={paths.coachRoster} variant="secondary" icon={<RosterIcon className="text-lg" />}>
            Whole roster
          </ButtonLink>
        }
      />
      <ReviewQueue
        // The roster is refetched too, so both screens agree after a review.
        onReviewed={() => queryClient.invalidateQueries({ queryKey: rosterKeys.all })}
      />
      <SafetyNote className="mt-8 max-w-3xl" />
    </>
  );
}
