import type { Logger } from './logger.js';
import { currentRequestId } from './middleware/request-logging.js';

/**
 * For `process.on('unhandledRejection')`. A promise nobody awaited failed: a bug in one piece of
 * work (a request, a job tick) that has already unwound cleanly, not a sign the process is broken.
 * Log it with the request it came from, when known, and keep serving everyone else.
 */
export function logUnhandledRejection(logger: Logger): (reason: unknown) => void {
  return (reason) => {
    const requestId = currentRequestId();
    logger.error(
      { err: reason, ...(requestId ? { requestId } : {}) },
      'unhandled promise rejection (a bug); the server keeps running',
    );
  };
}

/**
 * For `process.on('uncaughtException')`. A throw unwound a stack half-way through some work, and
 * whatever it held (a transaction, a lock, a half-written structure) may be left inconsistent:
 * log it and exit 1. `npm start` starts the server again; elsewhere the process manager does.
 */
export function exitOnUncaughtException(
  logger: Logger,
  exit: (code: number) => void = (code) => process.exit(code),
): (error: Error, origin: string) => void {
  return (error, origin) => {
    const requestId = currentRequestId();
    logger.fatal(
      { err: error, origin, ...(requestId ? { requestId } : {}) },
      'uncaught exception; exiting, state may be inconsistent',
    );
    logger.flush();
    exit(1);
  };
}

/** Installs both policies on this process (the server's entry point calls it once). */
export function installProcessErrorHandlers(logger: Logger): void {
  process.on('unhandledRejection', logUnhandledRejection(logger));
  process.on('uncaughtException', exitOnUncaughtException(logger));
}
