import 'reflect-metadata';
import { loadConfig, type Config } from './config.js';
import { createLogger } from './logger.js';
import { installProcessErrorHandlers } from './process-errors.js';
import { startServer } from './start.js';

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
  await startServer(config, logger);
}

main().catch((err: unknown) => {
  console.error('Driftmark failed to start:', err instanceof Error ? (err.stack ?? err.message) : err);
  process.exit(1);
});
