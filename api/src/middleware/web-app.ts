import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Router } from 'express';

/**
 * Serves the built web app from `webDist` when it exists: hashed assets cached for a year,
 * `index.html` for every other non-/api GET (client-side routes), never cached.
 */
export function webAppRouter(webDist: string): Router | null {
  const indexHtml = path.join(webDist, 'index.html');
  if (!existsSync(indexHtml)) return null;
  const router = express.Router();
  router.use(
    '/assets',
    express.static(path.join(webDist, 'assets'), {
      immutable: true,
      maxAge: '365d',
      index: false,
      fallthrough: false,
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
