import { isStaffRole } from '@driftmark/shared';
import { useCurrentUser } from '../session';
import { AthleteShell } from './athlete-shell';
import { StaffShell } from './staff-shell';

/** Pages every role has (settings) sit in the shell the user already knows. */
export function ShellForRole() {
  const me = useCurrentUser();
  return isStaffRole(me.role) ? <StaffShell /> : <AthleteShell />;
}
