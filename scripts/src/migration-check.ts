/**
 * `npm run migration:check`: a fresh `driftmark_test`, all migrations, then `check-schema`; exits 1
 * when the entities and the migrations disagree (the SQL that would fix it is printed).
 */
import { buildShared } from './lib/app.js';
import { fail, log } from './lib/log.js';
import { ensureCluster, ensureDatabase } from './lib/postgres.js';
import { checkSchema } from './lib/schema-check.js';
import { generateSecret } from './lib/secrets.js';

try {
  await ensureCluster();
  const databaseUrl = await ensureDatabase('driftmark_test', { fresh: true });
  await buildShared();
  await checkSchema(databaseUrl, generateSecret());
  log('Entities and migrations agree.');
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
  process.exit(1);
}
