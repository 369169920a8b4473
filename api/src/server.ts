import 'reflect-metadata';
import type { AddressInfo } from 'node:net';
import { createApp } from './app.js';
import { loadConfig, type Config } from './config.js';
import { createDataSource } from './db/data-source.js';
import { startMailWorker } from './jobs/mail.worker.js';
import { startNotifyScheduler } from './jobs/notify.scheduler.js';
import { closePasswordPool } from './lib/passwords.js';
import { createLogger } from './logger.js';
import { uploadsSettled } from './middleware/upload.js';
import { installProcessErrorHandlers } from './process-errors.js';

/** How long a shutdown may take before the process exits anyway. */
const FORCED_EXIT_MS = 10_000;

async function main(): Promise<void> {
  let config: Config;
  try {
    config = loadConfig();
  } catch (err) {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  }
  const logger = createLogger(config.logLevel);
  installProcessErrorHandlers(logger);

  const dataSource = createDataSource(config);
  await dataSource.initialize();
  const worker = await startMailWorker({ config, dataSource, logger });
  const scheduler = await startNotifyScheduler({ config, dataSource, logger });
  const app = createApp({ config, dataSource, logger });

  const server = app.listen(config.port, config.host);
  server.on('listening', () => {
    const { port } = server.address() as AddressInfo;
    logger.info(
      { url: `http://${config.host}:${port}`, appOrigin: config.appOrigin, appMode: config.appMode },
      'Driftmark is listening',
    );
  });
  server.on('error', (err) => {
    logger.fatal({ err }, 'HTTP server failed');
    process.exit(1);
  });

  let shuttingDown = false;
  const shutdown = (signal: NodeJS.Signals) => {
    if (shuttingDown) return;
    shuttingDown = true;
    logger.info({ signal }, 'shutting down');
    setTimeout(() => {
      logger.error('shutdown took too long; exiting');
      process.exit(1);
    }, FORCED_EXIT_MS).unref();

    // Stop accepting connections; in-flight requests finish, then idle keep-alive sockets close.
    server.close((closeErr) => {
      void (async () => {
        let code = closeErr ? 1 : 0;
        if (closeErr) logger.error({ err: closeErr }, 'HTTP server close failed');
        // Requests are over; uploads cut off by the close may still be removing their temp files.
        await uploadsSettled();
        try {
          await scheduler.stop();
        } catch (err) {
          code = 1;
          logger.error({ err }, 'notification scheduler stop failed');
        }
        try {
          await worker.stop();
        } catch (err) {
          code = 1;
          logger.error({ err }, 'mail worker stop failed');
        }
        try {
          await closePasswordPool();
        } catch (err) {
          code = 1;
          logger.error({ err }, 'password pool close failed');
        }
        try {
          await dataSource.destroy();
        } catch (err) {
          code = 1;
          logger.error({ err }, 'closing the database pool failed');
        }
        logger.info('stopped');
        logger.flush();
        process.exit(code);
      })();
    });
    server.closeIdleConnections();
  };
  process.on('SIGINT', shutdown);
  process.on('SIGTERM', shutdown);
}

main().catch((err: unknown) => {
  console.error('Driftmark failed to start:', err instanceof Error ? (err.stack ?? err.message) : err);
  process.exit(1);
});
