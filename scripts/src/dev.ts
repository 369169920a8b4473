/**
 * `npm run dev`: development mode with watchers. Runs migrations and the demo seed on the `driftmark`
 * database, then in parallel: `tsc -b shared --watch`, the API from source (tsx watch, port 3000),
 * the SMTP fake and the Vite dev server (http://127.0.0.1:5173, which proxies /api to port 3000).
 * Ctrl-C stops all of them.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import {
  apiCli,
  appEnv,
  buildShared,
  DEMO_PASSWORD,
  startFoodProductsFakeService,
  localPhotoStore,
  startSmtpFake,
  type RunningSmtpFake,
} from './lib/app.js';
import { color, fail, log, warn } from './lib/log.js';
import { repoPath } from './lib/paths.js';
import { isPortFree } from './lib/ports.js';
import { ensureCluster, ensureDatabase } from './lib/postgres.js';
import { onShutdownSignal, packageBin, startService, type Service } from './lib/proc.js';
import { ensureJwtSecret } from './lib/secrets.js';

const API_PORT = 3000;
const WEB_PORT = 5173;
const node = process.execPath;
const services: Service[] = [];
let smtp: RunningSmtpFake | undefined;
let stopping = false;

async function stopAll(): Promise<void> {
  await Promise.all(services.map((service) => service.stop('SIGTERM', 10_000)));
}

onShutdownSignal(() => {
  stopping = true;
  log('Stopping the dev processes...');
  void stopAll().then(() => process.exit(0));
});

async function main(): Promise<void> {
  for (const port of [API_PORT, WEB_PORT]) {
    if (!(await isPortFree(port)))
      throw new Error(`Port ${port} on 127.0.0.1 is in use; npm run dev needs it.`);
  }
  const cluster = await ensureCluster();
  const databaseUrl = await ensureDatabase('driftmark');
  const jwtSecret = await ensureJwtSecret();
  const mailDir = path.join(cluster.dataRoot, 'mail');
  mkdirSync(mailDir, { recursive: true });
  mkdirSync(repoPath('uploads-dev'), { recursive: true });

  // PHOTO_STORAGE=s3 without a bucket of its own: the local S3 fake (before the seed writes photos).
  const store = await localPhotoStore({ dataRoot: cluster.dataRoot, exclude: [API_PORT, WEB_PORT] });
  if (store.fake) services.push(store.fake.service);

  await buildShared();
  const webOrigin = `http://127.0.0.1:${WEB_PORT}`;
  const env = {
    APP_MODE: 'demo',
    HOST: '127.0.0.1',
    PORT: String(API_PORT),
    // E-mail links open the Vite UI; requests through the Vite proxy carry that origin.
    APP_ORIGIN: webOrigin,
    EXTRA_ORIGINS: `${webOrigin},http://127.0.0.1:${API_PORT}`,
    DATABASE_URL: databaseUrl,
    JWT_SECRET: jwtSecret,
    MAIL_CAPTURE_DIR: mailDir,
    UPLOADS_DIR: repoPath('uploads-dev'),
    ...store.env,
  };
  await apiCli('migrate', appEnv(env), { source: true });
  await apiCli('seed', appEnv(env), { source: true });
  if (stopping) return;

  smtp = await startSmtpFake({
    preferredPort: 2525,
    captureDir: mailDir,
    exclude: [API_PORT, WEB_PORT, ...(store.fake ? [store.fake.port] : [])],
  });
  services.push(smtp.service);
  // The barcode lookup asks a local fake of the open food-products database (invented products).
  const foodProducts = await startFoodProductsFakeService({
    preferredPort: 4580,
    exclude: [API_PORT, WEB_PORT, smtp.port],
  });
  services.push(foodProducts.service);
  services.push(
    startService('tsc shared', node, [
      packageBin('typescript', 'tsc'),
      '-b',
      'shared',
      '--watch',
      '--preserveWatchOutput',
    ]),
    startService(
      'api',
      node,
      [
        packageBin('tsx', 'tsx'),
        'watch',
        '--clear-screen=false',
        '--tsconfig',
        repoPath('api', 'tsconfig.json'),
        repoPath('api', 'src', 'server.ts'),
      ],
      { env: appEnv({ ...env, SMTP_URL: smtp.url, FOOD_PRODUCTS_URL: foodProducts.url }) },
    ),
    startService(
      'vite',
      node,
      [
        packageBin('vite', 'vite', repoPath('web')),
        '--host',
        '127.0.0.1',
        '--port',
        String(WEB_PORT),
        '--strictPort',
      ],
      { cwd: repoPath('web') },
    ),
  );
  for (const service of services) {
    void service.exited.then((exit) => {
      if (!stopping) warn(`${service.name} stopped (${exit.signal ?? `exit ${exit.code}`}); Ctrl-C to quit.`);
    });
  }
  console.log(
    [
      '',
      `${color.green('Driftmark dev')}: UI ${color.bold(webOrigin)} (Vite) · API http://127.0.0.1:${API_PORT}`,
      `  Demo accounts (password ${DEMO_PASSWORD}): coach@driftmark.test, assistant@driftmark.test, athlete@driftmark.test`,
      `  Dev inbox: ${webOrigin}/dev/inbox · SMTP ${smtp.url} · database ${cluster.host}:${cluster.port}/driftmark`,
      '  Ctrl-C stops everything.',
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
