/**
 * What `npm run bench` stands on, set up the way `npm start` does it: the project's own PostgreSQL
 * cluster, a bench database made afresh (migrated, the demo team seeded, the bench's data added),
 * the built shared, api and web, and the built API server as a child process on a free port in
 * demo mode, with its statement counter on (STATEMENT_COUNT_HEADER=1).
 */
import { mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import pg from 'pg';
import { apiCli, appEnv, buildShared, buildWorkspace, startBuiltServer, waitForHealth } from '../lib/app.js';
import { findPgBinDir } from '../lib/pg-binaries.js';
import { pickFreePort } from '../lib/ports.js';
import { ensureCluster, ensureDatabase, type Cluster } from '../lib/postgres.js';
import type { Service } from '../lib/proc.js';
import { ensureJwtSecret } from '../lib/secrets.js';
import { repoPath } from '../lib/paths.js';
import { createBenchData, type BenchData } from './data.js';

export const BENCH_DATABASE = 'driftmark_bench';

export interface BenchEnvironment {
  cluster: Cluster;
  databaseUrl: string;
  /** Folder of PostgreSQL's client tools (pgbench). */
  pgBinDir: string;
  pgVersion: string;
  baseUrl: string;
  server: Service;
  /** The server's environment (a second server on other settings starts from it). */
  serverEnv: NodeJS.ProcessEnv;
  data: BenchData;
  /** Where the run writes its files (results, uploads, the server's log). */
  outDir: string;
  stop(): Promise<void>;
}

export async function setUpBench(log: (message: string) => void): Promise<BenchEnvironment> {
  const cluster = await ensureCluster();
  const databaseUrl = await ensureDatabase(BENCH_DATABASE, { fresh: true });
  const jwtSecret = await ensureJwtSecret();
  const outDir = path.join(cluster.dataRoot, 'bench');
  const uploadsDir = path.join(outDir, 'uploads');
  const mailDir = path.join(outDir, 'mail');
  rmSync(uploadsDir, { recursive: true, force: true });
  for (const dir of [outDir, uploadsDir, mailDir]) mkdirSync(dir, { recursive: true });

  await buildShared();
  await buildWorkspace('api');
  await buildWorkspace('web');

  const port = await pickFreePort(3900);
  const baseUrl = `http://127.0.0.1:${port}`;
  const env = appEnv({
    APP_MODE: 'demo',
    HOST: '127.0.0.1',
    PORT: String(port),
    APP_ORIGIN: baseUrl,
    DATABASE_URL: databaseUrl,
    JWT_SECRET: jwtSecret,
    MAIL_CAPTURE_DIR: mailDir,
    UPLOADS_DIR: uploadsDir,
    WEB_DIST: repoPath('web', 'dist'),
    STATEMENT_COUNT_HEADER: '1',
    // No SMTP server: mail stays in the outbox, as nothing in the bench sends any.
    SMTP_URL: undefined,
  });
  await apiCli('migrate', env);
  await apiCli('seed', env);

  const started = Date.now();
  const db = new pg.Client({ connectionString: databaseUrl });
  await db.connect();
  let data: BenchData;
  try {
    data = await createBenchData(db);
  } finally {
    await db.end();
  }
  log(
    `Bench data written in ${((Date.now() - started) / 1000).toFixed(1)} s: ` +
      Object.entries(data.rows)
        .map(([table, n]) => `${n.toLocaleString('en-US')} ${table}`)
        .join(', '),
  );

  const server = startBuiltServer(env, path.join(outDir, 'api.log'));
  await waitForHealth(baseUrl, server);
  const pgBinDir = findPgBinDir();
  if (!pgBinDir) throw new Error('No PostgreSQL binaries found (pgbench).');
  const versionDb = new pg.Client({ connectionString: databaseUrl });
  await versionDb.connect();
  const pgVersion = (await versionDb.query<{ v: string }>(`SELECT current_setting('server_version') AS v`))
    .rows[0]!.v;
  await versionDb.end();

  return {
    cluster,
    databaseUrl,
    pgBinDir,
    pgVersion,
    baseUrl,
    server,
    serverEnv: env,
    data,
    outDir,
    async stop() {
      await server.stop('SIGTERM', 15_000);
    },
  };
}
