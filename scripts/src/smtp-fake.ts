/**
 * Runs the SMTP fake (lib/smtp-fake.ts) as its own process, configured from the environment:
 *   SMTP_PORT (default 2525), SMTP_HOST (default 127.0.0.1), MAIL_CAPTURE_DIR (required),
 *   SMTP_ANSWER_DELAY_MS (default 0: answer at once; see SmtpFakeOptions.answerDelayMs).
 * start/dev/test launch it with an IPC channel and wait for its { type: 'ready', port } message.
 */
import { runFakeProcess } from './lib/fake-process.js';
import { startSmtpFake } from './lib/smtp-fake.js';

const captureDir = process.env.MAIL_CAPTURE_DIR;
const answerDelayMs = Number(process.env.SMTP_ANSWER_DELAY_MS ?? 0);

await runFakeProcess({
  name: 'smtp-fake',
  portEnv: 'SMTP_PORT',
  defaultPort: 2525,
  hostEnv: 'SMTP_HOST',
  check: () => {
    if (!captureDir) return 'MAIL_CAPTURE_DIR is required.';
    if (!Number.isInteger(answerDelayMs) || answerDelayMs < 0) {
      return 'SMTP_ANSWER_DELAY_MS must be a whole number of ms.';
    }
    return undefined;
  },
  start: (port, host) => startSmtpFake({ port, host, captureDir: captureDir!, answerDelayMs }),
  listening: (fake) => `Listening on smtp://${fake.host}:${fake.port}, writing to ${captureDir}`,
});
