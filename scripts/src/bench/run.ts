/**
 * `npm run bench`: every line of the speed table (issue 13) against its reference, measured in the
 * same run on this machine, REPS repetitions each, the median printed. Not a test: it asserts
 * nothing, prints the table and writes it as JSON and Markdown under <data>/bench/.
 *
 * BENCH_REPS (default 3) and BENCH_WRITE_SECONDS (default 5) shorten a trial run.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { FIRST_ROUTE_BUDGET_GZIP_BYTES, measureFirstRoutes } from '../../../web/budget.js';
import { color, log } from '../lib/log.js';
import { repoPath } from '../lib/paths.js';
import { openBrowserBench, CPU_THROTTLING, type PageLoad } from './browser.js';
import { BENCH_PASSWORD } from './data.js';
import { healthIdle, healthUnderSignIns, SIGN_INS } from './health.js';
import { closeAgent, signIn } from './http.js';
import { bareSharp, makePhoto, uploadThroughRoute } from './photo.js';
import { openPhotoStorageBench, PHOTO_EDGE, phonePhoto, summarize } from './photo-storage.js';
import { openReadBench, type ReadFigures, type SqlFigures } from './reads.js';
import { setUpBench } from './setup.js';
import { median, medianOf, repeat } from './stats.js';
import { openWriteBench, type LoadFigures, type WriteKind } from './writes.js';

const REPS = Number(process.env.BENCH_REPS ?? 3);
const WRITE_SECONDS = Number(process.env.BENCH_WRITE_SECONDS ?? 5);
const CONNECTION_LEVELS = [20, 50];

export interface Line {
  what: string;
  measured: string;
  reference: string;
  ratio: string;
  goal: string;
  /** null: the line has no goal of its own. */
  met: boolean | null;
  figures: Record<string, unknown>;
}

const ms = (n: number) => (n >= 1000 ? `${(n / 1000).toFixed(2)} s` : `${n.toFixed(1)} ms`);
const kB = (n: number) =>
  n >= 1_000_000 ? `${(n / 1_000_000).toFixed(2)} MB` : `${(n / 1000).toFixed(1)} kB`;
/** A ratio with two significant figures below 0.1 (0.0047 ×), else one or two decimals. */
const x = (n: number) => `${n >= 10 ? n.toFixed(1) : n >= 0.1 ? n.toFixed(2) : n.toPrecision(2)} ×`;
const rate = (n: number) => `${Math.round(n).toLocaleString('en-US')}/s`;

function shiftDays(date: string, days: number): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

function machine(pgVersion: string) {
  const cpus = os.cpus();
  return {
    cores: cpus.length,
    cpu: cpus[0]?.model.trim() ?? 'unknown',
    ramGB: Math.round((os.totalmem() / 1024 ** 3) * 10) / 10,
    node: process.version,
    postgres: pgVersion,
    os: `${os.type()} ${os.release()}`,
    loadAverageAtStart: os.loadavg().map((n) => Math.round(n * 100) / 100),
  };
}

export function renderTable(lines: readonly Line[]): string {
  const header = ['what', 'measured', 'reference', 'ratio', 'goal', 'met?'];
  const rows = lines.map((l) => [
    l.what,
    l.measured,
    l.reference,
    l.ratio,
    l.goal,
    l.met === null ? '—' : l.met ? 'yes' : 'no',
  ]);
  return [header, header.map(() => '---'), ...rows].map((r) => `| ${r.join(' | ')} |`).join('\n');
}

