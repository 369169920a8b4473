/** Building and running the app's parts: shared/api/web builds, the API CLI, the SMTP and S3 fakes, the server. */
import path from 'node:path';
import { isBuildFresh, recordBuild, type BuildCheck } from './fingerprint.js';
import { fail, log, seconds, warn } from './log.js';
import { repoPath, repoRoot } from './paths.js';
import { pickFreePort } from './ports.js';
import {
  npmCommand,
  packageBin,
  runChecked,
  sleep,
  startService,
  type Service,
  type ServiceExit,
} from './proc.js';
import { API_RESTART, nextRestart, type RestartPolicy } from './restart-policy.js';
import { s3FakeEnv } from './s3-fake.js';

export const DEMO_PASSWORD = 'driftmark-demo';
export const DEMO_ACCOUNTS = [
  { email: 'coach@driftmark.test', role: 'owner, head coach' },
  { email: 'assistant@driftmark.test', role: 'assistant coach' },
  { email: 'athlete@driftmark.test', role: 'athlete, final-week countdown' },
] as const;

const node = process.execPath;

/** Environment for the API (server or CLI): ours plus the given variables; undefined removes one. */
export function appEnv(vars: Record<string, string | undefined>): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env };
  for (const [key, value] of Object.entries(vars)) {
    if (value === undefined) delete env[key];
    else env[key] = value;
  }
  return env;
}

async function timed<T>(label: string, action: () => Promise<T>): Promise<T> {
  const started = Date.now();
  const result = await action();
  log(`${label} (${seconds(Date.now() - started)})`);
  return result;
}

/** `tsc -b shared` (incremental: a no-op when shared/dist is current). */
export function buildShared(): Promise<void> {
  return timed('Built shared', async () => {
    await runChecked(node, [packageBin('typescript', 'tsc'), '-b', 'shared']);
  });
}

function workspaceBuild(workspace: 'api' | 'web', outputs: string[]): BuildCheck {
  return {
    // The whole workspace (minus dist and node_modules) plus everything it is built from.
    inputs: [
      repoPath(workspace),
      repoPath('shared', 'dist'),
      repoPath('tsconfig.base.json'),
      repoPath('package-lock.json'),
    ],
    outputs: outputs.map((output) => repoPath(workspace, 'dist', output)),
    stampFile: repoPath(workspace, 'dist', '.driftmark-build'),
    baseDir: repoRoot,
  };
}

/** `npm run build -w <workspace>`, skipped when no input changed since the last successful build. */
export async function buildWorkspace(
  workspace: 'api' | 'web',
  options: { force?: boolean } = {},
): Promise<void> {
  const check = workspaceBuild(workspace, workspace === 'api' ? ['server.js', 'cli.js'] : ['index.html']);
  if (!options.force && isBuildFresh(check)) {
    log(`${workspace}: build is up to date (inputs unchanged).`);
    return;
  }
  const [cmd, ...prefix] = npmCommand();
  await timed(`Built ${workspace}`, async () => {
    await runChecked(cmd, [...prefix, 'run', 'build', '-w', workspace]);
  });
  recordBuild(check);
}

/**
 * Runs an API CLI command (migrate, seed, check-schema). `source` runs api/src/cli.ts through tsx with
 * api/tsconfig.json (tsx reads only one tsconfig; without it TypeORM's legacy decorators break);
 * otherwise the built api/dist/cli.js.
 */
export async function apiCli(
  command: string,
  env: NodeJS.ProcessEnv,
  options: { source?: boolean; args?: string[] } = {},
): Promise<void> {
  const args = options.source
    ? ['--import', 'tsx', repoPath('api', 'src', 'cli.ts'), command, ...(options.args ?? [])]
    : [repoPath('api', 'dist', 'cli.js'), command, ...(options.args ?? [])];
  const childEnv = options.source ? { ...env, TSX_TSCONFIG_PATH: repoPath('api', 'tsconfig.json') } : env;
  await timed(
    `api ${command} (${env.APP_MODE ?? 'no APP_MODE'}, ${databaseName(env.DATABASE_URL)})`,
    async () => {
      await runChecked(node, args, { env: childEnv });
    },
  );
}

function databaseName(url: string | undefined): string {
  if (!url) return 'no DATABASE_URL';
  try {
    return new URL(url).pathname.slice(1) || url;
  } catch {
    return 'bad DATABASE_URL';
  }
}

export interface RunningSmtpFake {
  service: Service;
  port: number;
  url: string;
}

