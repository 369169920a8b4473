import type { Application, Express, Request } from 'express';
import type { z } from 'zod';
import { AUTHENTICATES } from '../middleware/authenticate.js';
import { VALIDATES, type ValidateSchemas } from '../middleware/validate.js';
import { RESPONDS, type ResponseSpec } from '../middleware/responds.js';

/**
 * One route of the app: method, full path with `:params`, the schemas its `validate` checks and
 * what its `responds` says it answers. Walked from the router itself, so the route-access table,
 * the route fuzz and the OpenAPI description all see the same routes.
 */
export interface AppRoute {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  schemas: ValidateSchemas;
  response?: ResponseSpec;
  /** Whether `authenticate()` guards it (a session cookie is needed). */
  signedIn: boolean;
}

interface Layer {
  rawPath?: string | string[];
  slash?: boolean;
  handle: ((...args: unknown[]) => unknown) & { stack?: Layer[] };
  route?: { path: string | string[]; methods: Record<string, boolean>; stack: Layer[] };
}

const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;

function join(prefix: string, path: string): string {
  const p = `${prefix}/${path}`.replace(/\/+/g, '/');
  return p.length > 1 ? p.replace(/\/$/, '') : p;
}

function walk(stack: Layer[], prefix: string, out: AppRoute[]): void {
  for (const layer of stack) {
    if (layer.route) {
      const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
      const schemas: ValidateSchemas = {};
      let response: ResponseSpec | undefined;
      let signedIn = false;
      for (const l of layer.route.stack) {
        const marks = l.handle as unknown as Record<symbol, unknown>;
        if (marks[AUTHENTICATES] === true) signedIn = true;
        const s = marks[VALIDATES] as ValidateSchemas | undefined;
        if (s) Object.assign(schemas, s);
        response ??= marks[RESPONDS] as ResponseSpec | undefined;
      }
      for (const method of METHODS) {
        if (!layer.route.methods[method]) continue;
        for (const p of paths) out.push({ method, path: join(prefix, p), schemas, response, signedIn });
      }
    } else if (Array.isArray(layer.handle.stack)) {
      const raw = layer.slash ? '' : Array.isArray(layer.rawPath) ? layer.rawPath[0] : layer.rawPath;
      walk(layer.handle.stack, join(prefix, raw ?? ''), out);
    }
  }
}

/** Every route the app's router answers (method + path), walked from `app.router`'s stack. */
export function appRoutes(app: Pick<Express, 'router'> | Application): AppRoute[] {
  const out: AppRoute[] = [];
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '', out);
  const seen = new Set<string>();
  return out.filter((r) => {
    const key = `${r.method} ${r.path}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/** `METHOD /path` */
export const routeKey = (r: Pick<AppRoute, 'method' | 'path'>): string =>
  `${r.method.toUpperCase()} ${r.path}`;

/** The route's body or query schema as of the request (schemas that are functions of the clock). */
export function schemaOf(
  s: ValidateSchemas['body'] | ValidateSchemas['query'],
  req: Partial<Request>,
): z.ZodType | undefined {
  return typeof s === 'function' ? s(req as Request) : s;
}
