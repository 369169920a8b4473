import { isStaffRole } from '@driftmark/shared';
import { useCurrentUser } from '../session';
import { lazy, Suspense } from 'react';
import { AthleteShell } from './athlete-shell';

/** Loaded only for staff, so sign-in and the athlete's screens never carry it. */
const StaffShell = lazy(() => import('./staff-shell').then((m) => ({ default: m.StaffShell })));

/** Pages every role has (settings) sit in the shell the user already knows. */
export function ShellForRole() {
  const me = useCurrentUser();
  return isStaffRole(me.role) ? (
    <Suspense fallback={null}>
      <StaffShell />
    </Suspense>
  ) : (
    <AthleteShell />
  );
}
