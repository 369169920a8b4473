/**
 * `npm start`: the built app in demo mode on http://127.0.0.1:${PORT:-3000}, with the demo team seeded
 * and mail captured by the SMTP fake (readable in the dev inbox). An API server that dies is started
 * again after a back-off. Ctrl-C stops the server gracefully and the SMTP fake, and exits 0; the
 * database and the PostgreSQL cluster keep running (npm run db:stop).
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import {
  apiCli,
  appEnv,
  buildShared,
  buildWorkspace,
  DEMO_ACCOUNTS,
  DEMO_PASSWORD,
  startFoodProductsFakeService,
  startSmtpFake,
  superviseBuiltServer,
  type RunningFoodProductsFake,
  localPhotoStore,
  type RunningS3Fake,
  type RunningSmtpFake,
  type SupervisedServer,
} from './lib/app.js';
import { color, fail, log, seconds, warn } from './lib/log.js';
import { repoPath } from './lib/paths.js';
import { isPortFree } from './lib/ports.js';
import { ensureCluster, ensureDatabase } from './lib/postgres.js';
import { onShutdownSignal } from './lib/proc.js';
import { ensureJwtSecret } from './lib/secrets.js';

const startedAt = Date.now();
let server: SupervisedServer | undefined;
let smtp: RunningSmtpFake | undefined;
let foodProducts: RunningFoodProductsFake | undefined;
let s3: RunningS3Fake | undefined;
let stopping = false;

async function stopAll(): Promise<void> {
  await server?.stop('SIGINT', 15_000);
  await smtp?.service.stop('SIGTERM', 5_000);
  await foodProducts?.service.stop('SIGTERM', 5_000);
  await s3?.service.stop('SIGTERM', 5_000);
}

onShutdownSignal(() => {
  stopping = true;
  log(server ? 'Stopping (the server finishes open requests first)...' : 'Interrupted.');
  void stopAll().then(() => {
    log('Stopped. The data stays in PostgreSQL for the next start.');
    process.exit(0);
  });
});

async function main(): Promise<void> {
  const port = Number(process.env.PORT ?? 3000);
  if (!Number.isInteger(port) || port <= 0 || port > 65_535) throw new Error(`PORT must be a port number.`);
  if (!(await isPortFree(port))) {
    throw new Error(
      `Port ${port} on 127.0.0.1 is already in use. Stop that program or run: PORT=${port + 1} npm start`,
    );
  }

  const cluster = await ensureCluster();
  const databaseUrl = await ensureDatabase('driftmark');
  const jwtSecret = await ensureJwtSecret();
  const mailDir = path.join(cluster.dataRoot, 'mail');
  const uploadsDir = repoPath('uploads-dev');
  mkdirSync(mailDir, { recursive: true });
  mkdirSync(uploadsDir, { recursive: true });

  await buildShared();
  await buildWorkspace('api');
  await buildWorkspace('web');

  // PHOTO_STORAGE=s3 without a bucket of its own: the local S3 fake (before the seed writes photos).
  const store = await localPhotoStore({ dataRoot: cluster.dataRoot, exclude: [port] });
  s3 = store.fake;

  const baseUrl = `http://127.0.0.1:${port}`;
  const env = {
    APP_MODE: 'demo',
    HOST: '127.0.0.1',
    PORT: String(port),
    APP_ORIGIN: `http://127.0.0.1:${port}`,
    DATABASE_URL: databaseUrl,
    JWT_SECRET: jwtSecret,
    MAIL_CAPTURE_DIR: mailDir,
    UPLOADS_DIR: uploadsDir,
    WEB_DIST: repoPath('web', 'dist'),
    ...store.env,
  };
  await apiCli('migrate', appEnv(env));
  await apiCli('seed', appEnv(env));
  if (stopping) return;

  smtp = await startSmtpFake({
    preferredPort: 2525,
    captureDir: mailDir,
    exclude: [port, ...(s3 ? [s3.port] : [])],
  });
  // A server that dies later (a bug) is started again after a short wait; see superviseBuiltServer.
  // The barcode lookup asks a local fake of the open food-products database (invented products).
  foodProducts = await startFoodProductsFakeService({ preferredPort: 4580, exclude: [port, smtp.port] });
  server = superviseBuiltServer(appEnv({ ...env, SMTP_URL: smtp.url, FOOD_PRODUCTS_URL: foodProducts.url }), {
    baseUrl,
  });
  void smtp.service.exited.then((exit) => {
    if (!stopping)
      warn(`The SMTP fake stopped (${exit.signal ?? `exit ${exit.code}`}); e-mail will not be captured.`);
  });
  await server.ready;

  const bucket = store.env.S3_BUCKET ?? process.env.S3_BUCKET;
  const photosLine =
    process.env.PHOTO_STORAGE === 's3'
      ? `bucket ${bucket}${s3 ? ` in the S3 fake (${s3.endpoint})` : ''}`
      : `${uploadsDir} (PHOTO_STORAGE=s3 npm start: a bucket in the S3 fake)`;
  const width = Math.max(...DEMO_ACCOUNTS.map((account) => account.email.length));
  console.log(
    [
      '',
      `${color.green('Driftmark is running')} (demo mode, ready in ${seconds(Date.now() - startedAt)}): ${color.bold(baseUrl)}`,
      `  Demo accounts, password ${color.bold(DEMO_PASSWORD)}:`,
      ...DEMO_ACCOUNTS.map((account) => `    ${account.email.padEnd(width)}  ${account.role}`),
      '    (five more athletes: see the roster)',
      `  Dev inbox:  ${baseUrl}/dev/inbox   (mail captured via ${smtp.url} into ${mailDir})`,
      `  Database:   ${cluster.host}:${cluster.port}/driftmark (cluster in ${cluster.layout.dataDir})`,
      `  Photos:     ${photosLine}`,
      '  Ctrl-C stops the app; the data stays.',
      '',
    ].join('\n'),
  );
}

main().catch(async (error: unknown) => {
  fail(error instanceof Error ? error.message : String(error));
  stopping = true;
  await stopAll();
  process.exit(1);
});
