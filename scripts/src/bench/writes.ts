/**
 * One fluid write and one weigh-in write under concurrent connections (autocannon, in this process)
 * against the same single-row write done by pgbench on the same cluster and database:
 *
 * - fluid: POST …/days/:date/fluids (a new entry, its own clientId each time) vs
 *   INSERT INTO fluid_entries … VALUES (…);
 * - weigh-in: PUT …/days/:date/weigh-in vs INSERT INTO weigh_ins … ON CONFLICT (athlete, date) DO UPDATE.
 *
 * The API's requests go round 20 roster athletes (each signed in once) over the last 60 days, so no
 * single day grows long; pgbench writes for a 21st athlete, and its rows are removed after each run. Statements per write: the API's own count (X-Db-Statements, the counter of
 * STATEMENT_COUNT_HEADER=1: every statement TypeORM sends, BEGIN and COMMIT included) for one write
 * sent alone, the fewest of three.
 */
import { randomUUID } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import pg from 'pg';
import { run } from '../lib/proc.js';
import { expectStatus, json, request, signIn } from './http.js';
import { percentile } from './stats.js';

export type WriteKind = 'fluid' | 'weigh-in';

export interface LoadFigures {
  reqPerSec: number;
  p50Ms: number;
  p99Ms: number;
  ok: number;
  failed: number;
}

const WRITERS = 20;
const SPREAD_DAYS = 60;
/** The pgbench rows carry this clock time, so they are removed afterwards. */
const PGBENCH_MARK_TIME = '00:01';

