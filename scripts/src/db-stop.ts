/** `npm run db:stop`: stop the project's PostgreSQL cluster (the next start brings it back). */
import { fail, log } from './lib/log.js';
import { stopCluster } from './lib/postgres.js';

try {
  log((await stopCluster()) ? 'PostgreSQL stopped.' : 'PostgreSQL was not running.');
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
  process.exit(1);
}
