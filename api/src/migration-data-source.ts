/**
 * The data source the TypeORM CLI loads (`-d src/migration-data-source.ts`). It needs only
 * DATABASE_URL, so migrations can run before the rest of the configuration exists.
 */
import { configSchema } from './config.js';
import { createDataSource } from './db/data-source.js';

const parsed = configSchema.pick({ DATABASE_URL: true }).safeParse(process.env);
if (!parsed.success) {
  throw new Error(
    `Invalid configuration:\n  - DATABASE_URL: ${parsed.error.issues[0]?.message ?? 'is required'}`,
  );
}

// The CLI refuses a file with more than one exported DataSource, so only the default export.
export default createDataSource({ databaseUrl: parsed.data.DATABASE_URL });
