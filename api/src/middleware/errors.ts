import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ErrorBody } from '@driftmark/shared';
import { AppError, notFound } from '../errors.js';

/** zod issues → `{ "event.date": "…" }` (the first message per path). */
export function zodFields(error: ZodError): { fields: Record<string, string>; rootMessage?: string } {
  const fields: Record<string, string> = {};
  let rootMessage: string | undefined;
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.');
    if (key === '') rootMessage ??= issue.message;
    else fields[key] ??= issue.message;
  }
  return rootMessage === undefined ? { fields } : { fields, rootMessage };
}

/** body-parser and http-errors style errors carry `type` and `status`. */
interface HttpishError {
  type?: string;
  status?: number;
  statusCode?: number;
}

function toAppError(err: unknown): AppError | null {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) {
    const { fields, rootMessage } = zodFields(err);
    return new AppError('validation_failed', rootMessage ?? 'Please check the highlighted fields.', fields);
  }
  if (err && typeof err === 'object') {
    const e = err as HttpishError;
    switch (e.type) {
      case 'entity.parse.failed':
        return new AppError('validation_failed', 'The request body is not valid JSON.');
      case 'entity.too.large':
        return new AppError('payload_too_large', 'The request body is too large.');
      case 'encoding.unsupported':
      case 'charset.unsupported':
        return new AppError('unsupported_media_type', 'The request body uses an unsupported encoding.');
      default:
        break;
    }
    // Client errors from Express's own middleware (e.g. a missing static file: ENOENT with status
    // 404, `expose` false). Their messages are not sent; ours are.
    const status = e.status ?? e.statusCode;
    if (typeof status === 'number' && status >= 400 && status < 500) {
      if (status === 404) return notFound();
      if (status === 413) return new AppError('payload_too_large', 'The request body is too large.');
      if (status === 415) return new AppError('unsupported_media_type', 'Unsupported content type.');
      return new AppError('validation_failed', 'The request could not be understood.');
    }
  }
  return null;
}

/** The one place errors become responses: `{ error: { code, message, fields?, requestId } }`. */
export function errorHandler(): ErrorRequestHandler {
  return (err: unknown, req, res, next) => {
    if (res.headersSent) return next(err);
    const requestId = typeof req.id === 'string' ? req.id : undefined;
    const known = toAppError(err);
    if (!known) req.log.error({ err, requestId }, 'unhandled error');
    const appError =
      known ?? new AppError('internal_error', 'Something went wrong on our side. Please try again.');
    const body: ErrorBody = {
      error: {
        code: appError.code,
        message: appError.message,
        ...(appError.fields && Object.keys(appError.fields).length > 0 ? { fields: appError.fields } : {}),
        ...(requestId ? { requestId } : {}),
      },
    };
    res.status(appError.status).json(body);
  };
}

/** Unknown /api paths answer JSON, never the web app's index.html. */
export function apiNotFound(): RequestHandler {
  return (_req, _res, next) => next(notFound('No such API route.'));
}
