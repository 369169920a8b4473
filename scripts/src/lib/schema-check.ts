import { apiCli, appEnv } from './app.js';

/**
 * Applies the migrations to `databaseUrl`, then runs `cli.ts check-schema`, which exits 1 (printing
 * the SQL) when the entities describe a schema the migrations do not produce.
 */
export async function checkSchema(databaseUrl: string, jwtSecret: string): Promise<void> {
  const env = appEnv({
    APP_MODE: 'test',
    DATABASE_URL: databaseUrl,
    JWT_SECRET: jwtSecret,
    LOG_LEVEL: 'silent',
  });
  await apiCli('migrate', env, { source: true });
  await apiCli('check-schema', env, { source: true });
}
