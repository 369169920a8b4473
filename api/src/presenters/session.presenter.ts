import type { SignedInDevice } from '@driftmark/shared';
import type { Session } from '../entities/session.entity.js';
import { deviceSummary } from '../lib/device-summary.js';

export function presentSignedInDevice(
  session: Session,
  endsAt: Date,
  currentSessionId: string,
): SignedInDevice {
  return {
    id: session.id,
    device: deviceSummary(session.userAgent),
    signedInAt: session.createdAt.toISOString(),
    lastSeenAt: session.lastSeenAt.toISOString(),
    endsAt: endsAt.toISOString(),
    current: session.id === currentSessionId,
  };
}
