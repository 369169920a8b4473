import { isStaffRole, type Me } from '@driftmark/shared';
import { useMe } from '@/features/auth/api/get-me';
import { paths } from '@/config/paths';

/** The signed-in user, inside routes guarded by RequireSignedIn (which waits for it). */
export function useCurrentUser(): Me {
  const { data } = useMe();
  if (!data) throw new Error('useCurrentUser is only for routes inside RequireSignedIn');
  return data;
}

/** Where a user belongs after signing in or opening "/". */
export function homePathFor(me: Me): string {
  if (isStaffRole(me.role)) return paths.coachHome;
  return me.intakeComplete ? paths.athleteHome : paths.intake;
}
