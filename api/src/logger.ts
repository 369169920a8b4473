import { pino, type Logger, type LevelWithSilent } from 'pino';

export type { Logger };

/** JSON logs to stdout; secrets and session cookies never reach them. */
export function createLogger(level: LevelWithSilent | string = 'info'): Logger {
  return pino({
    level,
    base: { service: 'driftmark-api' },
    timestamp: pino.stdTimeFunctions.isoTime,
    redact: {
      paths: [
        'req.headers.cookie',
        'req.headers.authorization',
        'res.headers["set-cookie"]',
        '*.password',
        '*.currentPassword',
        '*.newPassword',
        '*.token',
      ],
      censor: '[redacted]',
    },
  });
}
