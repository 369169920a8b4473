/**
 * The OpenAPI 3.1 description, made from the router itself (`lib/route-table.ts`): each route's
 * path, its `validate` schemas (path, query, body) and its `responds` line, rendered from the
 * shared zod schemas by zod-openapi. Nothing here lists routes; a route without `responds` is
 * described without a success answer, which tests/integration/openapi.test.ts refuses.
 */
import * as shared from '@driftmark/shared';
import { errorResponse } from '@driftmark/shared';
import type { Request } from 'express';
import { z } from 'zod';
import {
  createDocument,
  type ZodOpenApiOperationObject,
  type ZodOpenApiPathsObject,
  type ZodOpenApiResponseObject,
} from 'zod-openapi';
import type { AppRoute } from '../lib/route-table.js';
import { schemaOf } from '../lib/route-table.js';
import { SESSION_COOKIE } from '../lib/session-token.js';

type OpenApiDocument = ReturnType<typeof createDocument>;

/** `/api/athletes/:athleteId` → `/api/athletes/{athleteId}` */
export function openApiPath(path: string): string {
  return path.replace(/:([A-Za-z0-9_]+)/g, '{$1}');
}

const pathParamNames = (path: string): string[] => [...path.matchAll(/:([A-Za-z0-9_]+)/g)].map((m) => m[1]!);

function envelope(r: AppRoute, data: z.ZodType): z.ZodType {
  if (r.response?.bare) return data;
  return z.object({
    data,
    ...(r.response?.abilities
      ? { abilities: z.record(z.string(), z.boolean()).meta({ description: 'What the actor may do here.' }) }
      : {}),
    ...(r.response?.meta ? { meta: z.record(z.string(), z.string()).optional() } : {}),
  });
}

function operation(r: AppRoute, asOf: () => Date): ZodOpenApiOperationObject {
  // Body and query schemas that depend on the request's today are taken as of `asOf`.
  const req = { ctx: { clock: asOf } } as unknown as Partial<Request>;
  const spec = r.response;
  const query = schemaOf(r.schemas.query, req);
  const body = schemaOf(r.schemas.body, req);
  const names = pathParamNames(r.path);
  const path =
    r.schemas.params ??
    (names.length > 0 ? z.object(Object.fromEntries(names.map((n) => [n, z.string()]))) : undefined);

  const responses: Record<string, ZodOpenApiResponseObject> = {};
  if (spec) {
    const status = String(spec.status ?? 200);
    if (spec.raw) {
      responses[status] = {
        description: spec.raw.description,
        content: { [spec.raw.contentType]: { schema: z.string().meta({ format: 'binary' }) } },
      };
    } else if (spec.data === null) {
      responses[status] = { description: spec.summary };
    } else {
      responses[status] = {
        description: spec.summary,
        content: { 'application/json': { schema: envelope(r, spec.data) } },
      };
    }
    if (spec.also) {
      responses[String(spec.also.status)] = {
        description: spec.also.summary,
        content: { 'application/json': { schema: envelope(r, spec.also.data) } },
      };
    }
  }
  responses.default = {
    description: 'An error: 400 names the fields, 401/403/404/409/413/415/429/503 as the code says.',
    content: { 'application/json': { schema: errorResponse } },
  };

  const tag = r.path.split('/')[2] ?? 'api';
  const requestBody = body
    ? { content: { 'application/json': { schema: body } } }
    : spec?.body
      ? { content: { [spec.body.contentType]: { schema: spec.body.schema } } }
      : undefined;
  return {
    operationId: `${r.method}${r.path.replace(/[/:-]+(\w)/g, (_m, c: string) => c.toUpperCase())}`,
    summary: spec?.summary ?? '',
    tags: [tag],
    ...(r.signedIn ? {} : { security: [] }),
    ...(path || query ? { requestParams: { ...(path ? { path } : {}), ...(query ? { query } : {}) } } : {}),
    ...(requestBody ? { requestBody } : {}),
    responses,
  } as ZodOpenApiOperationObject;
}

/** `dayView` → `DayView` */
const componentName = (exportName: string): string => exportName[0]!.toUpperCase() + exportName.slice(1);

/**
 * The shared schemas a route takes or answers with directly (an array's items too), named as
 * components after their export from `@driftmark/shared`, so the reference shows `DayView` once
 * and points to it.
 */
function namedComponents(routes: readonly AppRoute[], asOf: () => Date): Record<string, z.ZodType> {
  const names = new Map<unknown, string>();
  for (const [name, value] of Object.entries(shared)) {
    if (value instanceof z.ZodType && !names.has(value)) names.set(value, componentName(name));
  }
  const req = { ctx: { clock: asOf } } as unknown as Partial<Request>;
  const out: Record<string, z.ZodType> = {};
  const use = (schema: z.ZodType | null | undefined) => {
    if (!schema) return;
    const item = schema instanceof z.ZodArray ? (schema.element as z.ZodType) : schema;
    const name = names.get(item);
    if (name) out[name] = item;
  };
  for (const r of routes) {
    use(schemaOf(r.schemas.body, req));
    use(r.response?.data);
    use(r.response?.also?.data);
  }
  out.ErrorResponse = errorResponse;
  return out;
}

/** The description of `routes` (from `appRoutes(app)`), schemas that depend on today as of `asOf`. */
export function openApiDocument(
  routes: readonly AppRoute[],
  options: { version: string; asOf: () => Date },
): OpenApiDocument {
  const paths: ZodOpenApiPathsObject = {};
  for (const r of routes) {
    if (!r.path.startsWith('/api/')) continue;
    const key = openApiPath(r.path);
    paths[key] = { ...paths[key], [r.method]: operation(r, options.asOf) };
  }
  return createDocument(
    {
      openapi: '3.1.0',
      info: {
        title: 'Driftmark API',
        version: options.version,
        description:
          'Every answer is JSON `{ data, abilities? }` unless said otherwise; errors are `{ error: { code, message, fields?, requestId } }`. ' +
          'Sign in with POST /api/auth/sign-in: the session travels in the httpOnly cookie `dm_session`. ' +
          'State-changing requests must carry an Origin (or Referer) of the app.',
      },
      components: {
        schemas: namedComponents(routes, options.asOf),
        securitySchemes: { session: { type: 'apiKey', in: 'cookie', name: SESSION_COOKIE } },
      },
      security: [{ session: [] }],
      paths,
    },
    { reused: 'inline' },
  );
}
