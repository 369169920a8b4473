import 'reflect-metadata';
import { configSchema } from './config.js';
import { createDataSource } from './db/data-source.js';
import { seedDemo } from './seed/seed-demo.js';

const USAGE = `Usage: driftmark-cli <command>

Commands:
  migrate       run pending database migrations
  seed          create the demo team, or move its dates to today (refused when APP_MODE=production)
  check-schema  exit 1 and print the SQL when the entities and the migrated schema disagree`;

/** The CLI needs only these two variables, so it runs before the rest of the environment exists. */
function readEnv(): { databaseUrl: string; appMode: string } {
  const parsed = configSchema.pick({ DATABASE_URL: true, APP_MODE: true }).safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  - ${i.path.map(String).join('.')}: ${i.message}`);
    throw new UsageError(`Invalid configuration:\n${lines.join('\n')}`);
  }
  return { databaseUrl: parsed.data.DATABASE_URL, appMode: parsed.data.APP_MODE };
}

class UsageError extends Error {}

async function migrate(): Promise<number> {
  const dataSource = await createDataSource(readEnv()).initialize();
  try {
    const ran = await dataSource.runMigrations({ transaction: 'each' });
    console.log(
      ran.length === 0
        ? 'No pending migrations.'
        : `Ran ${ran.length} migration(s): ${ran.map((m) => m.name).join(', ')}`,
    );
    return 0;
  } finally {
    await dataSource.destroy();
  }
}

async function seed(): Promise<number> {
  const env = readEnv();
  if (env.appMode === 'production') {
    console.error('Refusing to seed demo data: APP_MODE=production.');
    return 1;
  }
  const dataSource = await createDataSource(env).initialize();
  try {
    const { created, movedDays } = await seedDemo(dataSource, { appMode: env.appMode });
    console.log(
      created
        ? 'Demo team created.'
        : movedDays > 0
          ? `Demo team already present; its dates moved forward ${movedDays} day(s) to stay around today.`
          : 'Demo team already present; nothing to do.',
    );
    return 0;
  } finally {
    await dataSource.destroy();
  }
}

async function checkSchema(): Promise<number> {
  const dataSource = await createDataSource(readEnv()).initialize();
  try {
    const sql = await dataSource.driver.createSchemaBuilder().log();
    if (sql.upQueries.length === 0) {
      console.log('Schema matches the entities.');
      return 0;
    }
    console.error('The database schema differs from the entities. A migration would need:');
    for (const q of sql.upQueries) console.error(`  ${q.query};`);
    return 1;
  } finally {
    await dataSource.destroy();
  }
}

const COMMANDS: Record<string, () => Promise<number>> = { migrate, seed, 'check-schema': checkSchema };

async function main(argv: string[]): Promise<number> {
  const [command] = argv;
  const run = command ? COMMANDS[command] : undefined;
  if (!run) {
    console.error(command ? `Unknown command: ${command}\n\n${USAGE}` : USAGE);
    return 2;
  }
  return run();
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (err: unknown) => {
    console.error(
      err instanceof UsageError ? err.message : err instanceof Error ? (err.stack ?? err.message) : err,
    );
    process.exit(1);
  },
);
