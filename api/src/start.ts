import type { AddressInfo } from 'node:net';
import { createApp } from './app.js';
import type { Config } from './config.js';
import { createDataSource } from './db/data-source.js';
import { startMailWorker } from './jobs/mail.worker.js';
import { startNotifyScheduler } from './jobs/notify.scheduler.js';
import { closePasswordPool } from './lib/passwords.js';
import type { Logger } from './logger.js';
import { sweepUploadTemp, uploadsSettled } from './middleware/upload.js';
import { databaseIdentity, sweepPhotoStorage } from './services/photo-sweep.service.js';
import { createStorage } from './adapters/storage.js';
import { trackHttpServer } from './lib/http-drain.js';
import { withStagingPaused } from './lib/staging-lock.js';

/** How long a client may take to send the request line and headers. */
const HEADERS_TIMEOUT_MS = 20_000;
/** How long a whole request may take to arrive (above the longest body timer, 120 s). */
const REQUEST_TIMEOUT_MS = 150_000;
/** How often the photo folder is swept while running (and how old a pending file must be). */
const PHOTO_SWEEP_EVERY_MS = 15 * 60_000;
/** How long requests in flight may run on after a SIGTERM/SIGINT before their connections are cut. */
const REQUEST_DRAIN_MS = 5_000;
/**
 * How long a whole shutdown may take before the process exits anyway (exit 1): above the request
 * cap plus the mail worker's stop timeout, below the 15 s the start scripts wait before SIGKILL.
 */
const FORCED_EXIT_MS = 14_000;

/**
 * Starts one instance: settles the photo folder, starts the mail worker and the notification
 * scheduler, listens; SIGTERM/SIGINT shut it down. `clock` pins "now" for the app and the scheduler
 * (the two-instance test, tests/integration/multi-instance.test.ts, runs this under a pinned clock).
 */
export async function startServer(
  config: Config,
  logger: Logger,
  options: { clock?: () => Date } = {},
): Promise<void> {
  const startedAt = new Date();
  const dataSource = createDataSource(config, { countStatements: config.statementCountHeader });
  await dataSource.initialize();
  // Files and rows agree before the first request: whatever a kill left behind is settled now.
  const storage = createStorage(config);
  const database = databaseIdentity(config.databaseUrl);
  // With the staging lock held: another instance sharing the folder or bucket may be mid-upload,
  // and its staged files are not a dead process's (lib/staging-lock.ts); so the cut-off can be
  // this start, for a bucket too.
  await withStagingPaused(dataSource, () =>
    sweepPhotoStorage({ dataSource, storage, database, before: startedAt, logger }),
  );
  const tempFolders = await sweepUploadTemp();
  if (tempFolders > 0) logger.info({ tempFolders }, 'upload temp folders of ended processes removed');
  // Later, files staged by a process that died without a restart here: any upload is long over.
  const sweeps = setInterval(() => {
    const before = new Date(Date.now() - PHOTO_SWEEP_EVERY_MS);
    sweepPhotoStorage({ dataSource, storage, database, before, logger }).catch((err: unknown) =>
      logger.error({ err }, 'photo storage sweep failed'),
    );
  }, PHOTO_SWEEP_EVERY_MS);
  sweeps.unref();
  const worker = await startMailWorker({ config, dataSource, logger });
  const scheduler = await startNotifyScheduler({ config, dataSource, logger, clock: options.clock });
  const app = createApp({ config, dataSource, logger, clock: options.clock });

  const server = app.listen(config.port, config.host);
  const http = trackHttpServer(server);
  // Whole-request caps under the per-body timers of middleware/body.ts (node's default is 300 s).
  server.headersTimeout = HEADERS_TIMEOUT_MS;
  server.requestTimeout = REQUEST_TIMEOUT_MS;
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
    logger.info({ signal, inFlight: http.inFlight }, 'shutting down');
    setTimeout(() => {
      logger.error('shutdown took too long; exiting');
      logger.flush();
      process.exit(1);
    }, FORCED_EXIT_MS).unref();

    void (async () => {
      let code = 0;
      // New connections are refused from here on; requests in flight finish (up to the cap).
      clearInterval(sweeps);
      const { forced } = await http.drain(REQUEST_DRAIN_MS);
      if (forced) logger.warn({ capMs: REQUEST_DRAIN_MS }, 'requests still running at the cap were cut');
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
      logger.info({ exitCode: code }, 'stopped');
      logger.flush();
      process.exit(code);
    })();
  };
  process.on('SIGINT', shutdown);
  process.on('SIGTERM', shutdown);
}
