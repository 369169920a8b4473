/** `npm run db:reset`: drop and recreate the `driftmark` database, migrate it and seed the demo team. */
import { readdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { apiCli, appEnv, buildShared } from './lib/app.js';
import { fail, log } from './lib/log.js';
import { ensureCluster, ensureDatabase } from './lib/postgres.js';
import { repoPath } from './lib/paths.js';
import { ensureJwtSecret } from './lib/secrets.js';

/** Photos belong to rows that are about to go: empty the development storage folder (keeping its marker files). */
function clearUploads(dir: string): void {
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    if (entry.name === '.gitkeep' || entry.name === 'README.md') continue;
    rmSync(path.join(dir, entry.name), { recursive: true, force: true });
  }
}

try {
  await ensureCluster();
  // WITH (FORCE) also ends the sessions of a running `npm start`; its pool reconnects afterwards.
  const databaseUrl = await ensureDatabase('driftmark', { fresh: true });
  const uploadsDir = repoPath('uploads-dev');
  clearUploads(uploadsDir);
  const env = appEnv({
    APP_MODE: 'demo',
    DATABASE_URL: databaseUrl,
    JWT_SECRET: await ensureJwtSecret(),
    UPLOADS_DIR: uploadsDir,
    // The folder it has just emptied; photos:migrate moves them to a bucket.
    PHOTO_STORAGE: 'folder',
  });
  await buildShared();
  await apiCli('migrate', env, { source: true });
  await apiCli('seed', env, { source: true });
  log('Recreated, migrated and seeded the driftmark database.');
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
  process.exit(1);
}
