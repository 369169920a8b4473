/** `npm run seed`: migrate and (idempotently) seed the demo team into the `driftmark` database. */
import { apiCli, appEnv, buildShared } from './lib/app.js';
import { fail, log } from './lib/log.js';
import { ensureCluster, ensureDatabase } from './lib/postgres.js';
import { ensureJwtSecret } from './lib/secrets.js';

try {
  await ensureCluster();
  const env = appEnv({
    APP_MODE: 'demo',
    DATABASE_URL: await ensureDatabase('driftmark'),
    JWT_SECRET: await ensureJwtSecret(),
  });
  await buildShared();
  await apiCli('migrate', env, { source: true });
  await apiCli('seed', env, { source: true });
  log('Seeded the driftmark database.');
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
  process.exit(1);
}
