/** `npm run db:reset`: drop and recreate the `driftmark` database, migrate it and seed the demo team. */
import { apiCli, appEnv, buildShared } from './lib/app.js';
import { fail, log } from './lib/log.js';
import { ensureCluster, ensureDatabase } from './lib/postgres.js';
import { ensureJwtSecret } from './lib/secrets.js';

try {
  await ensureCluster();
  // WITH (FORCE) also ends the sessions of a running `npm start`; its pool reconnects afterwards.
  const databaseUrl = await ensureDatabase('driftmark', { fresh: true });
  const env = appEnv({ APP_MODE: 'demo', DATABASE_URL: databaseUrl, JWT_SECRET: await ensureJwtSecret() });
  await buildShared();
  await apiCli('migrate', env, { source: true });
  await apiCli('seed', env, { source: true });
  log('Recreated, migrated and seeded the driftmark database.');
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
  process.exit(1);
}
