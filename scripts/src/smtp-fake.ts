/**
 * Runs the SMTP fake (lib/smtp-fake.ts) as its own process, configured from the environment:
 *   SMTP_PORT (default 2525), SMTP_HOST (default 127.0.0.1), MAIL_CAPTURE_DIR (required),
 *   SMTP_ANSWER_DELAY_MS (default 0: answer at once; see SmtpFakeOptions.answerDelayMs).
 * start/dev/test launch it with an IPC channel and wait for its { type: 'ready', port } message.
 */
import { startSmtpFake } from './lib/smtp-fake.js';

const port = Number(process.env.SMTP_PORT ?? 2525);
const host = process.env.SMTP_HOST ?? '127.0.0.1';
const captureDir = process.env.MAIL_CAPTURE_DIR;
const answerDelayMs = Number(process.env.SMTP_ANSWER_DELAY_MS ?? 0);

if (!captureDir) {
  console.error('[smtp-fake] MAIL_CAPTURE_DIR is required.');
  process.exit(2);
}
if (!Number.isInteger(answerDelayMs) || answerDelayMs < 0) {
  console.error(`[smtp-fake] SMTP_ANSWER_DELAY_MS must be a whole number of ms.`);
  process.exit(2);
}
if (!Number.isInteger(port) || port < 0 || port > 65_535) {
  console.error(`[smtp-fake] SMTP_PORT must be a port number (got "${process.env.SMTP_PORT}").`);
  process.exit(2);
}

try {
  const fake = await startSmtpFake({ port, host, captureDir, answerDelayMs });
  console.log(`[smtp-fake] Listening on smtp://${fake.host}:${fake.port}, writing to ${captureDir}`);
  process.send?.({ type: 'ready', port: fake.port });
  // Without this the open IPC channel would keep a parent-less fake alive forever.
  process.on('disconnect', () => void fake.close().then(() => process.exit(0)));
  let closing = false;
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
    process.on(signal, () => {
      if (closing) return;
      closing = true;
      void fake.close().then(() => process.exit(0));
    });
  }
} catch (error) {
  console.error(`[smtp-fake] Could not listen on ${host}:${port}: ${(error as Error).message}`);
  process.exit(1);
}
