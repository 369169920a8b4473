import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from '../logger.js';

/** A caller-supplied id is reused only if it looks like one (no log injection through it). */
const REQUEST_ID = /^[A-Za-z0-9._:-]{1,128}$/;

/**
 * Gives every request an id (the caller's `X-Request-Id` when sensible, else a uuid), echoes it
 * in the `X-Request-Id` response header and logs the request with it.
 */
export function requestLogging(logger: Logger): RequestHandler {
  return pinoHttp({
    logger,
    genReqId: (req, res) => {
      const incoming = req.headers['x-request-id'];
      const id = typeof incoming === 'string' && REQUEST_ID.test(incoming) ? incoming : randomUUID();
      res.setHeader('X-Request-Id', id);
      return id;
    },
    customLogLevel: (_req, res, err) => {
      if (err || res.statusCode >= 500) return 'error';
      if (res.statusCode >= 400) return 'warn';
      return 'info';
    },
    // Health checks poll; they would drown the log.
    autoLogging: { ignore: (req) => req.url === '/api/health' },
    serializers: {
      req: (req: { id: unknown; method: string; url: string }) => ({
        id: req.id,
        method: req.method,
        url: req.url,
      }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
}
