/**
 * Runs the S3 fake (lib/s3-fake.ts) as its own process, configured from the environment:
 *   S3_FAKE_PORT (default 4569), S3_FAKE_HOST (default 127.0.0.1), S3_FAKE_DIR (required: where the
 *   buckets live), S3_FAKE_BUCKETS (comma-separated buckets to create at start).
 * The scripts launch it with an IPC channel and wait for its { type: 'ready', port } message.
 */
import { runFakeProcess } from './lib/fake-process.js';
import { startS3Fake } from './lib/s3-fake.js';

const directory = process.env.S3_FAKE_DIR;
const buckets = (process.env.S3_FAKE_BUCKETS ?? '')
  .split(',')
  .map((b) => b.trim())
  .filter(Boolean);

await runFakeProcess({
  name: 's3-fake',
  portEnv: 'S3_FAKE_PORT',
  defaultPort: 4569,
  hostEnv: 'S3_FAKE_HOST',
  check: () => (directory ? undefined : 'S3_FAKE_DIR is required.'),
  start: (port, host) => startS3Fake({ port, host, directory: directory!, buckets }),
  listening: (fake) => `Listening on ${fake.endpoint}, buckets under ${directory}`,
});
