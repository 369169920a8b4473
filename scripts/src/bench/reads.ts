/**
 * Reads through the API against raw SQL fetching the same rows with the pg client directly:
 *
 * - the trend (GET /api/athletes/:id/trend, as the athlete) over 3 years and over 6 weeks, against
 *   the rows of that range (weigh-ins, meals, fluids, evening logs, symptoms, flags and the plan
 *   versions), one SELECT per table on one connection;
 * - the roster (GET /api/roster) and the review queue (GET /api/review-queue) of the 150-athlete
 *   team's coach, against the team's athletes with their users and the rows of the roster's
 *   14-day window for all of them.
 *
 * Requests are sent one at a time (keep-alive), so each latency is the request's own.
 */
import pg from 'pg';
import { expectStatus, request } from './http.js';
import { percentile } from './stats.js';

export interface ReadFigures {
  p50Ms: number;
  p95Ms: number;
  /** Body bytes decoded / as sent. */
  bytes: number;
  wireBytes: number;
  encoding: string;
  statements: number;
}

export interface SqlFigures {
  p50Ms: number;
  p95Ms: number;
  rows: number;
}

async function timedApi(
  baseUrl: string,
  path: string,
  cookie: string,
  samples: number,
): Promise<ReadFigures> {
  const ms: number[] = [];
  const statements: number[] = [];
  let last = await expectStatus(baseUrl, { path, headers: { cookie } }, 200);
  for (let i = 0; i < samples; i += 1) {
    last = await expectStatus(baseUrl, { path, headers: { cookie } }, 200);
    ms.push(last.ms);
    statements.push(Number(last.headers['x-db-statements']));
  }
  return {
    p50Ms: percentile(ms, 50),
    p95Ms: percentile(ms, 95),
    bytes: last.body.length,
    wireBytes: last.wireBytes,
    encoding: String(last.headers['content-encoding'] ?? 'identity'),
    // The fewest seen: the server's own background work (scheduler, sweeps) only ever adds to a count.
    statements: Math.min(...statements),
  };
}

async function timedSql(
  db: pg.Client,
  statements: [string, unknown[]][],
  samples: number,
): Promise<SqlFigures> {
  const ms: number[] = [];
  let rows = 0;
  for (let i = 0; i <= samples; i += 1) {
    const started = performance.now();
    rows = 0;
    for (const [text, values] of statements) rows += (await db.query(text, values)).rowCount ?? 0;
    // The first round warms the connection's plan cache, as the API's first request is not timed either.
    if (i > 0) ms.push(performance.now() - started);
  }
  return { p50Ms: percentile(ms, 50), p95Ms: percentile(ms, 95), rows };
}

const DATED_TABLES = [
  ['weigh_ins', 'local_date, weight_kg, updated_at'],
  ['meal_entries', 'local_date, energy_kcal, protein_g, carbohydrate_g, fat_g, sodium_mg'],
  ['fluid_entries', 'local_date, local_time, volume_ml'],
  ['evening_logs', 'local_date, steps, cardio_minutes'],
  ['symptom_reports', 'id, local_date, local_time, symptoms, urgent, created_at'],
  ['athlete_flags', 'id, local_date, kind, message, symptom_report_id, created_at'],
] as const;

/** The rows of `athleteIds` between two dates, one SELECT per table, plus their plan versions. */
function rowsStatements(athleteIds: string[], from: string, to: string): [string, unknown[]][] {
  return [
    ...DATED_TABLES.map(([table, columns]): [string, unknown[]] => [
      `SELECT athlete_id, ${columns} FROM ${table}
          WHERE athlete_id = ANY($1::uuid[]) AND local_date BETWEEN $2 AND $3`,
      [athleteIds, from, to],
    ]),
    [
      `SELECT athlete_id, id, number, effective_from, content, baseline FROM plan_versions
        WHERE athlete_id = ANY($1::uuid[])`,
      [athleteIds],
    ],
  ];
}

export interface ReadBench {
  trendApi(from: string, to: string, samples: number): Promise<ReadFigures>;
  trendSql(from: string, to: string, samples: number): Promise<SqlFigures>;
  rosterApi(samples: number): Promise<ReadFigures>;
  queueApi(samples: number): Promise<ReadFigures>;
  rosterSql(samples: number): Promise<SqlFigures>;
  close(): Promise<void>;
}

export async function openReadBench(options: {
  baseUrl: string;
  databaseUrl: string;
  historyAthleteId: string;
  historyCookie: string;
  rosterCookie: string;
  rosterTeamId: string;
  rosterAthleteIds: string[];
  /** The roster's window: the 14 days up to today. */
  rosterFrom: string;
  today: string;
}): Promise<ReadBench> {
  const db = new pg.Client({ connectionString: options.databaseUrl });
  await db.connect();
  // One probe so the bench fails early and clearly when a route is missing.
  await request(options.baseUrl, { path: '/api/health' });
  return {
    trendApi: (from, to, samples) =>
      timedApi(
        options.baseUrl,
        `/api/athletes/${options.historyAthleteId}/trend?from=${from}&to=${to}`,
        options.historyCookie,
        samples,
      ),
    trendSql: (from, to, samples) =>
      timedSql(db, rowsStatements([options.historyAthleteId], from, to), samples),
    rosterApi: (samples) => timedApi(options.baseUrl, '/api/roster', options.rosterCookie, samples),
    queueApi: (samples) => timedApi(options.baseUrl, '/api/review-queue', options.rosterCookie, samples),
    rosterSql: (samples) =>
      timedSql(
        db,
        [
          [
            `SELECT a.*, u.name, u.email, u.time_zone FROM athletes a JOIN users u ON u.id = a.user_id
              WHERE a.team_id = $1`,
            [options.rosterTeamId],
          ],
          ...rowsStatements(options.rosterAthleteIds, options.rosterFrom, options.today),
        ],
        samples,
      ),
    close: () => db.end(),
  };
}
