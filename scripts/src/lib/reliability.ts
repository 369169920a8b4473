/**
 * The reliability run: a copy of the product (the built API server as a child process on a free
 * port, against a fresh database in the project's own PostgreSQL cluster, mail to the SMTP fake)
 * under load while it is disturbed:
 *
 *   a. check-in writes by every demo athlete, some sent twice with the same client id, some
 *      aborted mid-request and retried;
 *   b. the same while the PostgreSQL cluster restarts (pg_ctl -m fast): 503 + Retry-After, never 500;
 *   c. kill -9 of the server during photo uploads, then a restart: files and rows agree, temp emptied;
 *   d. kill -9 during mail sending, then a restart: every queued message delivered (at least once);
 *   e. SIGTERM under load: in-flight requests answered, new ones refused, exit 0.
 *
 * Each scenario prints sent / acknowledged / present / lost / duplicated / 5xx; the run fails on a
 * loss, a duplicate where exactly once is promised (client ids, photo bytes), an orphan file or a 500.
 * `npm run test:reliability` runs FULL_COUNTS; the `reliability` stage of `npm test` SMALL_COUNTS.
 */
import { randomBytes, randomUUID } from 'node:crypto';
import { cpSync, existsSync, mkdirSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { deflateSync } from 'node:zlib';
import pg from 'pg';
import {
  apiCli,
  appEnv,
  buildShared,
  buildWorkspace,
  DEMO_PASSWORD,
  startBuiltServer,
  startSmtpFake,
  type RunningSmtpFake,
} from './app.js';
import { log } from './log.js';
import { pickFreePort } from './ports.js';
import { ensureCluster, ensureDatabase, stopCluster } from './postgres.js';
import { sleep, type Service } from './proc.js';
import { crc32, tally, type ScenarioResult, type WriteRecord } from './reliability-tally.js';
import { readAllCapturedMail } from './smtp-fake.js';
import { generateSecret } from './secrets.js';

export interface ReliabilityCounts {
  /** a: logical check-in writes. */
  writes: number;
  /** b: writes while the database restarts. */
  restartWrites: number;
  /** c: photo uploads (the kill comes after about a third are answered). */
  photos: number;
  /** d: queued e-mails (the kill comes after about a quarter are delivered). */
  mails: number;
  /** e: writes while SIGTERM arrives (after about half are answered). */
  drainWrites: number;
  /** Clients writing at once. */
  concurrency: number;
  /**
   * d: wait for the messages the killed process held (up to its 120 s lease) rather than report
   * them as awaiting their retry.
   */
  waitForHeldMail: boolean;
  /**
   * d: how long to wait after the restart for every message. A message claimed when the process
   * died goes out again once its lease (120 s) is over; a shorter wait reports such messages as
   * awaiting their retry instead of waiting for them.
   */
  mailWaitMs: number;
}

export const FULL_COUNTS: ReliabilityCounts = {
  writes: 3000,
  restartWrites: 1500,
  photos: 120,
  mails: 120,
  drainWrites: 600,
  concurrency: 16,
  mailWaitMs: 240_000,
  waitForHeldMail: true,
};

export const SMALL_COUNTS: ReliabilityCounts = {
  writes: 100,
  restartWrites: 80,
  photos: 12,
  mails: 6,
  drainWrites: 60,
  concurrency: 6,
  mailWaitMs: 15_000,
  waitForHeldMail: false,
};

const DB_NAME = 'driftmark_reliability';
/** Migrated and seeded once, then cloned for every run (the demo seed takes ~25 s). */
const BASE_DB_NAME = 'driftmark_reliability_base';
const ATHLETES = [
  'athlete@driftmark.test',
  'aroha.tane@driftmark.test',
  'priya.raman@driftmark.test',
  'hannah.kowalski@driftmark.test',
  'kenji.watanabe@driftmark.test',
  'leilani.akana@driftmark.test',
];
const DAY_MS = 86_400_000;
/** Writes land 2…(2 + SPREAD_DAYS) days before the server's today: in the past in every zone. */
const SPREAD_DAYS = 60;
/** A client gives up on one write after this long without an answer it can act on. */
const WRITE_GIVE_UP_MS = 120_000;

interface Athlete {
  email: string;
  athleteId: string;
  cookie: string;
}

interface Harness {
  baseUrl: string;
  env: NodeJS.ProcessEnv;
  server: Service;
  scratch: string;
  uploadsDir: string;
  tempRoot: string;
  mailDir: string;
  serverLog: string;
  db: pg.Pool;
  athletes: Athlete[];
  /** The server's today (from its Date header), YYYY-MM-DD in UTC. */
  today: string;
  /** Weigh-in days already used, per athlete, so no two writes aim at one (athlete, day). */
  weighInDays: Map<string, number>;
  smtp: RunningSmtpFake;
}

/** What one HTTP exchange ended as, from the client's side. */
type Outcome =
  | { kind: 'answer'; status: number; retryAfter: string | null; body: unknown }
  | { kind: 'aborted' }
  | { kind: 'network'; message: string };

/** 5xx bookkeeping shared by every client of a scenario. */
class Answers {
  serverErrors = 0;
  unavailable503 = 0;
  readonly problems: string[] = [];
  private readonly unexpected = new Map<string, number>();

  /** Records a 5xx; a 503 is acceptable only with Retry-After and the error shape. */
  record(outcome: Outcome): void {
    if (outcome.kind !== 'answer' || outcome.status < 500) return;
    this.serverErrors += 1;
    const code = (outcome.body as { error?: { code?: string } } | null)?.error?.code;
    if (outcome.status === 503 && outcome.retryAfter && code === 'db_unavailable') {
      this.unavailable503 += 1;
    } else {
      this.note(`HTTP ${outcome.status} ${code ?? ''}`.trim());
    }
  }

  note(what: string): void {
    this.unexpected.set(what, (this.unexpected.get(what) ?? 0) + 1);
  }

  apply(result: ScenarioResult): ScenarioResult {
    result.serverErrors = this.serverErrors;
    result.unavailable503 = this.unavailable503;
    for (const [what, n] of this.unexpected) result.problems.push(`${n}× ${what}`);
    result.problems.push(...this.problems);
    return result;
  }
}

async function exchange(
  h: Harness,
  method: string,
  urlPath: string,
  init: { cookie?: string; json?: unknown; form?: FormData; abortAfterMs?: number } = {},
): Promise<Outcome> {
  const controller = new AbortController();
  const timer = setTimeout(() => controller.abort(new Error('no answer within 60 s')), 60_000);
  let abortedByUs = false;
  const abortTimer =
    init.abortAfterMs !== undefined
      ? setTimeout(() => {
          abortedByUs = true;
          controller.abort();
        }, init.abortAfterMs)
      : undefined;
  try {
    const headers: Record<string, string> = { origin: h.baseUrl };
    if (init.cookie) headers.cookie = init.cookie;
    let body: string | FormData | undefined;
    if (init.json !== undefined) {
      headers['content-type'] = 'application/json';
      body = JSON.stringify(init.json);
    } else if (init.form) {
      body = init.form;
    }
    const res = await fetch(`${h.baseUrl}${urlPath}`, { method, headers, body, signal: controller.signal });
    const text = await res.text();
    let parsed: unknown = null;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      parsed = text;
    }
    return { kind: 'answer', status: res.status, retryAfter: res.headers.get('retry-after'), body: parsed };
  } catch (error) {
    if (abortedByUs) return { kind: 'aborted' };
    const cause = (error as { cause?: { code?: string; message?: string } }).cause;
    return { kind: 'network', message: cause?.code ?? cause?.message ?? (error as Error).message };
  } finally {
    clearTimeout(timer);
    if (abortTimer) clearTimeout(abortTimer);
  }
}

