import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Router } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { notFound } from '../errors.js';
import { loopbackOnly } from './dev-inbox.js';

/** The web app's page of the demo inbox (web/src/app/router.tsx). */
const DEV_INBOX_PAGE = '/dev/inbox';
const NO_SUCH_PAGE = 'No such page.';

/**
 * Serves the built web app from `webDist` when it exists: hashed assets cached for a year and sent
 * precompressed,
 * `index.html` for every other non-/api GET (client-side routes), never cached. The demo inbox page
 * is served under the same fence as its API (`devInbox`: demo mode; loopback clients only); anyone
 * else gets a 404, never the app that would draw it.
 */
export function webAppRouter(webDist: string, options: { devInbox: boolean }): Router | null {
  const indexHtml = path.join(webDist, 'index.html');
  if (!existsSync(indexHtml)) return null;
  const router = express.Router();
  router.use(
    DEV_INBOX_PAGE,
    options.devInbox ? loopbackOnly(NO_SUCH_PAGE) : (_req, _res, next) => next(notFound(NO_SUCH_PAGE)),
  );
  // The build writes .br and .gz beside each asset (web/vite.config.ts): the best one the client
  // accepts is sent with its Content-Encoding and `Vary: Accept-Encoding`.
  router.use(
    '/assets',
    expressStaticGzip(path.join(webDist, 'assets'), {
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      serveStatic: { immutable: true, maxAge: '365d', index: false, fallthrough: false },
    }),
  );
  router.use(express.static(webDist, { index: false, maxAge: '1h' }));
  router.get('/{*splat}', (req, res, next) => {
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
  return router;
}
