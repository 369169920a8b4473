/**
 * `npm test [-- stage...]`: lint → format → typecheck → unit → integration → migration-check →
 * reliability (the small run of scripts/src/lib/reliability.ts) → e2e,
 * stopping at the first failing stage. `npm run test:integration` / `test:e2e` pick one stage.
 * Every vitest run writes test-results/<project>.json; the last line printed is the total, e.g.
 * "Tests: 123 passed, 0 failed".
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {
  apiCli,
  appEnv,
  buildShared,
  buildWorkspace,
  startBuiltServer,
  startFoodProductsFakeService,
  startSmtpFake,
  waitForHealth,
  type RunningFoodProductsFake,
  startS3Fake,
  type RunningS3Fake,
  type RunningSmtpFake,
} from './lib/app.js';
import { ensureChromium } from './lib/chromium.js';
import { color, fail, log } from './lib/log.js';
import { repoPath, repoRoot } from './lib/paths.js';
import { pickFreePort } from './lib/ports.js';
import { ensureCluster, ensureDatabase } from './lib/postgres.js';
import { npmCommand, onShutdownSignal, packageBin, run, type Service } from './lib/proc.js';
import { FULL_COUNTS, runReliability, SMALL_COUNTS } from './lib/reliability.js';
import { formatResult, scenarioFailed } from './lib/reliability-tally.js';
import { checkSchema } from './lib/schema-check.js';
import { generateSecret } from './lib/secrets.js';
import { formatSummary, parseStageArgs, runStages, type Stage, type StageName } from './lib/stages.js';
import { addTotals, formatTotals, readTotals, type TestTotals } from './lib/vitest-report.js';

const node = process.execPath;
const reportsDir = repoPath('test-results');
const jwtSecret = generateSecret();
const running: Service[] = [];
const vitestProjectsRun: string[] = [];
/** Reliability scenarios count in the total like tests do. */
const reliabilityTotals: TestTotals = { passed: 0, failed: 0, skipped: 0 };

onShutdownSignal(() => {
  fail('Interrupted.');
  void Promise.all(running.map((service) => service.stop('SIGTERM', 5000))).then(() => process.exit(130));
});

/** Runs a command with inherited output; a non-zero exit becomes a short stage error. */
async function command(cmd: string, args: string[], env: NodeJS.ProcessEnv = process.env): Promise<void> {
  const result = await run(cmd, args, { env });
  const name = path.basename(args[0] ?? cmd).replace(/\.(c|m)?js$/, '');
  if (result.code !== 0) throw new Error(`${name} failed (${result.signal ?? `exit ${result.code}`})`);
}

function reportFile(project: string): string {
  return path.join(reportsDir, `${project}.json`);
}