/**
 * Starts `scripts/src/<script>.ts` with an IPC channel and waits for its `{ type: 'ready' }` message
 * (the SMTP and S3 fakes); stops it and throws when none comes within 20 s.
 */
async function startReadyService(
  name: string,
  script: string,
  env: NodeJS.ProcessEnv,
  logFile: string | undefined,
  what: string,
): Promise<Service> {
  const service = startService(name, node, ['--import', 'tsx', repoPath('scripts', 'src', script)], {
    env,
    ipc: true,
    logFile,
  });
  const ready = await new Promise<boolean>((resolve) => {
    const timer = setTimeout(() => resolve(false), 20_000);
    service.child.on('message', (message: { type?: string }) => {
      if (message?.type === 'ready') {
        clearTimeout(timer);
        resolve(true);
      }
    });
    void service.exited.then(() => {
      clearTimeout(timer);
      resolve(false);
    });
  });
  if (!ready) {
    await service.stop('SIGKILL');
    throw new Error(`${what} did not start${logFile ? ` (see ${logFile})` : ''}.`);
  }
  service.child.channel?.unref();
  return service;
}

/** Starts scripts/src/smtp-fake.ts on the first free port at or after `preferredPort`. */
export async function startSmtpFake(options: {
  preferredPort: number;
  captureDir: string;
  logFile?: string;
  exclude?: number[];
  /** Delay before each 250 answer (see SmtpFakeOptions.answerDelayMs). */
  answerDelayMs?: number;
}): Promise<RunningSmtpFake> {
  const port = await pickFreePort(options.preferredPort, { exclude: options.exclude });
  const env = {
    ...process.env,
    SMTP_PORT: String(port),
    SMTP_HOST: '127.0.0.1',
    MAIL_CAPTURE_DIR: options.captureDir,
    SMTP_ANSWER_DELAY_MS: String(options.answerDelayMs ?? 0),
  };
  const what = `The SMTP fake on port ${port}`;
  const service = await startReadyService('smtp-fake', 'smtp-fake.ts', env, options.logFile, what);
  return { service, port, url: `smtp://127.0.0.1:${port}` };
}

export interface RunningFoodProductsFake {
  service: Service;
  port: number;
  /** The base URL the API's FOOD_PRODUCTS_URL names. */
  url: string;
}

/** Starts scripts/src/food-products-fake.ts on the first free port at or after `preferredPort`. */
export async function startFoodProductsFakeService(options: {
  preferredPort: number;
  logFile?: string;
  exclude?: number[];
}): Promise<RunningFoodProductsFake> {
  const port = await pickFreePort(options.preferredPort, { exclude: options.exclude });
  const env = { ...process.env, FOOD_PRODUCTS_PORT: String(port), FOOD_PRODUCTS_HOST: '127.0.0.1' };
  const what = `The food-products fake on port ${port}`;
  const service = await startReadyService(
    'food-products-fake',
    'food-products-fake.ts',
    env,
    options.logFile,
    what,
  );
  return { service, port, url: `http://127.0.0.1:${port}` };
}

export interface RunningS3Fake {
  service: Service;
  port: number;
  /** `http://127.0.0.1:<port>` */
  endpoint: string;
  /** S3_ENDPOINT, S3_REGION, S3_FORCE_PATH_STYLE and the keys pointing at this fake (no bucket). */
  env: Record<string, string>;
}

/**
 * Starts scripts/src/s3-fake.ts (s3rver) on the first free port at or after `preferredPort`, its
 * buckets under `directory`, with `buckets` created.
 */
export async function startS3Fake(options: {
  preferredPort: number;
  directory: string;
  buckets?: string[];
  logFile?: string;
  exclude?: number[];
}): Promise<RunningS3Fake> {
  const port = await pickFreePort(options.preferredPort, { exclude: options.exclude });
  const env = {
    ...process.env,
    S3_FAKE_PORT: String(port),
    S3_FAKE_HOST: '127.0.0.1',
    S3_FAKE_DIR: options.directory,
    S3_FAKE_BUCKETS: (options.buckets ?? []).join(','),
  };
  const what = `The S3 fake on port ${port}`;
  const service = await startReadyService('s3-fake', 's3-fake.ts', env, options.logFile, what);
  const endpoint = `http://127.0.0.1:${port}`;
  return { service, port, endpoint, env: s3FakeEnv(endpoint) };
}

/** The bucket the scripts make in the local S3 fake. */
export const LOCAL_BUCKET = 'driftmark-photos';