async function main(): Promise<void> {
  const startedAt = new Date();
  const env = await setUpBench(log);
  const lines: Line[] = [];
  const add = (line: Line) => {
    lines.push(line);
    const met = line.met === null ? '' : line.met ? color.green(' met') : color.red(' missed');
    log(`${line.what}: ${line.measured} vs ${line.reference} (${line.ratio})${met}`);
  };
  const today = new Date().toISOString().slice(0, 10);
  const { data } = env;

  try {
    // 1. First-screen JavaScript, from the build's manifest (raw, gzip, brotli) and as served.
    const routes = measureFirstRoutes(repoPath('web', 'dist'));
    const browser = await openBrowserBench(env.baseUrl, {
      email: 'athlete@driftmark.test',
      password: BENCH_PASSWORD,
    });
    let signInLoads: PageLoad[];
    let todayLoads: PageLoad[];
    try {
      signInLoads = await repeat(REPS, () => browser.signInPage());
      todayLoads = await repeat(REPS, () => browser.today());
    } finally {
      await browser.close();
    }
    const worst = routes.reduce((a, b) => (b.gzip > a.gzip ? b : a));
    const served = todayLoads.at(-1)!;
    // The build precompresses files over 1 kB only (web/vite.config.ts); smaller ones go as they are.
    const compressed = served.largestUncompressedScript <= 1024;
    add({
      what: 'JavaScript the first screen loads (sign-in / Today)',
      measured:
        routes.map((r) => `${r.route} ${kB(r.raw)} raw, ${kB(r.gzip)} gzip, ${kB(r.brotli)} br`).join('; ') +
        `; Today as served: ${kB(served.scriptWireBytes)} on the wire in ${served.scriptFiles} files ` +
        `(${served.scriptEncodings.join(', ')}; largest uncompressed ${kB(served.largestUncompressedScript)})`,
      reference: `goal ${kB(FIRST_ROUTE_BUDGET_GZIP_BYTES)} gzip`,
      ratio: x(worst.gzip / FIRST_ROUTE_BUDGET_GZIP_BYTES),
      goal: '≤ 150 kB gzip for sign-in and Today, sent compressed',
      met: routes.every((r) => r.gzip <= FIRST_ROUTE_BUDGET_GZIP_BYTES) && compressed,
      figures: { routes, servedToday: served, servedSignIn: signInLoads.at(-1) },
    });

    // 2. Today after sign-in, CPU slowed 4 ×, against the sign-in page alone.
    const fp = medianOf(todayLoads, (l) => l.firstPaintMs);
    const fcp = medianOf(todayLoads, (l) => l.firstContentfulPaintMs);
    const idle = medianOf(todayLoads, (l) => l.idleMs);
    const signInFcp = medianOf(signInLoads, (l) => l.firstContentfulPaintMs);
    add({
      what: `Today after sign-in, CPU throttled ${CPU_THROTTLING} ×`,
      measured: `first paint ${ms(fp)}, FCP ${ms(fcp)}, idle ${ms(idle)}`,
      reference: `sign-in page alone: FCP ${ms(signInFcp)}, idle ${ms(medianOf(signInLoads, (l) => l.idleMs))}`,
      ratio: x(fcp / signInFcp),
      // Judged on the first contentful paint: the first paint alone is the empty page's background.
      goal: 'first (contentful) paint ≤ 1.0 s',
      met: fcp <= 1000,
      figures: { today: todayLoads, signIn: signInLoads },
    });

    // 3. A 24-megapixel photo through the route against bare sharp.
    // First of the server-side lines: the peak memory rise is read against a server not yet grown by loads.
    const historyCookie = await signIn(env.baseUrl, data.history.athleteEmail, BENCH_PASSWORD);
    const photo = await makePhoto();
    const uploads = await repeat(REPS, () =>
      uploadThroughRoute({
        baseUrl: env.baseUrl,
        cookie: historyCookie,
        athleteId: data.history.athleteId,
        date: today,
        photo,
        apiPid: env.server.child.pid!,
      }),
    );
    const sharpMs = await repeat(REPS, () => bareSharp(photo));
    const routeMs = medianOf(uploads, (u) => u.ms);
    const rise = medianOf(uploads, (u) => u.rssRiseBytes);
    add({
      what: `24-megapixel photo through the route (${kB(photo.length)} JPEG)`,
      measured: `${ms(routeMs)}, peak memory rise ${kB(rise)}`,
      reference: `bare sharp making the same outputs: ${ms(median(sharpMs))}`,
      ratio: `${x(routeMs / median(sharpMs))} (spread ${Math.min(...uploads.map((u) => u.ms / median(sharpMs))).toFixed(2)}–${Math.max(...uploads.map((u) => u.ms / median(sharpMs))).toFixed(2)})`,
      goal: '≤ 1.2 ×, peak memory rise ≤ 150 MB',
      met: routeMs / median(sharpMs) <= 1.2 && rise <= 150_000_000,
      figures: { uploads, sharpMs, photoBytes: photo.length },
    });

    // 3b. Upload and read latency with the files in a bucket (the S3 fake) against the folder.
    const storageBench = await openPhotoStorageBench({
      serverEnv: env.serverEnv,
      outDir: env.outDir,
      exclude: [Number(new URL(env.baseUrl).port)],
    });
    try {
      const phone = await phonePhoto(photo);
      const storage = await storageBench.run({
        folderBaseUrl: env.baseUrl,
        email: data.history.athleteEmail,
        password: BENCH_PASSWORD,
        athleteId: data.history.athleteId,
        today,
        uploads: Math.max(4 * REPS, 8),
        reads: Math.max(20 * REPS, 40),
        photo: phone,
      });
      const folder = summarize(storage.folder);
      const s3 = summarize(storage.s3);
      add({
        what: `photo upload, ${PHOTO_EDGE} px JPEG (${kB(phone.length)}), files in the S3 fake's bucket`,
        measured: `${ms(s3.upload)} (median of ${storage.s3.uploadMs.length})`,
        reference: `files in the folder: ${ms(folder.upload)}`,
        ratio: x(s3.upload / folder.upload),
        goal: 'none: the figure for deciding',
        met: null,
        figures: { uploadMs: { s3: storage.s3.uploadMs, folder: storage.folder.uploadMs } },
      });
      add({
        what: "photo read (display size, whole body), files in the S3 fake's bucket",
        measured: `p50 ${ms(s3.read)}, p95 ${ms(s3.readP95)} (${storage.s3.readMs.length} reads)`,
        reference: `files in the folder: p50 ${ms(folder.read)}, p95 ${ms(folder.readP95)}`,
        ratio: x(s3.read / folder.read),
        goal: 'none: the figure for deciding',
        met: null,
        figures: { readMs: { s3: storage.s3.readMs, folder: storage.folder.readMs } },
      });
    } finally {
      await storageBench.stop();
    }

    // 4. The trend over 3 years and 6 weeks, and the roster and queue of 150 athletes.
    const rosterCookie = await signIn(env.baseUrl, data.roster.coachEmail, BENCH_PASSWORD);
    const reads = await openReadBench({
      baseUrl: env.baseUrl,
      databaseUrl: env.databaseUrl,
      historyAthleteId: data.history.athleteId,
      historyCookie,
      rosterCookie,
      rosterTeamId: data.roster.teamId,
      rosterAthleteIds: data.roster.athletes.map((a) => a.id),
      rosterFrom: shiftDays(today, -13),
      today,
    });
    try {
      const trendLine = async (label: string, days: number, samples: number, goal: number) => {
        const from = shiftDays(today, -(days - 1));
        const api: ReadFigures[] = [];
        const sql: SqlFigures[] = [];
        for (let rep = 0; rep < REPS; rep += 1) {
          api.push(await reads.trendApi(from, today, samples));
          sql.push(await reads.trendSql(from, today, samples));
        }
        const a = medianOf(api, (f) => f.p50Ms);
        const s = medianOf(sql, (f) => f.p50Ms);
        const last = api.at(-1)!;
        add({
          what: `trend over ${label} (${days.toLocaleString('en-US')} days)`,
          measured: `${ms(a)}, ${kB(last.bytes)} JSON (${kB(last.wireBytes)} ${last.encoding}), ${last.statements} statements`,
          reference: `raw SQL fetching the same ${sql.at(-1)!.rows.toLocaleString('en-US')} rows: ${ms(s)}`,
          ratio: x(a / s),
          goal: `≤ ${goal} ×`,
          met: a / s <= goal,
          figures: { api, sql },
        });
      };
      await trendLine('3 years', 1096, 5, 3);
      await trendLine('6 weeks', 42, 20, 2);

      const rosterApi: ReadFigures[] = [];
      const queueApi: ReadFigures[] = [];
      const rosterSql: SqlFigures[] = [];
      for (let rep = 0; rep < REPS; rep += 1) {
        rosterApi.push(await reads.rosterApi(10));
        queueApi.push(await reads.queueApi(10));
        rosterSql.push(await reads.rosterSql(10));
      }
      const sqlP50 = medianOf(rosterSql, (f) => f.p50Ms);
      for (const [label, figures] of [
        ['roster', rosterApi],
        ['review queue', queueApi],
      ] as const) {
        const p50 = medianOf(figures, (f) => f.p50Ms);
        const p95 = medianOf(figures, (f) => f.p95Ms);
        add({
          what: `${label}, ${data.roster.athletes.length} athletes × 1 year`,
          measured: `p50 ${ms(p50)}, p95 ${ms(p95)}, ${figures.at(-1)!.statements} statements, ${kB(figures.at(-1)!.bytes)} JSON`,
          reference: `raw SQL of the same ${rosterSql.at(-1)!.rows.toLocaleString('en-US')} rows (14-day window): p50 ${ms(sqlP50)}`,
          ratio: x(p50 / sqlP50),
          goal: 'p95 ≤ 250 ms',
          met: p95 <= 250,
          figures: { api: figures, sql: rosterSql },
        });
      }
    } finally {
      await reads.close();
    }

    // 5. Writes under load against pgbench's single-row write.
    const writes = await openWriteBench({
      baseUrl: env.baseUrl,
      databaseUrl: env.databaseUrl,
      pgBinDir: env.pgBinDir,
      athletes: data.roster.athletes,
      password: BENCH_PASSWORD,
      today,
    });
    try {
      for (const kind of ['fluid', 'weigh-in'] as WriteKind[]) {
        const statements = await writes.statementsPerWrite(kind);
        for (const connections of CONNECTION_LEVELS) {
          const api: LoadFigures[] = [];
          const ref: LoadFigures[] = [];
          for (let rep = 0; rep < REPS; rep += 1) {
            api.push(await writes.api(kind, connections, WRITE_SECONDS));
            ref.push(await writes.pgbench(kind, connections, WRITE_SECONDS));
          }
          const rps = medianOf(api, (f) => f.reqPerSec);
          const tps = medianOf(ref, (f) => f.reqPerSec);
          const failed = api.reduce((n, f) => n + f.failed, 0);
          add({
            what: `one ${kind} write, ${connections} connections`,
            measured:
              `${rate(rps)}, p50 ${ms(medianOf(api, (f) => f.p50Ms))}, ${statements} SQL statements per write` +
              (failed > 0 ? `, ${failed} failed` : ''),
            reference: `pgbench single-row ${kind === 'fluid' ? 'insert' : 'upsert'}: ${rate(tps)}, p50 ${ms(medianOf(ref, (f) => f.p50Ms))}`,
            ratio: x(rps / tps),
            goal: '≥ 0.1 ×, ≤ 5 statements per write',
            met: rps / tps >= 0.1 && statements <= 5,
            figures: { statements, api, pgbench: ref },
          });
        }
      }
    } finally {
      await writes.cleanUp();
    }

    // 6. /api/health while sign-ins run, against idle.
    const idleHealth = await repeat(REPS, () => healthIdle(env.baseUrl));
    const loaded = await repeat(REPS, () => healthUnderSignIns(env.baseUrl, BENCH_PASSWORD));
    const p99 = medianOf(loaded, (f) => f.p99Ms);
    const idleP99 = medianOf(idleHealth, (f) => f.p99Ms);
    add({
      what: `/api/health while ${SIGN_INS} sign-ins run`,
      measured: `p99 ${ms(p99)}, p50 ${ms(medianOf(loaded, (f) => f.p50Ms))}`,
      reference: `idle: p99 ${ms(idleP99)}`,
      ratio: x(p99 / idleP99),
      goal: 'p99 ≤ 50 ms',
      met: p99 <= 50,
      figures: { idle: idleHealth, underSignIns: loaded },
    });
  } finally {
    closeAgent();
    await env.stop();
  }

  const finishedAt = new Date();
  const result = {
    startedAt: startedAt.toISOString(),
    finishedAt: finishedAt.toISOString(),
    seconds: Math.round((finishedAt.getTime() - startedAt.getTime()) / 1000),
    repetitions: REPS,
    machine: machine(env.pgVersion),
    data: { rows: data.rows, historyDays: data.history.days, rosterAthletes: data.roster.athletes.length },
    lines,
  };
  const table = renderTable(lines);
  mkdirSync(env.outDir, { recursive: true });
  const jsonFile = path.join(env.outDir, 'latest.json');
  const mdFile = path.join(env.outDir, 'latest.md');
  writeFileSync(jsonFile, `${JSON.stringify(result, null, 2)}\n`);
  const m = result.machine;
  writeFileSync(
    mdFile,
    `${table}\n\nMachine: ${m.cores} cores (${m.cpu}), ${m.ramGB} GB RAM, Node ${m.node}, PostgreSQL ${m.postgres}, ` +
      `${m.os}; load average at start ${m.loadAverageAtStart.join(' / ')}. Median of ${REPS}; run took ${result.seconds} s.\n`,
  );
  console.log(`\n${table}\n`);
  log(`Written ${jsonFile} and ${mdFile} (${result.seconds} s).`);
}

export async function runBench(): Promise<void> {
  await main();
}
