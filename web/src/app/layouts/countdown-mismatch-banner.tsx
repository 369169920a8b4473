import { useMemo } from 'react';
import type { AthleteProfile } from '@driftmark/shared';
import { athleteKeys, rosterKeys } from '@/features/athletes/api/keys';
import { checkInKeys } from '@/features/check-ins/api/keys';
import type { AthleteAbilities } from '@/features/athletes/api/get-athlete';
import type { LinkedKeys } from '@/features/plans/api/plan-cache';
import { CountdownMismatchNotice } from '@/features/plans/components/countdown-mismatch-notice';
import { reviewKeys } from '@/features/review/api/keys';
import { trendKeys } from '@/features/trends/api/keys';

/**
 * What a plan or event write makes stale outside the plan feature: the athlete's days (targets in
 * force, cautions), the profile and roster (the event), the trend (the projection aims at the
 * event) and the review queue.
 */
export function useCountdownLinkedKeys(athleteId: string): LinkedKeys {
  return useMemo<LinkedKeys>(
    () => [
      checkInKeys.athlete(athleteId),
      athleteKeys.detail(athleteId),
      rosterKeys.all,
      trendKeys.athlete(athleteId),
      reviewKeys.all,
    ],
    [athleteId],
  );
}

/** The countdown-versus-event notice on a coach page of one athlete (nothing when they agree). */
export function CountdownMismatchBanner({
  athlete,
  abilities,
  className,
}: {
  athlete: AthleteProfile;
  abilities: Partial<AthleteAbilities>;
  className?: string;
}) {
  const linkedKeys = useCountdownLinkedKeys(athlete.id);
  // Always mounted: after the move the profile clears the mismatch, and the notice says it is done.
  return (
    <CountdownMismatchNotice
      athleteId={athlete.id}
      mismatch={athlete.countdownMismatch}
      canResolve={abilities.plan === true}
      linkedKeys={linkedKeys}
      className={className}
    />
  );
}