async function vitest(project: string, env: NodeJS.ProcessEnv = process.env): Promise<void> {
  vitestProjectsRun.push(project);
  const result = await run(
    node,
    [
      packageBin('vitest'),
      'run',
      '--project',
      project,
      '--passWithNoTests',
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${reportFile(project)}`,
      // TEST_FILTER="demo-any-day trend" runs only the files whose paths contain one of the words.
      ...(process.env.TEST_FILTER?.split(/\s+/).filter(Boolean) ?? []),
    ],
    { env },
  );
  if (result.code !== 0)
    throw new Error(`vitest project "${project}" failed (${result.signal ?? `exit ${result.code}`})`);
}

/** `npm run typecheck -w <ws>` for every workspace, two at a time, each output printed as a block. */
async function typecheckWorkspaces(): Promise<void> {
  const manifest = JSON.parse(readFileSync(repoPath('package.json'), 'utf8')) as { workspaces: string[] };
  const [npm, ...prefix] = npmCommand();
  const queue = [...manifest.workspaces];
  const failures: string[] = [];
  const worker = async (): Promise<void> => {
    for (let ws = queue.shift(); ws !== undefined; ws = queue.shift()) {
      const result = await run(npm, [...prefix, 'run', 'typecheck', '-w', ws, '--if-present'], {
        capture: true,
      });
      const output = `${result.stdout}${result.stderr}`
        .split('\n')
        .filter((line) => line.trim() && !/^> |^npm (warn|notice)/.test(line))
        .join('\n');
      console.log(
        `${result.code === 0 ? color.green('✓') : color.red('✗')} ${ws}${output ? `\n${output}` : ''}`,
      );
      if (result.code !== 0) failures.push(ws);
    }
  };
  await Promise.all([worker(), worker()]);
  if (failures.length > 0) throw new Error(`type errors in ${failures.join(', ')}`);
}

async function e2eStage(e2eUrl: string): Promise<void> {
  await buildWorkspace('api');
  await buildWorkspace('web');
  const scratch = mkdtempSync(path.join(os.tmpdir(), 'driftmark-e2e-'));
  const captureDir = path.join(scratch, 'mail');
  const uploadsDir = path.join(scratch, 'uploads');
  const screenshotDir = repoPath('screenshots');
  mkdirSync(captureDir);
  mkdirSync(uploadsDir);
  // The seed writes the demo photos through the same storage folder the e2e server reads.
  const base = {
    APP_MODE: 'test',
    DATABASE_URL: e2eUrl,
    JWT_SECRET: jwtSecret,
    LOG_LEVEL: 'warn',
    UPLOADS_DIR: uploadsDir,
  };
  await apiCli('migrate', appEnv(base));
  await apiCli('seed', appEnv(base));
  rmSync(screenshotDir, { recursive: true, force: true });
  mkdirSync(screenshotDir);
  const serverLog = path.join(reportsDir, 'e2e-server.log');
  rmSync(serverLog, { force: true });

  let smtp: RunningSmtpFake | undefined;
  let foodProducts: RunningFoodProductsFake | undefined;
  let server: Service | undefined;
  try {
    const port = await pickFreePort(3100);
    smtp = await startSmtpFake({ preferredPort: 2600, captureDir, exclude: [port], logFile: serverLog });
    running.push(smtp.service);
    foodProducts = await startFoodProductsFakeService({
      preferredPort: 4680,
      exclude: [port, smtp.port],
      logFile: serverLog,
    });
    running.push(foodProducts.service);
    const baseUrl = `http://127.0.0.1:${port}`;
    server = startBuiltServer(
      appEnv({
        ...base,
        HOST: '127.0.0.1',
        PORT: String(port),
        APP_ORIGIN: baseUrl,
        EXTRA_ORIGINS: undefined,
        SMTP_URL: smtp.url,
        FOOD_PRODUCTS_URL: foodProducts.url,
        MAIL_CAPTURE_DIR: captureDir,
        UPLOADS_DIR: uploadsDir,
        WEB_DIST: repoPath('web', 'dist'),
        // Browser journeys sign in many times from one address; keep the limiter out of their way.
        SIGN_IN_RATE_LIMIT: '200',
        RESET_RATE_LIMIT: '200',
        ADDRESS_RATE_LIMIT: '200',
      }),
      serverLog,
    );
    running.push(server);
    await waitForHealth(baseUrl, server);
    log(`e2e server on ${baseUrl} (log: ${path.relative(repoRoot, serverLog)}), mail in ${captureDir}`);
    await vitest(
      'e2e',
      appEnv({
        E2E_BASE_URL: baseUrl,
        MAIL_CAPTURE_DIR: captureDir,
        E2E_SCREENSHOT_DIR: screenshotDir,
        CHROMIUM_PATH: '/usr/bin/chromium',
        DATABASE_URL: e2eUrl,
        APP_MODE: 'test',
      }),
    );
  } catch (error) {
    const tail = (() => {
      try {
        return readFileSync(serverLog, 'utf8').trimEnd().split('\n').slice(-30).join('\n');
      } catch {
        return '';
      }
    })();
    if (tail)
      console.log(`${color.dim(`--- last lines of ${path.relative(repoRoot, serverLog)} ---`)}\n${tail}`);
    throw error;
  } finally {
    await server?.stop('SIGINT', 15_000);
    await smtp?.service.stop('SIGTERM', 5000);
    await foodProducts?.service.stop('SIGTERM', 5000);
    rmSync(scratch, { recursive: true, force: true });
  }
}

/**
 * The integration files against the test database, with the S3 fake running: the photo files that
 * test the bucket (`photos-s3`, `photos-migrate`) make their own buckets in it (S3_* point at it;
 * PHOTO_STORAGE stays unset, so every other file uses a folder).
 */
async function integrationStage(env: NodeJS.ProcessEnv): Promise<void> {
  const scratch = mkdtempSync(path.join(os.tmpdir(), 'driftmark-s3-fake-'));
  let s3: RunningS3Fake | undefined;
  try {
    s3 = await startS3Fake({
      preferredPort: 4569,
      directory: scratch,
      logFile: path.join(reportsDir, 'integration-s3-fake.log'),
    });
    running.push(s3.service);
    await vitest('integration', { ...env, ...s3.env });
  } finally {
    await s3?.service.stop('SIGTERM', 5000);
    rmSync(scratch, { recursive: true, force: true });
  }
}

/** The reliability run with small counts (`npm run test:reliability` runs the full one). */
async function reliabilityStage(): Promise<void> {
  const results = await runReliability(
    { counts: SMALL_COUNTS, workDir: path.join(reportsDir, 'reliability-small') },
    (result) => console.log(formatResult(result)),
  );
  const failed = results.filter(scenarioFailed);
  reliabilityTotals.passed += results.length - failed.length;
  reliabilityTotals.failed += failed.length;
  if (failed.length > 0)
    throw new Error(`${failed.length} of ${results.length} reliability scenarios failed`);
}

async function main(): Promise<number> {
  const selected = parseStageArgs(process.argv.slice(2));
  const has = (name: StageName) => selected.includes(name);
  mkdirSync(reportsDir, { recursive: true });
  for (const project of ['unit', 'integration', 'e2e']) rmSync(reportFile(project), { force: true });

  let testUrl = '';
  let e2eUrl = '';
  const setup: Stage = {
    name: 'setup',
    describe: 'PostgreSQL, fresh test databases, Chromium, shared build',
    run: async () => {
      if (has('integration') || has('migration-check') || has('reliability') || has('e2e')) {
        await ensureCluster();
        if (has('integration') || has('migration-check'))
          testUrl = await ensureDatabase('driftmark_test', { fresh: true });
        if (has('e2e')) e2eUrl = await ensureDatabase('driftmark_e2e', { fresh: true });
      }
      if (has('e2e')) await ensureChromium();
      await buildShared();
    },
  };

  const integrationEnv = () =>
    appEnv({ APP_MODE: 'test', DATABASE_URL: testUrl, JWT_SECRET: jwtSecret, LOG_LEVEL: 'silent' });
  const all: Record<StageName, Stage> = {
    // Both caches live in node_modules/.cache and are keyed by file contents, so a reinstall resets them.
    lint: {
      name: 'lint',
      describe: 'eslint .',
      run: () =>
        command(node, [
          packageBin('eslint'),
          '--cache',
          '--cache-strategy',
          'content',
          '--cache-location',
          'node_modules/.cache/eslint/',
          '.',
        ]),
    },
    format: {
      name: 'format',
      describe: 'prettier --check .',
      run: () =>
        command(node, [packageBin('prettier'), '--check', '--cache', '--cache-strategy', 'content', '.']),
    },
    typecheck: {
      name: 'typecheck',
      describe: 'npm run typecheck -w <each workspace>',
      run: typecheckWorkspaces,
    },
    unit: { name: 'unit', describe: 'vitest run --project unit', run: () => vitest('unit') },
    integration: {
      name: 'integration',
      describe: 'vitest run --project integration (driftmark_test, the S3 fake)',
      run: () => integrationStage(integrationEnv()),
    },
    'migration-check': {
      name: 'migration-check',
      describe: 'api cli check-schema against driftmark_test',
      run: () => checkSchema(testUrl, jwtSecret),
    },
    reliability: {
      name: 'reliability',
      describe: `a copy of the product under writes, a database restart, kill -9 and SIGTERM (${SMALL_COUNTS.writes} writes; the full run has ${FULL_COUNTS.writes})`,
      run: reliabilityStage,
    },
    e2e: {
      name: 'e2e',
      describe: 'build, migrate + seed driftmark_e2e, server, vitest run --project e2e',
      run: () => e2eStage(e2eUrl),
    },
  };

  const results = await runStages([setup, ...selected.map((name) => all[name])]);
  const totals = vitestProjectsRun.reduce<TestTotals>(
    (sum, project) => addTotals(sum, readTotals(reportFile(project)) ?? { passed: 0, failed: 0, skipped: 0 }),
    reliabilityTotals,
  );
  console.log(`\n${formatSummary(results)}`);
  const failed = results.find((result) => result.status === 'failed');
  if (failed) {
    fail(`npm test failed at stage "${failed.name}": ${failed.error}`);
  } else {
    log(color.green(`All ${results.length} stages passed.`));
  }
  console.log(formatTotals(totals));
  return failed ? 1 : 0;
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    fail(error instanceof Error ? error.message : String(error));
    console.log(formatTotals({ passed: 0, failed: 0, skipped: 0 }));
    process.exit(1);
  },
);