/** YYYY-MM-DD `daysBack` days before `today` (both UTC calendar days). */
function daysBefore(today: string, daysBack: number): string {
  return new Date(Date.parse(`${today}T00:00:00Z`) - daysBack * DAY_MS).toISOString().slice(0, 10);
}

// ---------------------------------------------------------------------------------------------
// The product copy

async function prepareDatabase(): Promise<{ url: string; uploadsTemplate: string; dataRoot: string }> {
  const cluster = await ensureCluster();
  const baseUrl = await ensureDatabase(BASE_DB_NAME);
  const uploadsTemplate = path.join(cluster.dataRoot, 'reliability', 'base-uploads');
  mkdirSync(uploadsTemplate, { recursive: true });
  const env = appEnv({
    APP_MODE: 'test',
    DATABASE_URL: baseUrl,
    JWT_SECRET: generateSecret(),
    LOG_LEVEL: 'warn',
    UPLOADS_DIR: uploadsTemplate,
  });
  // Both are quick when nothing changed: no pending migration, the demo team's dates moved to today.
  await apiCli('migrate', env);
  await apiCli('seed', env);
  await cluster.adminPsql(
    `DROP DATABASE IF EXISTS ${DB_NAME} WITH (FORCE);\n` +
      `CREATE DATABASE ${DB_NAME} TEMPLATE ${BASE_DB_NAME} OWNER driftmark;\n`,
  );
  return { url: await ensureDatabase(DB_NAME), uploadsTemplate, dataRoot: cluster.dataRoot };
}

async function startServer(h: Pick<Harness, 'env' | 'baseUrl' | 'serverLog'>): Promise<Service> {
  const server = startBuiltServer(h.env, h.serverLog);
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (server.hasExited()) throw new Error(`The API server exited while starting (see ${h.serverLog}).`);
    try {
      const res = await fetch(`${h.baseUrl}/api/health`, { signal: AbortSignal.timeout(2000) });
      if (res.ok) return server;
    } catch {
      // Not listening yet.
    }
    await sleep(200);
  }
  await server.stop('SIGKILL');
  throw new Error(`The API server did not answer its health check within 60 s (see ${h.serverLog}).`);
}

