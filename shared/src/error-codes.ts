import type { UnacknowledgedWarning } from './schemas/guardrail-refusal.js';

/**
 * Stable, snake_case error codes carried in every error body:
 * `{ "error": { "code", "message", "fields"?, "warnings"?, "requestId"? } }`.
 */
export const ERROR_CODES = {
  validation_failed: 400,
  invalid_credentials: 401,
  unauthenticated: 401,
  /** The cookie named a session that has ended (idle or absolute end passed): sign in again. */
  session_ended: 401,
  /** The cookie named a session that was signed out (from another device, or by a password change). */
  session_revoked: 401,
  csrf_rejected: 403,
  forbidden: 403,
  not_found: 404,
  /** No product with this barcode in the food-products database (or none with nutrition figures). */
  barcode_not_found: 404,
  conflict: 409,
  /**
   * A save met guardrail warnings the coach has not acknowledged: `fields` lists them by key → message,
   * `warnings` carries each one whole (severity, source, scope).
   */
  guardrails_unacknowledged: 409,
  /** The request body did not arrive in time (a stalled or trickling client). */
  request_timeout: 408,
  token_invalid: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  internal_error: 500,
  db_unavailable: 503,
  /** The photo bucket did not answer (unreachable, timed out, or a 5xx from the store). */
  storage_unavailable: 503,
  /** The food-products database did not answer (or the server has none set): enter the label. */
  food_products_unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_CODES;

/** The one error body shape the API sends. */
export interface ErrorBody {
  error: {
    code: ErrorCode;
    message: string;
    /** Field path (dot-joined, e.g. `event.date`) → message. */
    fields?: Record<string, string>;
    /** Only with `guardrails_unacknowledged`: the server's warnings that were not acknowledged. */
    warnings?: UnacknowledgedWarning[];
    requestId?: string;
  };
}
