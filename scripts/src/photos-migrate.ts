/**
 * `npm run photos:migrate -- --to s3|folder [--remove-source]`: copies the development database's
 * photo files between the folder (UPLOADS_DIR, default uploads-dev/) and a bucket (the S3_* settings
 * from the environment; without S3_BUCKET, the local S3 fake's bucket under <data>/s3-fake), each
 * verified by sha256 (api/src/services/photo-migration.service.ts). Run it again after an
 * interruption to finish. On a real host run the built CLI instead: `node api/dist/cli.js photos-migrate`.
 */
import { apiCli, appEnv, buildShared, localPhotoStore, type RunningS3Fake } from './lib/app.js';
import { fail, log } from './lib/log.js';
import { repoPath } from './lib/paths.js';
import { ensureCluster, ensureDatabase } from './lib/postgres.js';

let fake: RunningS3Fake | undefined;
// Ctrl-C reaches the CLI too: it stops between files and prints what it did; wait for it.
process.on('SIGINT', () => log('Stopping after the current file…'));
process.on('SIGTERM', () => undefined);

try {
  const cluster = await ensureCluster();
  const store = await localPhotoStore({ dataRoot: cluster.dataRoot, needBucket: true });
  fake = store.fake;
  const env = appEnv({
    APP_MODE: process.env.APP_MODE ?? 'demo',
    DATABASE_URL: process.env.DATABASE_URL ?? (await ensureDatabase('driftmark')),
    UPLOADS_DIR: process.env.UPLOADS_DIR ?? repoPath('uploads-dev'),
    ...store.env,
  });
  await buildShared();
  await apiCli('migrate', env, { source: true });
  await apiCli('photos-migrate', env, { source: true, args: process.argv.slice(2) });
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
  process.exitCode = 1;
} finally {
  await fake?.service.stop('SIGTERM', 5000);
}
