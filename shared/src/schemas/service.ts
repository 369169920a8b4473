import { z } from 'zod';
import { ERROR_CODES, type ErrorBody, type ErrorCode } from '../error-codes.js';
import { unacknowledgedWarning } from './guardrail-refusal.js';

/** The one error body every 4xx and 5xx answer carries (`ErrorBody` in error-codes.ts, as a schema). */
export const errorResponse = z.object({
  error: z.object({
    /** A stable snake_case code (`shared/src/error-codes.ts`). */
    code: z.enum(Object.keys(ERROR_CODES) as [ErrorCode, ...ErrorCode[]]),
    /** A message for people. */
    message: z.string(),
    /** Field path (dot-joined, e.g. `event.date`) → message. */
    fields: z.record(z.string(), z.string()).optional(),
    /** Only with 409 `guardrails_unacknowledged`: the warnings that were not acknowledged. */
    warnings: z.array(unacknowledgedWarning).optional(),
    /** The request's id, as in the server's log. */
    requestId: z.string().optional(),
  }),
}) satisfies z.ZodType<ErrorBody>;

/** The answer of a request that only succeeds (forgot and reset password). */
export const okResponse = z.object({ ok: z.literal(true) });

/** GET /api/health, without the envelope: 200 with the database up, 503 with it down. */
export const healthResponse = z.object({
  /** ok when the database answered. */
  status: z.enum(['ok', 'error']),
  /** Whether a round trip to PostgreSQL worked. */
  db: z.enum(['up', 'down']),
});
export type HealthResponse = z.infer<typeof healthResponse>;