/**
 * The photo store of a run on this machine (`npm start`, `npm run photos:migrate`): nothing to add
 * for the folder (the default) or for a bucket the environment names itself (S3_BUCKET set); when
 * PHOTO_STORAGE=s3 (or `needBucket`) names none, the S3 fake is started with its buckets under
 * `<data>/s3-fake` and the returned variables point at its bucket `driftmark-photos`.
 */
export async function localPhotoStore(options: {
  dataRoot: string;
  needBucket?: boolean;
  exclude?: number[];
}): Promise<{ env: Record<string, string>; fake?: RunningS3Fake }> {
  const wantsBucket = options.needBucket || process.env.PHOTO_STORAGE === 's3';
  if (!wantsBucket || process.env.S3_BUCKET) return { env: {} };
  const directory = path.join(options.dataRoot, 's3-fake');
  const fake = await startS3Fake({
    preferredPort: 4569,
    directory,
    buckets: [LOCAL_BUCKET],
    exclude: options.exclude,
    logFile: path.join(options.dataRoot, 's3-fake.log'),
  });
  log(`S3 fake on ${fake.endpoint}, bucket ${LOCAL_BUCKET} in ${relative(directory)}`);
  return { env: { ...fake.env, S3_BUCKET: LOCAL_BUCKET }, fake };
}

/** Polls GET <baseUrl>/api/health until it answers 200; fails early when the server process exits. */
export async function waitForHealth(baseUrl: string, server: Service, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let lastProblem = 'no answer';
  while (Date.now() < deadline) {
    if (server.hasExited()) throw new Error(`The API server exited before ${baseUrl}/api/health answered.`);
    try {
      const response = await fetch(`${baseUrl}/api/health`, { signal: AbortSignal.timeout(2000) });
      if (response.ok) return;
      lastProblem = `HTTP ${response.status}: ${(await response.text()).slice(0, 200)}`;
    } catch (error) {
      lastProblem = (error as Error).message;
    }
    await sleep(250);
  }
  throw new Error(`${baseUrl}/api/health did not answer 200 within ${seconds(timeoutMs)} (${lastProblem}).`);
}

/** `node api/dist/server.js` in its own process group. */
export function startBuiltServer(env: NodeJS.ProcessEnv, logFile?: string): Service {
  return startService('api', node, [repoPath('api', 'dist', 'server.js')], { env, logFile });
}

export interface SupervisedServer {
  /** Resolves once the first server answers its health check; rejects when it exits before. */
  readonly ready: Promise<void>;
  /** Stops the server for good: no restart follows. */
  stop(signal?: NodeJS.Signals, timeoutMs?: number): Promise<void>;
}

function describeExit(exit: ServiceExit): string {
  return exit.signal ?? `exit ${exit.code}`;
}

/**
 * `node api/dist/server.js`, started again whenever it exits without being asked to (after a
 * server that answered its health check once): a crash then costs the requests in flight, not the
 * whole product. Waits between restarts follow `policy`.
 */
export function superviseBuiltServer(
  env: NodeJS.ProcessEnv,
  options: { baseUrl: string; policy?: RestartPolicy },
): SupervisedServer {
  const policy = options.policy ?? API_RESTART;
  let current = startBuiltServer(env);
  let startedAt = Date.now();
  let streak = 0;
  let stopped = false;
  let pending: NodeJS.Timeout | undefined;

  const restartWhenItDies = (service: Service): void => {
    void service.exited.then((exit) => {
      if (stopped) return;
      const next = nextRestart(streak, Date.now() - startedAt, policy);
      streak = next.streak;
      fail(
        `The API server stopped unexpectedly (${describeExit(exit)}); starting it again in ` +
          `${seconds(next.delayMs)} (restart ${streak} in a row). The SMTP fake keeps running.`,
      );
      pending = setTimeout(() => {
        pending = undefined;
        if (stopped) return;
        current = startBuiltServer(env);
        startedAt = Date.now();
        restartWhenItDies(current);
        waitForHealth(options.baseUrl, current).then(
          () => log(`The API server is back on ${options.baseUrl}.`),
          // An exit before the health check is handled above; anything else is worth a word.
          (error: unknown) => {
            if (!current.hasExited()) warn((error as Error).message);
          },
        );
      }, next.delayMs);
    });
  };

  const ready = waitForHealth(options.baseUrl, current).then(() => restartWhenItDies(current));
  return {
    ready,
    async stop(signal = 'SIGINT', timeoutMs = 15_000) {
      stopped = true;
      if (pending) clearTimeout(pending);
      await current.stop(signal, timeoutMs);
    },
  };
}

export function relative(file: string): string {
  return path.relative(process.cwd(), file) || '.';
}
