import type { Request, RequestHandler } from 'express';
import { datesWithin, todayIn } from '@driftmark/shared';
import type { z } from 'zod';
import { notFound } from '../errors.js';

interface Schemas<
  B extends z.ZodType | undefined,
  P extends z.ZodType | undefined,
  Q extends z.ZodType | undefined,
> {
  /** The body's schema, or a function of the request for rules that need its clock (dates "as of today"). */
  body?: B | ((req: Request) => B);
  params?: P;
  /** The query's schema, or a function of the request (date windows as of its today). */
  query?: Q | ((req: Request) => Q);
}

/**
 * The schemas a `validate` handler checks, kept on the handler so tests that walk the router
 * (the fuzz in tests/integration/fuzz.test.ts) can generate inputs from them.
 */
export const VALIDATES = Symbol('validates');
export interface ValidateSchemas {
  body?: z.ZodType | ((req: Request) => z.ZodType | undefined);
  params?: z.ZodType;
  query?: z.ZodType | ((req: Request) => z.ZodType | undefined);
}

/**
 * `schema` with its top-level date fields held to their windows (shared `dateWindow`) as of the
 * request's today, for `validate({ body: dated(schema, { eventDate: 'any' }) })` or `query:`.
 */
export function dated<T extends z.ZodType>(
  schema: T,
  fields: Record<string, 'past' | 'any'>,
): (req: Request) => T {
  return (req) => datesWithin(schema, todayIn('UTC', req.ctx.clock()), fields);
}

type Out<S extends z.ZodType | undefined, Fallback> = S extends z.ZodType ? z.output<S> : Fallback;

/**
 * Parses body, params and query with the shared zod schemas and replaces them with the parsed
 * values. A bad body or query answers 400 `validation_failed` with `fields` by path; a bad path
 * parameter (an id that cannot name anything) answers 404, like an id that names nothing.
 */
export function validate<
  B extends z.ZodType | undefined = undefined,
  P extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
>(
  schemas: Schemas<B, P, Q>,
): RequestHandler<Out<P, Request['params']>, unknown, Out<B, unknown>, Out<Q, Request['query']>> {
  const handler: RequestHandler<
    Out<P, Request['params']>,
    unknown,
    Out<B, unknown>,
    Out<Q, Request['query']>
  > = (req, _res, next) => {
    if (schemas.params) {
      const parsed = schemas.params.safeParse(req.params);
      if (!parsed.success) return next(notFound());
      req.params = parsed.data as typeof req.params;
    }
    const query =
      typeof schemas.query === 'function' ? schemas.query(req as unknown as Request) : schemas.query;
    if (query) {
      const parsed = query.safeParse(req.query);
      if (!parsed.success) return next(parsed.error);
      // Express 5 exposes `req.query` through a getter; shadow it with the parsed value.
      Object.defineProperty(req, 'query', {
        value: parsed.data,
        writable: true,
        configurable: true,
        enumerable: true,
      });
    }
    const body = typeof schemas.body === 'function' ? schemas.body(req as unknown as Request) : schemas.body;
    if (body) {
      const parsed = body.safeParse(req.body ?? {});
      if (!parsed.success) return next(parsed.error);
      req.body = parsed.data as typeof req.body;
    }
    next();
  };
  Object.defineProperty(handler, VALIDATES, { value: schemas satisfies ValidateSchemas });
  return handler;
}