async function signIn(h: Harness, email: string): Promise<Athlete> {
  const res = await fetch(`${h.baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: h.baseUrl },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  const body = (await res.json()) as { data?: { athleteId: string | null } };
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0]!)
    .find((c) => c.startsWith('dm_session='));
  if (!res.ok || !cookie || !body.data?.athleteId) {
    throw new Error(`Sign-in of ${email} failed (HTTP ${res.status}).`);
  }
  if (!h.today) {
    const date = res.headers.get('date');
    h.today = new Date(date ? Date.parse(date) : Date.now()).toISOString().slice(0, 10);
  }
  return { email, athleteId: body.data.athleteId, cookie };
}

// ---------------------------------------------------------------------------------------------
// Check-in writes (a, b, e)

type EntryKindName = 'fluid' | 'meal' | 'weigh-in';

interface PlannedWrite {
  athlete: Athlete;
  kind: EntryKindName;
  date: string;
  key: string;
  method: 'POST' | 'PUT';
  path: string;
  body: Record<string, unknown>;
  /** Sent twice at once with the same client id. */
  duplicate: boolean;
  /** The first attempt is aborted after this many ms (then retried unless `abandon`). */
  abortAfterMs?: number;
  /** After the abort the client gives up (the write may or may not have landed). */
  abandon: boolean;
}

function planWrites(h: Harness, count: number, options: { duplicates: boolean; aborts: boolean }) {
  const writes: PlannedWrite[] = [];
  for (let i = 0; i < count; i += 1) {
    const athlete = h.athletes[i % h.athletes.length]!;
    const roll = Math.random();
    const kind: EntryKindName = roll < 0.6 ? 'fluid' : roll < 0.9 ? 'meal' : 'weigh-in';
    const minute = Math.floor(Math.random() * 24 * 60);
    const time = `${String(Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`;
    const base = `/api/athletes/${athlete.athleteId}/days`;
    const special = Math.random();
    const duplicate = options.duplicates && special < 0.15;
    const aborted = options.aborts && special >= 0.15 && special < 0.3;
    const common = {
      athlete,
      kind,
      duplicate,
      abortAfterMs: aborted ? Math.floor(Math.random() * 25) : undefined,
      abandon: aborted && Math.random() < 0.5,
    };
    if (kind === 'weigh-in') {
      // One weigh-in a day: each write gets a day of its own, and a weight that names it.
      const used = h.weighInDays.get(athlete.athleteId) ?? 0;
      h.weighInDays.set(athlete.athleteId, used + 1);
      const date = daysBefore(h.today, 2 + used);
      const weight = 60 + (i % 400) / 10;
      writes.push({
        ...common,
        date,
        key: `${athlete.athleteId}/${date}/${weight.toFixed(1)}`,
        method: 'PUT',
        path: `${base}/${date}/weigh-in`,
        body: { weight, unit: 'kg', time, protocolConfirmed: true, tags: [] },
      });
      continue;
    }
    const date = daysBefore(h.today, 2 + Math.floor(Math.random() * SPREAD_DAYS));
    const clientId = randomUUID();
    writes.push({
      ...common,
      date,
      key: clientId,
      method: 'POST',
      path: kind === 'fluid' ? `${base}/${date}/fluids` : `${base}/${date}/meals`,
      body:
        kind === 'fluid'
          ? { clientId, time, volume: 100 + Math.floor(Math.random() * 400), unit: 'ml', kind: 'water' }
          : {
              clientId,
              time,
              name: 'Reliability meal',
              source: 'macros',
              proteinG: 30,
              carbohydrateG: 40,
              fatG: 10,
            },
    });
  }
  return writes;
}

interface WriteRun {
  records: WriteRecord[];
  answers: Answers;
  /** Exchanges that ended without an answer (refused, reset), by cause. */
  networkErrors: Map<string, number>;
  aborted: number;
}

/** Sends one logical write until it is acknowledged, refused for good, or abandoned. */
async function performWrite(
  h: Harness,
  write: PlannedWrite,
  run: WriteRun,
  options: { retryNetwork: boolean },
): Promise<WriteRecord> {
  const record: WriteRecord = { key: write.key, sent: 0, acknowledged: false };
  const started = Date.now();
  const once = async (abortAfterMs?: number): Promise<Outcome> => {
    record.sent += 1;
    const outcome = await exchange(h, write.method, write.path, {
      cookie: write.athlete.cookie,
      json: write.body,
      abortAfterMs,
    });
    run.answers.record(outcome);
    if (outcome.kind === 'answer' && outcome.status < 300) record.acknowledged = true;
    if (outcome.kind === 'network')
      run.networkErrors.set(outcome.message, (run.networkErrors.get(outcome.message) ?? 0) + 1);
    if (outcome.kind === 'aborted') run.aborted += 1;
    return outcome;
  };

  let first: Promise<Outcome>;
  if (write.duplicate) {
    // The same request twice at once: the server must store it once and answer both.
    const [a, b] = await Promise.all([once(), once()]);
    first = Promise.resolve(a.kind === 'answer' && a.status < 300 ? a : b);
  } else {
    first = once(write.abortAfterMs);
  }
  let outcome = await first;
  if (outcome.kind === 'aborted' && write.abandon) return record;
  for (;;) {
    if (record.acknowledged) return record;
    if (Date.now() - started > WRITE_GIVE_UP_MS) {
      run.answers.problems.push(`a write to ${write.path} got no acknowledgement within 120 s`);
      return record;
    }
    if (outcome.kind === 'answer') {
      if (outcome.status === 503) {
        // Honour Retry-After, as a client should.
        await sleep(Number(outcome.retryAfter ?? 1) * 1000);
      } else {
        const code = (outcome.body as { error?: { code?: string } } | null)?.error?.code ?? '';
        if (outcome.status < 500) run.answers.note(`unexpected HTTP ${outcome.status} ${code}`.trim());
        return record;
      }
    } else if (outcome.kind === 'network') {
      if (!options.retryNetwork) return record;
      await sleep(250);
    }
    outcome = await once();
  }
}

/** Runs writes with `concurrency` clients; `onAcknowledged` sees the running count of acknowledged writes. */
async function runWrites(
  h: Harness,
  writes: readonly PlannedWrite[],
  concurrency: number,
  options: { retryNetwork: boolean; onAcknowledged?: (acknowledged: number) => void },
): Promise<WriteRun> {
  const run: WriteRun = { records: [], answers: new Answers(), networkErrors: new Map(), aborted: 0 };
  let next = 0;
  let acknowledged = 0;
  const client = async (): Promise<void> => {
    for (let i = next++; i < writes.length; i = next++) {
      const record = await performWrite(h, writes[i]!, run, options);
      run.records.push(record);
      if (record.acknowledged) options.onAcknowledged?.(++acknowledged);
    }
  };
  await Promise.all(Array.from({ length: concurrency }, client));
  return run;
}

/** How many rows hold each write's key, read straight from the database. */
async function rowsForWrites(h: Harness, writes: readonly PlannedWrite[]): Promise<Map<string, number>> {
  const counts = new Map<string, number>();
  const clientIds = writes.filter((w) => w.kind !== 'weigh-in').map((w) => w.key);
  for (const table of ['fluid_entries', 'meal_entries']) {
    const { rows } = await h.db.query<{ client_id: string; n: string }>(
      `SELECT client_id, count(*) AS n FROM ${table} WHERE client_id = ANY($1::uuid[]) GROUP BY client_id`,
      [clientIds],
    );
    for (const row of rows) counts.set(row.client_id, (counts.get(row.client_id) ?? 0) + Number(row.n));
  }
  const weighIns = writes.filter((w) => w.kind === 'weigh-in');
  if (weighIns.length > 0) {
    const { rows } = await h.db.query<{ athlete_id: string; local_date: string; entered_value: string }>(
      `SELECT athlete_id, to_char(local_date, 'YYYY-MM-DD') AS local_date, entered_value::text
         FROM weigh_ins WHERE athlete_id = ANY($1::uuid[])`,
      [[...new Set(weighIns.map((w) => w.athlete.athleteId))]],
    );
    for (const row of rows) {
      const key = `${row.athlete_id}/${row.local_date}/${Number(row.entered_value).toFixed(1)}`;
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
  }
  return counts;
}

function describeNetwork(run: WriteRun): string | null {
  if (run.networkErrors.size === 0) return null;
  return `no answer: ${[...run.networkErrors].map(([cause, n]) => `${n}× ${cause}`).join(', ')}`;
}

// ---------------------------------------------------------------------------------------------
// Scenarios

async function scenarioWrites(h: Harness, counts: ReliabilityCounts): Promise<ScenarioResult> {
  const writes = planWrites(h, counts.writes, { duplicates: true, aborts: true });
  const run = await runWrites(h, writes, counts.concurrency, { retryNetwork: false });
  const result = run.answers.apply(
    tally('a. writes with duplicates and aborts', run.records, await rowsForWrites(h, writes), true),
  );
  const dups = writes.filter((w) => w.duplicate).length;
  const abandoned = writes.filter((w) => w.abortAfterMs !== undefined && w.abandon).length;
  result.notes.push(
    `${counts.writes} writes by ${h.athletes.length} athletes: ${dups} sent twice at once with one client id, ` +
      `${run.aborted} attempts aborted mid-request (${abandoned} writes then abandoned, the rest retried)`,
  );
  const network = describeNetwork(run);
  if (network) result.notes.push(network);
  return result;
}

async function scenarioDatabaseRestart(h: Harness, counts: ReliabilityCounts): Promise<ScenarioResult> {
  const writes = planWrites(h, counts.restartWrites, { duplicates: true, aborts: false });
  let restart: Promise<{ downMs: number }> | undefined;
  const trigger = Math.max(1, Math.floor(counts.restartWrites / 4));
  const run = await runWrites(h, writes, counts.concurrency, {
    retryNetwork: true,
    onAcknowledged: (n) => {
      if (n !== trigger) return;
      restart = (async () => {
        const down = Date.now();
        await stopCluster();
        await sleep(1500);
        await ensureCluster();
        return { downMs: Date.now() - down };
      })();
    },
  });
  const restarted = restart ? await restart : undefined;
  const result = run.answers.apply(
    tally('b. database restart under load', run.records, await rowsForWrites(h, writes), true),
  );
  if (!restarted) result.problems.push('the database restart never happened (too few writes)');
  else result.notes.push(`PostgreSQL stopped (pg_ctl -m fast) and back after ${restarted.downMs} ms`);
  const network = describeNetwork(run);
  if (network) result.notes.push(network);
  if (h.server.hasExited()) result.problems.push('the API server died during the database restart');
  return result;
}

/** A small PNG of random noise: every upload has bytes (and a content hash) of its own. */
function noisePng(size = 48): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const head = Buffer.alloc(4);
    head.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([head, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // truecolour
  const rows: Buffer[] = [];
  for (let y = 0; y < size; y += 1) rows.push(Buffer.concat([Buffer.from([0]), randomBytes(size * 3)]));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.concat(rows))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** Every file under `dir`, as paths relative to it. */
function listFiles(dir: string): string[] {
  if (!existsSync(dir)) return [];
  const out: string[] = [];
  const walk = (sub: string) => {
    for (const entry of readdirSync(path.join(dir, sub), { withFileTypes: true })) {
      const rel = sub ? `${sub}/${entry.name}` : entry.name;
      if (entry.isDirectory()) walk(rel);
      else out.push(rel);
    }
  };
  walk('');
  return out;
}

async function scenarioPhotoKill(h: Harness, counts: ReliabilityCounts): Promise<ScenarioResult> {
  const answers = new Answers();
  const network = new Map<string, number>();
  const records: WriteRecord[] = [];
  const hashes = new Map<string, string>();
  const uploads = Array.from({ length: counts.photos }, (_, i) => {
    const png = noisePng();
    return { athlete: h.athletes[i % h.athletes.length]!, png, date: daysBefore(h.today, 2 + (i % 20)) };
  });
  let answered = 0;
  let killed: Promise<number> | undefined;
  const trigger = Math.max(1, Math.floor(counts.photos / 3));
  let next = 0;
  const client = async (): Promise<void> => {
    for (let i = next++; i < uploads.length; i = next++) {
      const upload = uploads[i]!;
      const record: WriteRecord = { key: `#${i}`, sent: 0, acknowledged: false };
      records.push(record);
      const started = Date.now();
      while (!record.acknowledged && Date.now() - started < WRITE_GIVE_UP_MS) {
        const form = new FormData();
        form.set('date', upload.date);
        form.set('pose', 'Front relaxed');
        form.set('files', new Blob([upload.png], { type: 'image/png' }), `photo-${i}.png`);
        record.sent += 1;
        const outcome = await exchange(h, 'POST', `/api/athletes/${upload.athlete.athleteId}/photos`, {
          cookie: upload.athlete.cookie,
          form,
        });
        answers.record(outcome);
        if (outcome.kind === 'answer' && outcome.status < 300) {
          record.acknowledged = true;
          const hash = (outcome.body as { data?: { contentHash?: string; id: string }[] }).data?.[0];
          if (hash) hashes.set(record.key, hash.id);
          answered += 1;
          if (answered === trigger && !killed) {
            // kill -9 while the other clients' uploads are on their way.
            killed = h.server.stop('SIGKILL').then(async () => {
              const pid = h.server.child.pid ?? 0;
              h.server = await startServer(h);
              return pid;
            });
          }
        } else if (outcome.kind === 'answer' && outcome.status !== 503) {
          answers.note(`unexpected HTTP ${outcome.status}`);
          break;
        } else {
          if (outcome.kind === 'network')
            network.set(outcome.message, (network.get(outcome.message) ?? 0) + 1);
          await sleep(250);
        }
      }
    }
  };
  await Promise.all(Array.from({ length: Math.min(4, counts.concurrency) }, client));
  const killedPid = killed ? await killed : undefined;

  // The photo ids acknowledged must be rows; each row's files must exist, every file a row's.
  const { rows } = await h.db.query<{ id: string; thumb_key: string; display_key: string; dup: string }>(
    `SELECT id, thumb_key, display_key,
            count(*) OVER (PARTITION BY athlete_id, local_date, pose, content_hash) AS dup
       FROM condition_photos`,
  );
  const byId = new Map(rows.map((r) => [r.id, r]));
  const rowCounts = new Map<string, number>();
  for (const [key, id] of hashes) {
    const row = byId.get(id);
    if (row) rowCounts.set(key, Number(row.dup));
  }
  const result = answers.apply(tally('c. kill -9 during photo uploads', records, rowCounts, true));
  const claimed = new Set(rows.flatMap((r) => [r.thumb_key, r.display_key]));
  const files = listFiles(h.uploadsDir).filter((f) => !f.startsWith('.'));
  const orphans = files.filter((f) => !claimed.has(f));
  const missing = [...claimed].filter((key) => !existsSync(path.join(h.uploadsDir, key)));
  if (orphans.length > 0)
    result.problems.push(`${orphans.length} file(s) no row claims, e.g. ${orphans.slice(0, 3).join(', ')}`);
  if (missing.length > 0) result.problems.push(`${missing.length} row file(s) missing from storage`);
  const tempLeft = listFiles(h.tempRoot);
  const deadFolder = killedPid ? path.join(h.tempRoot, `${os.hostname()}-${killedPid}`) : null;
  if (deadFolder && existsSync(deadFolder))
    result.problems.push(`the killed server's temp folder is still there (${deadFolder})`);
  if (tempLeft.length > 0) result.problems.push(`${tempLeft.length} file(s) left in the upload temp folder`);
  if (!killedPid) result.problems.push('the kill never happened (too few uploads)');
  result.notes.push(
    `server killed (pid ${killedPid ?? '?'}) after ${trigger} answered uploads and started again; ` +
      `${files.length} files for ${rows.length} photo rows, ${orphans.length} orphans, ` +
      `${missing.length} missing, temp folder ${tempLeft.length === 0 ? 'empty' : 'not empty'}`,
  );
  if (network.size > 0)
    result.notes.push(`no answer: ${[...network].map(([c, n]) => `${n}× ${c}`).join(', ')}`);
  return result;
}

async function scenarioMailKill(h: Harness, counts: ReliabilityCounts): Promise<ScenarioResult> {
  const answers = new Answers();
  const startedAt = new Date(Date.now() - 1000);
  const records: WriteRecord[] = [];
  // Reset requests for every demo account: each queues one e-mail in the outbox.
  const emails = ['coach@driftmark.test', 'assistant@driftmark.test', ...ATHLETES];
  let next = 0;
  const client = async (): Promise<void> => {
    for (let i = next++; i < counts.mails; i = next++) {
      const record: WriteRecord = { key: `#${i}`, sent: 1, acknowledged: false };
      records.push(record);
      const outcome = await exchange(h, 'POST', '/api/auth/forgot-password', {
        json: { email: emails[i % emails.length] },
      });
      answers.record(outcome);
      if (outcome.kind === 'answer' && outcome.status < 300) record.acknowledged = true;
      else
        answers.note(`forgot-password answered ${outcome.kind === 'answer' ? outcome.status : outcome.kind}`);
    }
  };
  await Promise.all(Array.from({ length: counts.concurrency }, client));

  // kill -9 once about a quarter has gone out, at a moment a message is being sent.
  const target = Math.max(1, Math.floor(counts.mails / 4));
  const deadline = Date.now() + 60_000;
  let delivered = 0;
  let sending = 0;
  while (Date.now() < deadline) {
    const { rows } = await h.db.query<{ sent: string; sending: string }>(
      `SELECT count(*) FILTER (WHERE status = 'sent') AS sent,
              count(*) FILTER (WHERE status = 'sending') AS sending
         FROM outbox_messages WHERE created_at >= $1`,
      [startedAt],
    );
    delivered = Number(rows[0]!.sent);
    sending = Number(rows[0]!.sending);
    if (delivered >= target && sending > 0) break;
    await sleep(20);
  }
  await h.server.stop('SIGKILL');
  h.server = await startServer(h);

  // Wait for every message queued by this scenario to be sent (or for the wait to end). What the
  // killed process held when it died (a row it had claimed, `sending` with its lease running, or a
  // job it had fetched, pg-boss `active` until it expires) goes out again once the lease or the
  // job's expiry (120 s) is over; a short run (the npm test stage) reports those instead.
  const waitUntil = Date.now() + counts.mailWaitMs;
  type Row = { id: string; message_id: string; status: string; attempts: number; sending_until: Date | null };
  let queued: Row[];
  const heldUntil = async (rows: readonly Row[]): Promise<Map<string, Date>> => {
    const { rows: jobs } = await h.db.query<{ outbox_id: string; until: Date }>(
      `SELECT data->>'outboxId' AS outbox_id, expire_in + started_on AS until
         FROM pgboss.job WHERE name = 'mail-send' AND state = 'active'`,
    );
    const jobUntil = new Map(jobs.map((j) => [j.outbox_id, j.until]));
    const held = new Map<string, Date>();
    for (const row of rows) {
      if (row.status === 'sent') continue;
      const lease = row.status === 'sending' && row.sending_until && row.sending_until > new Date();
      const until = lease ? row.sending_until : jobUntil.get(row.id);
      if (until) held.set(row.id, until);
    }
    return held;
  };
  let held = new Map<string, Date>();
  for (;;) {
    ({ rows: queued } = await h.db.query<Row>(
      `SELECT id, message_id, status, attempts, sending_until FROM outbox_messages WHERE created_at >= $1`,
      [startedAt],
    ));
    held = await heldUntil(queued);
    const open = queued.filter((r) => r.status !== 'sent');
    if (open.length === 0 || Date.now() > waitUntil) break;
    if (!counts.waitForHeldMail && open.every((r) => held.has(r.id))) break;
    await sleep(500);
  }
  await sleep(500);
  const captured = await readAllCapturedMail(h.mailDir);
  const receivedById = new Map<string, number>();
  for (const mail of captured)
    if (mail.messageId) receivedById.set(mail.messageId, (receivedById.get(mail.messageId) ?? 0) + 1);

  const rowCounts = new Map<string, number>();
  const mailRecords: WriteRecord[] = queued.map((row) => ({
    key: row.message_id,
    sent: 1,
    acknowledged: true,
  }));
  for (const row of queued) rowCounts.set(row.message_id, receivedById.get(row.message_id) ?? 0);
  const awaiting = queued
    .filter((r) => held.has(r.id) && (receivedById.get(r.message_id) ?? 0) === 0)
    .map((row) => ({ row, until: held.get(row.id)! }));
  const awaitingIds = new Set(awaiting.map((a) => a.row.id));
  const present = new Map(
    queued.map((r) => [r.message_id, awaitingIds.has(r.id) ? 1 : (rowCounts.get(r.message_id) ?? 0)]),
  );
  const result = answers.apply(tally('d. kill -9 during mail sending', mailRecords, present, false));
  result.sent = records.reduce((n, r) => n + r.sent, 0);
  const repeats = [...rowCounts.values()].filter((n) => n > 1).length;
  result.notes.push(
    `${records.filter((r) => r.acknowledged).length} reset requests acknowledged, ${queued.length} messages ` +
      `queued; server killed with ${delivered} sent and ${sending} being sent, started again; ` +
      `acknowledged = queued, present = delivered to the SMTP fake (by Message-ID)`,
  );
  result.notes.push(
    repeats > 0
      ? `${repeats} message(s) delivered twice with the same Message-ID: at least once, as designed ` +
          `(a message the SMTP server accepted before the kill let it be marked sent)`
      : 'no message delivered twice (delivery is at least once: a send cut by a kill after the ' +
          'SMTP server accepted it would repeat, with the same Message-ID)',
  );
  if (awaiting.length > 0) {
    result.notes.push(
      `${awaiting.length} message(s) held by the killed process and not received within this run's ` +
        `wait of ${Math.round(counts.mailWaitMs / 1000)} s: counted present, they go out again at ` +
        `${awaiting.map((a) => `${a.until.toISOString().slice(11, 19)} (${a.row.status}, attempts ${a.row.attempts})`).join(', ')}`,
    );
  }
  const notSent = queued.filter((r) => r.status !== 'sent' && !awaitingIds.has(r.id));
  if (notSent.length > 0)
    result.problems.push(
      `${notSent.length} message(s) not sent: ${notSent
        .slice(0, 5)
        .map((r) => `${r.status} after ${r.attempts} attempt(s)`)
        .join(', ')}`,
    );
  return result;
}

async function scenarioSigterm(h: Harness, counts: ReliabilityCounts): Promise<ScenarioResult> {
  const writes = planWrites(h, counts.drainWrites, { duplicates: false, aborts: false });
  let termAt = 0;
  let exit: Promise<{ code: number | null; signal: NodeJS.Signals | null; ms: number }> | undefined;
  const trigger = Math.max(1, Math.floor(counts.drainWrites / 2));
  const run = await runWrites(h, writes, counts.concurrency, {
    retryNetwork: false,
    onAcknowledged: (n) => {
      if (n !== trigger) return;
      termAt = Date.now();
      process.kill(h.server.child.pid!, 'SIGTERM');
      exit = h.server.exited.then((e) => ({ ...e, ms: Date.now() - termAt }));
    },
  });
  const exited = exit ? await exit : undefined;
  const result = run.answers.apply(
    tally('e. SIGTERM under load', run.records, await rowsForWrites(h, writes), true),
  );
  // Every write the server saved must have been answered: a request cut after its commit would be
  // present without an acknowledgement (no retries here, so nothing else explains one).
  if (result.present > result.acknowledged)
    result.problems.push(`${result.present - result.acknowledged} write(s) saved but never answered`);
  if (!exited) result.problems.push('SIGTERM was never sent (too few writes)');
  else if (exited.code !== 0)
    result.problems.push(`the server exited with ${exited.signal ?? `code ${exited.code}`} after SIGTERM`);
  else
    result.notes.push(
      `SIGTERM after ${trigger} acknowledged writes; the server exited 0 after ${exited.ms} ms`,
    );
  const network = describeNetwork(run);
  result.notes.push(
    `after SIGTERM: ${run.records.filter((r) => !r.acknowledged).length} writes not acknowledged ` +
      `(refused or closed: ${network ?? 'none'})`,
  );
  return result;
}

// ---------------------------------------------------------------------------------------------

export interface ReliabilityOptions {
  counts: ReliabilityCounts;
  /** Where the server log and the scratch folders go. */
  workDir: string;
}

/** Runs every scenario in order and returns their results (the caller prints and judges them). */
export async function runReliability(
  options: ReliabilityOptions,
  onResult: (result: ScenarioResult) => void,
): Promise<ScenarioResult[]> {
  const { counts } = options;
  await buildShared();
  await buildWorkspace('api');
  const { url, uploadsTemplate } = await prepareDatabase();

  const scratch = options.workDir;
  rmSync(scratch, { recursive: true, force: true });
  const uploadsDir = path.join(scratch, 'uploads');
  const tempDir = path.join(scratch, 'tmp');
  const mailDir = path.join(scratch, 'mail');
  mkdirSync(tempDir, { recursive: true });
  mkdirSync(mailDir, { recursive: true });
  // The demo photos of the template database, without the mark naming that database.
  cpSync(uploadsTemplate, uploadsDir, { recursive: true });
  rmSync(path.join(uploadsDir, '.driftmark-database'), { force: true });
  const serverLog = path.join(scratch, 'server.log');

  const port = await pickFreePort(3200);
  const smtp = await startSmtpFake({
    preferredPort: 2700,
    captureDir: mailDir,
    exclude: [port],
    logFile: serverLog,
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  const env = appEnv({
    APP_MODE: 'test',
    HOST: '127.0.0.1',
    PORT: String(port),
    APP_ORIGIN: baseUrl,
    EXTRA_ORIGINS: undefined,
    DATABASE_URL: url,
    JWT_SECRET: generateSecret(),
    LOG_LEVEL: 'warn',
    SMTP_URL: smtp.url,
    MAIL_CAPTURE_DIR: mailDir,
    UPLOADS_DIR: uploadsDir,
    WEB_DIST: path.join(scratch, 'no-web'),
    // The upload temp folders live under os.tmpdir(): ours alone, so the check sees only this server.
    TMPDIR: tempDir,
    SIGN_IN_RATE_LIMIT: '100000',
    RESET_RATE_LIMIT: '100000',
    ADDRESS_RATE_LIMIT: '100000',
    SESSION_TTL_MINUTES: '600',
  });
  const db = new pg.Pool({ connectionString: url, max: 2 });
  // The pool outlives the database restart of scenario b: a dropped idle client is not an error here.
  db.on('error', () => undefined);
  const partial = { env, baseUrl, serverLog };
  const h: Harness = {
    ...partial,
    server: await startServer(partial),
    scratch,
    uploadsDir,
    tempRoot: path.join(tempDir, 'driftmark-uploads'),
    mailDir,
    db,
    athletes: [],
    today: '',
    weighInDays: new Map(),
    smtp,
  };
  log(`Reliability copy on ${baseUrl} (database ${DB_NAME}, log ${serverLog}).`);
  const results: ScenarioResult[] = [];
  try {
    for (const email of ATHLETES) h.athletes.push(await signIn(h, email));
    const scenarios = [
      scenarioWrites,
      scenarioDatabaseRestart,
      scenarioPhotoKill,
      scenarioMailKill,
      scenarioSigterm,
    ];
    for (const scenario of scenarios) {
      const started = Date.now();
      const result = await scenario(h, counts);
      result.notes.push(`took ${((Date.now() - started) / 1000).toFixed(1)} s`);
      results.push(result);
      onResult(result);
    }
  } finally {
    await h.server.stop('SIGKILL');
    await smtp.service.stop('SIGTERM', 5000);
    await db.end().catch(() => undefined);
    // The cluster must be up for whatever runs next (scenario b stops it).
    await ensureCluster();
  }
  // The photo and mail folders and the server log stay for a look; the temp folder is checked empty.
  rmSync(tempDir, { recursive: true, force: true });
  return results;
}
