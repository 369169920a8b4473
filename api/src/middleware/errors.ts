import type { ErrorRequestHandler, Request, RequestHandler, Response } from 'express';
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

/** How long a client is asked to wait before trying again while the database is unreachable. */
export const DB_RETRY_AFTER_SECONDS = 5;

/**
 * Error codes that mean "the database cannot be reached or is going away", not "the query was
 * wrong": socket errors from node and pg, and PostgreSQL SQLSTATE classes 08 (connection exception)
 * and 57P (operator intervention: admin/crash shutdown, cannot connect now) plus 53300 (too many
 * connections). PostgreSQL manual, appendix A "PostgreSQL Error Codes".
 */
const UNAVAILABLE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'EAI_AGAIN',
  '08000',
  '08001',
  '08003',
  '08004',
  '08006',
  '57P01',
  '57P02',
  '57P03',
  '53300',
]);

/** Messages pg, pg-pool and TypeORM use for a lost, refused or closed connection (they carry no code). */
const UNAVAILABLE_MESSAGES = [
  /^Connection terminated/i,
  /timeout exceeded when trying to connect/i,
  /Client has encountered a connection error and is not queryable/i,
  /Cannot use a pool after calling end on the pool/i,
  /Client was closed and is not queryable/i,
  /connection is not yet established/i,
  /Driver not Connected/i,
  // TypeORM's PostgresQueryRunner releases itself when its connection emits an error (the server
  // went away between two queries of one call, e.g. a `getOne` that reads twice); the next query
  // then throws QueryRunnerAlreadyReleasedError. Our code never keeps a runner past its own release
  // (transactions go through `dataSource.transaction`), so here it means a lost connection.
  /^Query runner already released/i,
];

/**
 * Whether an error means the database is unreachable (down, restarting, refusing, pool exhausted on
 * connect), so the request may succeed later: 503 with Retry-After rather than 500. Looks through
 * TypeORM's `driverError`, `cause` chains and AggregateError's `errors` (node's happy-eyeballs
 * connect fails with one per address).
 */
export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (!err || typeof err !== 'object' || depth > 5) return false;
  const e = err as {
    code?: unknown;
    message?: unknown;
    driverError?: unknown;
    cause?: unknown;
    errors?: unknown;
  };
  if (typeof e.code === 'string' && UNAVAILABLE_CODES.has(e.code)) return true;
  if (typeof e.message === 'string' && UNAVAILABLE_MESSAGES.some((re) => re.test(e.message as string)))
    return true;
  if (isDatabaseUnavailable(e.driverError, depth + 1) || isDatabaseUnavailable(e.cause, depth + 1))
    return true;
  return Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnavailable(inner, depth + 1));
}

/**
 * Whether an error comes from the photo bucket's SDK (AWS SDK v3 errors carry `$metadata`) and means
 * the store is unreachable or failing (a network code, a timeout, or a 5xx answer), so the request
 * may succeed later. Checked before the database: the same network codes would otherwise read as the
 * database. A 4xx from the store (no such key, access denied) is not this.
 */
export function isStorageUnavailable(err: unknown): boolean {
  if (!err || typeof err !== 'object' || !('$metadata' in err)) return false;
  const e = err as { code?: unknown; name?: unknown; $metadata?: { httpStatusCode?: unknown } };
  if (typeof e.code === 'string' && UNAVAILABLE_CODES.has(e.code)) return true;
  if (e.name === 'TimeoutError') return true;
  const status = e.$metadata?.httpStatusCode;
  return typeof status === 'number' && status >= 500;
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
  if (isStorageUnavailable(err))
    return new AppError('storage_unavailable', 'Photos are briefly unavailable. Please try again shortly.');
  if (isDatabaseUnavailable(err))
    return new AppError('db_unavailable', 'Driftmark is briefly unavailable. Please try again shortly.');
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

/** Sends `err` as the error shape (what `errorHandler` does; for answers made outside the chain). */
export function sendError(req: Request, res: Response, err: unknown): void {
  const requestId = typeof req.id === 'string' ? req.id : undefined;
  const known = toAppError(err);
  if (!known) req.log.error({ err, requestId }, 'unhandled error');
  else if (known.code === 'db_unavailable' || known.code === 'storage_unavailable') {
    req.log.warn(
      { err, requestId },
      known.code === 'db_unavailable' ? 'database unavailable' : 'photo storage unavailable',
    );
    res.setHeader('Retry-After', String(DB_RETRY_AFTER_SECONDS));
  }
  const appError =
    known ?? new AppError('internal_error', 'Something went wrong on our side. Please try again.');
  const body: ErrorBody = {
    error: {
      code: appError.code,
      message: appError.message,
      ...(appError.fields && Object.keys(appError.fields).length > 0 ? { fields: appError.fields } : {}),
      ...(appError.warnings ? { warnings: appError.warnings } : {}),
      ...(requestId ? { requestId } : {}),
    },
  };
  res.status(appError.status).json(body);
}

/** The one place errors become responses: `{ error: { code, message, fields?, warnings?, requestId } }`. */
export function errorHandler(): ErrorRequestHandler {
  return (err: unknown, req, res, next) => {
    if (res.headersSent) {
      // A body refused mid-read was answered already; what the reader reports afterwards is moot.
      if (res.locals.bodyRefused === true) return;
      return next(err);
    }
    sendError(req, res, err);
  };
}

/** Unknown /api paths answer JSON, never the web app's index.html. */
export function apiNotFound(): RequestHandler {
  return (_req, _res, next) => next(notFound('No such API route.'));
}
