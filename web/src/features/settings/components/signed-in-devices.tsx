import type { SignedInDevice } from '@driftmark/shared';
import type { ReactNode } from 'react';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { formatInstant, type Clock } from '@/lib/clock';
import { useSessions } from '../api/get-sessions';
import { useSignOutOtherSessions } from '../api/sign-out-other-sessions';
import { useSignOutSession } from '../api/sign-out-session';

function errorText(error: unknown): string {
  return isApiError(error) ? error.message : 'That did not work. Please try again.';
}

function DeviceRow({
  device,
  clock,
  signOutHere,
}: {
  device: SignedInDevice;
  clock: Clock;
  signOutHere: ReactNode;
}) {
  const signOut = useSignOutSession();
  return (
    <li className="flex flex-col gap-3 py-4 first:pt-0 last:pb-0 sm:flex-row sm:items-center sm:justify-between">
      <div className="min-w-0">
        <p className="flex flex-wrap items-center gap-2 font-medium text-ink">
          <span className="break-words">{device.device}</span>
          {device.current ? <Badge tone="accent">This device</Badge> : null}
        </p>
        <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm text-ink-muted">
          <dt>Signed in</dt>
          <dd className="tabular-nums">{formatInstant(device.signedInAt, clock)}</dd>
          <dt>Last seen</dt>
          <dd className="tabular-nums">{device.current ? 'Now' : formatInstant(device.lastSeenAt, clock)}</dd>
        </dl>
      </div>
      <div className="shrink-0">
        {device.current ? (
          signOutHere
        ) : (
          <Button
            variant="secondary"
            size="sm"
            loading={signOut.isPending}
            onClick={() => signOut.mutate(device.id)}
            aria-label={`Sign out ${device.device}, last seen ${formatInstant(device.lastSeenAt, clock)}`}
          >
            Sign out
          </Button>
        )}
        {signOut.isError ? (
          <p role="alert" className="mt-1 text-xs font-medium text-off-plan">
            {errorText(signOut.error)}
          </p>
        ) : null}
      </div>
    </li>
  );
}

/**
 * The browsers and phones signed in to this account (Settings), each with a sign-out, and one
 * button for all the others. `signOutHere` is the app's own sign-out for the current device.
 */
export function SignedInDevices({ clock, signOutHere }: { clock: Clock; signOutHere: ReactNode }) {
  const sessions = useSessions();
  const others = useSignOutOtherSessions();

  if (sessions.isPending) {
    return (
      <div className="space-y-3" aria-busy="true" aria-label="Loading your devices">
        <Skeleton className="h-12" />
        <Skeleton className="h-12" />
      </div>
    );
  }
  if (sessions.isError) {
    return (
      <div role="alert" className="text-sm text-off-plan">
        <p className="font-medium">{errorText(sessions.error)}</p>
        <Button variant="secondary" size="sm" className="mt-2" onClick={() => void sessions.refetch()}>
          Try again
        </Button>
      </div>
    );
  }

  const devices = sessions.data;
  const otherCount = devices.filter((d) => !d.current).length;
  return (
    <div>
      <p className="mb-4 text-sm text-ink-muted">
        {otherCount === 0
          ? 'Only this device is signed in.'
          : `This device and ${otherCount} other${otherCount === 1 ? '' : 's'}. Sign out any you do not recognise, then change your password.`}
      </p>
      <ul className="divide-y divide-line" aria-label="Signed-in devices">
        {devices.map((device) => (
          <DeviceRow key={device.id} device={device} clock={clock} signOutHere={signOutHere} />
        ))}
      </ul>
      {otherCount > 0 ? (
        <div className="mt-5 border-t border-line pt-4">
          <Button variant="secondary" loading={others.isPending} onClick={() => others.mutate()}>
            Sign out all other devices
          </Button>
          {others.isError ? (
            <p role="alert" className="mt-2 text-sm font-medium text-off-plan">
              {errorText(others.error)}
            </p>
          ) : null}
        </div>
      ) : null}
      {others.isSuccess && otherCount === 0 ? (
        <p role="status" className="mt-3 text-sm font-medium text-on-plan">
          Signed out {others.data.signedOut} other device{others.data.signedOut === 1 ? '' : 's'}.
        </p>
      ) : null}
    </div>
  );
}
