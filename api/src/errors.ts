import { ERROR_CODES, type ErrorCode, type UnacknowledgedWarning } from '@driftmark/shared';

/** An error the API means to send: a stable code, its HTTP status, a message for people. */
export class AppError extends Error {
  readonly status: number;
  /** Only for `guardrails_unacknowledged` (see `guardrailsUnacknowledged`): the warnings, whole. */
  readonly warnings?: UnacknowledgedWarning[];

  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    extra?: { warnings: UnacknowledgedWarning[] },
  ) {
    super(message);
    this.name = 'AppError';
    this.status = ERROR_CODES[code];
    if (extra && code === 'guardrails_unacknowledged') this.warnings = extra.warnings;
  }
}

/** The actor can't read it, or it doesn't exist: the same answer either way. */
export const notFound = (message = 'Not found.'): AppError => new AppError('not_found', message);

/** The actor can read it but may not do this. */
export const forbidden = (message = 'You are not allowed to do that.'): AppError =>
  new AppError('forbidden', message);

export const unauthenticated = (message = 'Please sign in.'): AppError =>
  new AppError('unauthenticated', message);

export const validationFailed = (
  fields: Record<string, string>,
  message = 'Please check the highlighted fields.',
): AppError => new AppError('validation_failed', message, fields);

export const conflict = (message: string, fields?: Record<string, string>): AppError =>
  new AppError('conflict', message, fields);

export const tokenInvalid = (message = 'This link is no longer valid. Ask for a new one.'): AppError =>
  new AppError('token_invalid', message);

/**
 * A save refused because these warnings are not acknowledged (409): `fields` keeps key → message
 * for older clients, `warnings` carries each one as the server judged it (severity, source, scope).
 */
export const guardrailsUnacknowledged = (
  missing: readonly UnacknowledgedWarning[],
  noun = 'guardrail warning',
): AppError =>
  new AppError(
    'guardrails_unacknowledged',
    missing.length === 1
      ? `One ${noun} needs your acknowledgement before this can be saved.`
      : `${missing.length} ${noun}s need your acknowledgement before this can be saved.`,
    Object.fromEntries(missing.map((w) => [w.key, w.message])),
    { warnings: [...missing] },
  );
