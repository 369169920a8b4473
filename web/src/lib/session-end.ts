import type { ErrorCode } from '@driftmark/shared';

/**
 * Why the session behind this page ended, as the server said it (a 401 `session_ended` or
 * `session_revoked`), kept until the next sign-in so the sign-in page can say it in words.
 */
export type SessionEndReason = 'ended' | 'signed-out';

let noted: SessionEndReason | null = null;

/** Notes a 401's code when it says a session ended; other codes change nothing. */
export function noteSessionEnd(code: ErrorCode | string): SessionEndReason | null {
  if (code === 'session_ended') noted = 'ended';
  else if (code === 'session_revoked') noted = 'signed-out';
  return noted;
}

export function sessionEndReason(): SessionEndReason | null {
  return noted;
}

export function clearSessionEnd(): void {
  noted = null;
}

/** The `reason` query value of the sign-in page, or null for anything else. */
export function parseSessionEndReason(value: string | null): SessionEndReason | null {
  return value === 'ended' || value === 'signed-out' ? value : null;
}

/** What the sign-in page says for each reason. */
export const SESSION_END_MESSAGES: Record<SessionEndReason, { title: string; body: string }> = {
  ended: {
    title: 'Your session ended',
    body: 'Sign in again to continue; you will be back on the page you were on.',
  },
  'signed-out': {
    title: 'This device was signed out from another device',
    body: 'Sign in again to continue; you will be back on the page you were on. If that was not you, change your password in Settings.',
  },
};
