/**
 * The server's own start (api/src/start.ts: photo-folder sweep, mail worker, notification scheduler,
 * listen, shutdown on SIGTERM) under a pinned clock for the app and the scheduler, so a test that
 * runs it as a child process (`spawnServer({ entry: 'pinned' })`) knows what falls due.
 * PINNED_NOW: an ISO instant.
 */
import 'reflect-metadata';
import { loadConfig } from '../../../api/src/config.js';
import { createLogger } from '../../../api/src/logger.js';
import { startServer } from '../../../api/src/start.js';

const pinned = new Date(process.env.PINNED_NOW ?? '');
if (Number.isNaN(pinned.getTime())) throw new Error('PINNED_NOW must be an ISO instant');
const config = loadConfig();
await startServer(config, createLogger(config.logLevel), { clock: () => pinned });
