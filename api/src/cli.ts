import 'reflect-metadata';
import { parseArgs } from 'node:util';
import { storageOf } from './adapters/storage.js';
import { configSchema, loadStorageConfig, type PhotoStorageKind } from './config.js';
import { createDataSource } from './db/data-source.js';
import { seedDemo } from './seed/seed-demo.js';
import { formatMigrationReport, migratePhotos } from './services/photo-migration.service.js';

const USAGE = `Usage: driftmark-cli <command>

Commands:
  migrate       run pending database migrations
  seed          create the demo team, or move its dates to today (refused when APP_MODE=production)
  check-schema  exit 1 and print the SQL when the entities and the migrated schema disagree
  photos-migrate --to s3|folder [--remove-source]
                copy every photo file the rows name from the UPLOADS_DIR folder to the S3_BUCKET
                bucket (--to s3) or back (--to folder), each verified by sha256; run it again after
                an interruption to finish; --remove-source deletes each source file once its copy
                is verified. Stop the servers (or keep them on the source store) while it runs.`;

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

/** Progress every this many files. */
const PROGRESS_EVERY = 500;

async function photosMigrate(args: string[]): Promise<number> {
  let to: PhotoStorageKind;
  let removeSource: boolean;
  try {
    const { values } = parseArgs({
      args,
      options: { to: { type: 'string' }, 'remove-source': { type: 'boolean', default: false } },
      strict: true,
    });
    if (values.to !== 's3' && values.to !== 'folder') throw new Error('--to must be s3 or folder');
    to = values.to;
    removeSource = values['remove-source'];
  } catch (error) {
    throw new UsageError(`${(error as Error).message}\n\n${USAGE}`);
  }
  const env = readEnv();
  let storageConfig;
  try {
    storageConfig = loadStorageConfig();
  } catch (error) {
    throw new UsageError((error as Error).message);
  }
  if (!storageConfig.s3) throw new UsageError('S3_BUCKET: is required to move photos to or from a bucket');
  const fromKind: PhotoStorageKind = to === 's3' ? 'folder' : 's3';
  const from = storageOf(storageConfig, fromKind);
  const target = storageOf(storageConfig, to);
  const direction = `from ${from.location} to ${target.location}`;
  console.log(
    `Copying photo files ${direction}${removeSource ? ' (removing each source file once verified)' : ''}…`,
  );

  const stop = new AbortController();
  const onSignal = () => stop.abort();
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);
  const dataSource = await createDataSource(env).initialize();
  try {
    const report = await migratePhotos({
      dataSource,
      from,
      to: target,
      removeSource,
      signal: stop.signal,
      onObject: (r) => {
        if (r.objects % PROGRESS_EVERY === 0) console.log(`  … ${r.objects} files`);
      },
    });
    for (const line of formatMigrationReport(report, direction)) console.log(line);
    if (stop.signal.aborted) {
      console.log('Interrupted: run the same command again to finish.');
      return 130;
    }
    return report.missing.length > 0 ? 1 : 0;
  } finally {
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
    await dataSource.destroy();
  }
}

const COMMANDS: Record<string, (args: string[]) => Promise<number>> = {
  migrate,
  seed,
  'check-schema': checkSchema,
  'photos-migrate': photosMigrate,
};

async function main(argv: string[]): Promise<number> {
  const [command, ...args] = argv;
  const run = command ? COMMANDS[command] : undefined;
  if (!run) {
    console.error(command ? `Unknown command: ${command}\n\n${USAGE}` : USAGE);
    return 2;
  }
  return run(args);
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
