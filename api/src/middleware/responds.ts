import type { RequestHandler } from 'express';
import type { z } from 'zod';

/** What a route answers, for the OpenAPI description (api/src/openapi/document.ts). */
export interface ResponseSpec {
  /** One line for the reference. */
  summary: string;
  /** The success status (default 200). */
  status?: number;
  /**
   * The `data` of the `{ data, abilities? }` envelope; null for an answer without a body (204).
   * A raw body (CSV, zip, image) names its content type in `raw` instead.
   */
  data: z.ZodType | null;
  /** The body is `data` itself, without the envelope (the health check). */
  bare?: true;
  /** The answer carries an `abilities` map (what the actor may do, name → yes/no) beside `data`. */
  abilities?: true;
  /** The answer may carry a `meta` map of short texts beside `data` (e.g. a weigh-in's notice). */
  meta?: true;
  /** Another success answer the route can give (e.g. 200 with a preview beside 201). */
  also?: { status: number; data: z.ZodType; summary: string };
  /** A body that is not JSON: its content type (and the schema of its text, if any). */
  raw?: { contentType: string; description: string };
  /** A request body the route reads itself (multipart, a patch laid over the stored row). */
  body?: { contentType: 'application/json' | 'multipart/form-data'; schema: z.ZodType };
}

/** The marker `responds` puts on its handler; `lib/route-table.ts` reads it when walking the router. */
export const RESPONDS = Symbol('responds');

/**
 * Says what the route answers, on the route line: `router.get('/…', authenticate(),
 * responds({ summary, data: schema }), handler)`. It does nothing at run time.
 */
export function responds(spec: ResponseSpec): RequestHandler {
  const handler: RequestHandler = (_req, _res, next) => next();
  Object.defineProperty(handler, RESPONDS, { value: spec });
  return handler;
}
