import type { Server, ServerResponse } from 'node:http';

export interface HttpDrain {
  /** Requests whose responses have not closed yet. */
  readonly inFlight: number;
  /**
   * Stops taking new work at once and waits for the requests in flight: the listening socket
   * closes (new connections are refused), idle keep-alive connections close, every response from
   * now on carries `Connection: close` (so a busy keep-alive connection ends after its current
   * answer). After `capMs` the remaining connections are cut. Resolves once every connection is
   * gone; `forced` says whether the cap was reached.
   */
  drain(capMs: number): Promise<{ forced: boolean }>;
}

/** Tracks a server's requests so that a shutdown can finish them and take no others. */
export function trackHttpServer(server: Server): HttpDrain {
  const inFlight = new Set<ServerResponse>();
  let draining = false;

  const closeIdleSoon = () =>
    // The connection counts as idle only after the response's own bookkeeping has run.
    setImmediate(() => server.closeIdleConnections());

  // Ahead of the app's own listener, so the header is set before any handler can answer.
  server.prependListener('request', (_req, res: ServerResponse) => {
    inFlight.add(res);
    if (draining) res.setHeader('Connection', 'close');
    res.on('close', () => {
      inFlight.delete(res);
      if (draining) closeIdleSoon();
    });
  });

  return {
    get inFlight() {
      return inFlight.size;
    },
    drain(capMs) {
      draining = true;
      for (const res of inFlight) if (!res.headersSent) res.setHeader('Connection', 'close');
      return new Promise((resolve) => {
        let settled = false;
        const finish = (forced: boolean) => {
          if (settled) return;
          settled = true;
          clearTimeout(timer);
          resolve({ forced });
        };
        const timer = setTimeout(() => {
          server.closeAllConnections();
          finish(true);
        }, capMs);
        timer.unref();
        server.close(() => finish(false));
        server.closeIdleConnections();
      });
    },
  };
}