function shiftDays(today: string, days: number): string {
  const d = new Date(`${today}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() - days);
  return d.toISOString().slice(0, 10);
}

/**
 * Waits until the API has worked off what a load left queued (autocannon stops sending, the server
 * still answers what it had accepted): five health checks in a row under 50 ms, or 60 s.
 */
async function settle(baseUrl: string): Promise<void> {
  const deadline = Date.now() + 60_000;
  let fast = 0;
  while (fast < 5 && Date.now() < deadline) {
    const res = await request(baseUrl, { path: '/api/health' });
    fast = res.ms < 50 ? fast + 1 : 0;
    if (fast === 0) await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

export interface WriteBench {
  api(kind: WriteKind, connections: number, seconds: number): Promise<LoadFigures>;
  pgbench(kind: WriteKind, connections: number, seconds: number): Promise<LoadFigures>;
  statementsPerWrite(kind: WriteKind): Promise<number>;
  cleanUp(): Promise<void>;
}

export async function openWriteBench(options: {
  baseUrl: string;
  databaseUrl: string;
  pgBinDir: string;
  athletes: { id: string; email: string }[];
  password: string;
  /** The athletes' today (their zone is UTC). */
  today: string;
}): Promise<WriteBench> {
  const writers = options.athletes.slice(0, WRITERS);
  // pgbench writes for an athlete of its own, so its rows never crowd the API's days.
  const pgbenchAthlete = options.athletes[WRITERS];
  if (!pgbenchAthlete) throw new Error(`The write bench needs ${WRITERS + 1} athletes.`);
  const cookies: string[] = [];
  for (const a of writers) cookies.push(await signIn(options.baseUrl, a.email, options.password));

  const write = (kind: WriteKind, i: number) => {
    const w = i % writers.length;
    const date = shiftDays(options.today, Math.floor(i / writers.length) % SPREAD_DAYS);
    const base = `/api/athletes/${writers[w]!.id}/days/${date}`;
    const headers = { cookie: cookies[w]!, origin: options.baseUrl };
    if (kind === 'fluid') {
      const body = json({ clientId: randomUUID(), time: '10:30', volume: 250, unit: 'ml', kind: 'water' });
      return {
        method: 'POST' as const,
        path: `${base}/fluids`,
        headers: { ...headers, ...body.headers },
        body: body.body,
      };
    }
    const weight = 70 + (i % 200) / 10;
    const body = json({ weight, unit: 'kg', time: '07:05', protocolConfirmed: true });
    return {
      method: 'PUT' as const,
      path: `${base}/weigh-in`,
      headers: { ...headers, ...body.headers },
      body: body.body,
    };
  };

  const removePgbenchRows = async (): Promise<void> => {
    const db = new pg.Client({ connectionString: options.databaseUrl });
    await db.connect();
    try {
      await db.query(`DELETE FROM fluid_entries WHERE local_time = $1`, [PGBENCH_MARK_TIME]);
      await db.query(`DELETE FROM weigh_ins WHERE local_time = $1`, [PGBENCH_MARK_TIME]);
    } finally {
      await db.end();
    }
  };

  let sequence = 0;
  const url = new URL(options.databaseUrl);
  const pgEnv = {
    ...process.env,
    PGHOST: url.hostname,
    PGPORT: url.port,
    PGUSER: decodeURIComponent(url.username),
    PGPASSWORD: decodeURIComponent(url.password),
    PGDATABASE: url.pathname.slice(1),
  };

  return {
    async api(kind, connections, seconds) {
      const result = await autocannon({
        url: options.baseUrl,
        connections,
        duration: seconds,
        requests: [
          {
            setupRequest: (req) => ({ ...req, ...write(kind, sequence++) }),
          },
        ],
      });
      const ok = result['2xx'];
      await settle(options.baseUrl);
      return {
        reqPerSec: ok / result.duration,
        p50Ms: result.latency.p50,
        p99Ms: result.latency.p99,
        ok,
        failed: result.non2xx + result.errors,
      };
    },

    async pgbench(kind, connections, seconds) {
      const dir = mkdtempSync(path.join(tmpdir(), 'driftmark-pgbench-'));
      try {
        const athlete = pgbenchAthlete.id;
        const script =
          kind === 'fluid'
            ? `\\set d random(0, ${SPREAD_DAYS - 1})
INSERT INTO fluid_entries (athlete_id, local_date, local_time, logged_at, client_id, volume_ml, entered_value, entered_unit, kind) VALUES ('${athlete}', current_date - :d, '${PGBENCH_MARK_TIME}', now(), gen_random_uuid(), 250, 250, 'ml', 'water');
`
            : `\\set d random(${SPREAD_DAYS}, ${SPREAD_DAYS + 299})
INSERT INTO weigh_ins (athlete_id, local_date, local_time, logged_at, weight_kg, entered_value, entered_unit, protocol_confirmed) VALUES ('${athlete}', current_date - :d, '${PGBENCH_MARK_TIME}', now(), 80.5, 80.5, 'kg', true) ON CONFLICT (athlete_id, local_date) DO UPDATE SET weight_kg = EXCLUDED.weight_kg, entered_value = EXCLUDED.entered_value, updated_at = now();
`;
        writeFileSync(path.join(dir, 'write.sql'), script);
        const result = await run(
          path.join(options.pgBinDir, 'pgbench'),
          [
            '-n',
            '-c',
            String(connections),
            '-j',
            '2',
            '-T',
            String(seconds),
            '-f',
            'write.sql',
            '--log',
            '--log-prefix=tx',
          ],
          { capture: true, cwd: dir, env: pgEnv },
        );
        if (result.code !== 0) throw new Error(`pgbench failed: ${result.stderr || result.stdout}`);
        const tps = Number(/tps = ([\d.]+)/.exec(result.stdout)?.[1]);
        // Per-transaction log lines: client, transaction, latency in µs, script, epoch s, µs.
        const latencies: number[] = [];
        for (const file of readdirSync(dir).filter((f) => f.startsWith('tx.'))) {
          for (const line of readFileSync(path.join(dir, file), 'utf8').split('\n')) {
            const us = Number(line.split(' ')[2]);
            if (Number.isFinite(us) && line) latencies.push(us / 1000);
          }
        }
        const failed = Number(/failed transactions: (\d+)/.exec(result.stdout)?.[1] ?? 0);
        return {
          reqPerSec: tps,
          p50Ms: percentile(latencies, 50),
          p99Ms: percentile(latencies, 99),
          ok: latencies.length,
          failed,
        };
      } finally {
        rmSync(dir, { recursive: true, force: true });
        await removePgbenchRows();
      }
    },

    async statementsPerWrite(kind) {
      const counts: number[] = [];
      for (let i = 0; i < 3; i += 1) {
        const req = write(kind, sequence++);
        const res = await expectStatus(options.baseUrl, req, [200, 201]);
        counts.push(Number(res.headers['x-db-statements']));
      }
      // The fewest seen: the server's own background work (scheduler, sweeps) only ever adds to a count.
      return Math.min(...counts);
    },

    cleanUp: removePgbenchRows,
  };
}
