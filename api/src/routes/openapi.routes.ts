import { STAFF_ROLES } from '@driftmark/shared';
import { readFileSync } from 'node:fs';
import { Router } from 'express';
import { z } from 'zod';
import { appRoutes } from '../lib/route-table.js';
import { authenticate } from '../middleware/authenticate.js';
import { requireRole } from '../middleware/require-role.js';
import { responds } from '../middleware/responds.js';
import { openApiDocument } from '../openapi/document.js';

/**
 * GET /api/openapi.json: the OpenAPI 3.1 description of this app's own router, for staff (the web
 * app's API reference page reads it). Made on first request from the routes and schemas in the
 * code, so every instance makes the same one; kept in memory after that.
 */
/** The API package's version (api/package.json, two folders up from src/routes and dist/routes alike). */
function apiVersion(): string {
  const file = new URL('../../package.json', import.meta.url);
  return (JSON.parse(readFileSync(file, 'utf8')) as { version: string }).version;
}

export function openApiRouter(): Router {
  const router = Router();
  let described: string | null = null;
  router.get(
    '/openapi.json',
    responds({
      summary: 'This description (OpenAPI 3.1), for staff',
      data: z.looseObject({ openapi: z.literal('3.1.0') }),
      bare: true,
    }),
    authenticate(),
    requireRole(...STAFF_ROLES),
    (req, res) => {
      described ??= JSON.stringify(
        openApiDocument(appRoutes(req.app), { version: apiVersion(), asOf: req.ctx.clock }),
      );
      res.type('application/json').send(described);
    },
  );
  return router;
}
