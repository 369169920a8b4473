import { AsyncLocalStorage } from 'node:async_hooks';
import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from '../logger.js';

/** A caller-supplied id is reused only if it looks like one (no log injection through it). */
const REQUEST_ID = /^[A-Za-z0-9._:-]{1,128}$/;

const requestIds = new AsyncLocalStorage<string>();

/** Runs `work` as part of the request `id`: everything it starts (awaits, timers) carries the id. */
export function runWithRequestId<T>(id: string, work: () => T): T {
  return requestIds.run(id, work);
}

/**
 * The id of the request whose work is running now, if any. Listeners of the request's own events
 * (`res.on('close')` …) run outside it, as the socket emits them.
 */
export function currentRequestId(): string | undefined {
  return requestIds.getStore();
}

/**
 * Gives every request an id (the caller's `X-Request-Id` when sensible, else a uuid), echoes it
 * in the `X-Request-Id` response header, logs the request with it and runs the rest of the chain
 * with it (`currentRequestId`), so a failure outside any handler can still name its request.
 */
export function requestLogging(logger: Logger): RequestHandler {
  const httpLogger = pinoHttp({
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
  return (req, res, next) => httpLogger(req, res, () => runWithRequestId(String(req.id), next));
}
