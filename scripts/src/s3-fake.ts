/**
 * Runs the S3 fake (lib/s3-fake.ts) as its own process, configured from the environment:
 *   S3_FAKE_PORT (default 4569), S3_FAKE_HOST (default 127.0.0.1), S3_FAKE_DIR (required: where the
 *   buckets live), S3_FAKE_BUCKETS (comma-separated buckets to create at start).
 * The scripts launch it with an IPC channel and wait for its { type: 'ready', port } message.
 */
import { startS3Fake } from './lib/s3-fake.js';

const port = Number(process.env.S3_FAKE_PORT ?? 4569);
const host = process.env.S3_FAKE_HOST ?? '127.0.0.1';
const directory = process.env.S3_FAKE_DIR;
const buckets = (process.env.S3_FAKE_BUCKETS ?? '')
  .split(',')
  .map((b) => b.trim())
  .filter(Boolean);

if (!directory) {
  console.error('[s3-fake] S3_FAKE_DIR is required.');
  process.exit(2);
}
if (!Number.isInteger(port) || port < 0 || port > 65_535) {
  console.error(`[s3-fake] S3_FAKE_PORT must be a port number (got "${process.env.S3_FAKE_PORT}").`);
  process.exit(2);
}

try {
  const fake = await startS3Fake({ port, host, directory, buckets });
  console.log(`[s3-fake] Listening on ${fake.endpoint}, buckets under ${directory}`);
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
  console.error(`[s3-fake] Could not listen on ${host}:${port}: ${(error as Error).message}`);
  process.exit(1);
}
