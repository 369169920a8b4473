import { ERROR_CODES, type ErrorCode } from '@driftmark/shared';

/** An error the API means to send: a stable code, its HTTP status, a message for people. */
export class AppError extends Error {
  readonly status: number;

  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
    this.status = ERROR_CODES[code];
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
