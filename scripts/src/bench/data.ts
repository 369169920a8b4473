/**
 * The bench's own data, written with set-based SQL (a few INSERT … SELECT over generate_series, no
 * row-by-row round trips) into a freshly seeded bench database:
 *
 * - team "Bench history": one coach and one athlete with three years (1,096 days) of daily
 *   check-ins up to yesterday;
 * - team "Bench roster": one coach and 150 athletes with one year (365 days) each.
 *
 * Each day has a weigh-in (about 1 day in 12 missed), four fluid entries, four meals and an evening
 * log; every athlete has the plan of a demo athlete from the first day on. Values come from
 * PostgreSQL's random() after setseed(), so two runs write the same figures relative to today.
 * Every account has the demo password (the hash is copied from the demo coach).
 */
import type pg from 'pg';

export const BENCH_PASSWORD = 'driftmark-demo';
export const ROSTER_SIZE = 150;
export const ROSTER_DAYS = 365;
export const HISTORY_DAYS = 1096;

export interface BenchData {
  history: { coachEmail: string; athleteEmail: string; athleteId: string; days: number };
  roster: { coachEmail: string; teamId: string; athletes: { id: string; email: string }[]; days: number };
  rows: Record<string, number>;
}

async function createTeam(
  db: pg.Client,
  name: string,
  coachEmail: string,
): Promise<{ teamId: string; coachId: string }> {
  const { rows } = await db.query<{ team_id: string; coach_id: string }>(
    `WITH demo AS (
       SELECT u.password_hash, t.settings - 'demoAnchorAt' AS settings
         FROM users u JOIN teams t ON t.id = u.team_id WHERE u.email = 'coach@driftmark.test'),
     team AS (INSERT INTO teams (name, settings) SELECT $1, settings FROM demo RETURNING id),
     coach AS (
       INSERT INTO users (team_id, email, name, role, password_hash, time_zone)
       SELECT team.id, $2, $1 || ' coach', 'owner', demo.password_hash, 'UTC' FROM team, demo
       RETURNING id, team_id)
     SELECT team_id, id AS coach_id FROM coach`,
    [name, coachEmail],
  );
  const row = rows[0];
  if (!row) throw new Error('The demo coach is missing: seed the bench database first.');
  return { teamId: row.team_id, coachId: row.coach_id };
}

/** `count` athletes of a team (users, athletes and a plan copied from a demo athlete), their ids in order. */
async function createAthletes(
  db: pg.Client,
  team: { teamId: string; coachId: string },
  emailPrefix: string,
  count: number,
  days: number,
): Promise<{ id: string; email: string }[]> {
  const { rows } = await db.query<{ id: string; email: string }>(
    `WITH demo AS (SELECT password_hash FROM users WHERE email = 'coach@driftmark.test'),
     u AS (
       INSERT INTO users (team_id, email, name, role, password_hash, time_zone)
       SELECT $1, $3 || n || '@driftmark.test', 'Bench athlete ' || n, 'athlete', demo.password_hash, 'UTC'
         FROM generate_series(1, $4::int) n, demo
       RETURNING id, email),
     a AS (
       INSERT INTO athletes (user_id, team_id, coach_id, status, sex, birth_date, height_cm,
                             usual_water_ml, usual_energy_kcal, goal, event_type, photo_consent,
                             intake_completed_at)
       SELECT u.id, $1, $2, 'active', CASE WHEN right(u.email, 1) IN ('1','3','5','7','9') THEN 'male'
                                           ELSE 'female' END,
              DATE '1995-06-15', 172, 3000, 2300, 'lose', 'none', true,
              now() - make_interval(days => $5::int)
         FROM u
       RETURNING id, user_id)
     SELECT a.id, u.email FROM a JOIN u ON u.id = a.user_id
      ORDER BY length(u.email), u.email`,
    [team.teamId, team.coachId, emailPrefix, count, days],
  );
  // The plan of a demo athlete on a long, steady diet (no countdown days), in force from day one.
  await db.query(
    `INSERT INTO plan_versions (athlete_id, number, effective_from, reason, content, baseline, created_by_id)
     SELECT a.id, 1, current_date - $2::int, 'Bench plan', src.content, src.baseline, $3
       FROM athletes a,
            (SELECT p.content, p.baseline FROM plan_versions p
               JOIN athletes x ON x.id = p.athlete_id JOIN users xu ON xu.id = x.user_id
              WHERE xu.email = 'hannah.kowalski@driftmark.test' ORDER BY p.number DESC LIMIT 1) src
      WHERE a.id = ANY($1::uuid[])`,
    [rows.map((r) => r.id), days, team.coachId],
  );
  return rows;
}

/** Daily check-ins for `athleteIds` over the `days` days before today, one statement per table. */
async function createHistory(db: pg.Client, athleteIds: string[], days: number): Promise<void> {
  const grid = `SELECT a.id AS athlete_id, a.i, d AS day, (current_date - d) AS local_date
                  FROM (SELECT id, row_number() OVER (ORDER BY id) AS i FROM unnest($1::uuid[]) id) a,
                       generate_series(1, $2::int) d`;
  const params = [athleteIds, days];
  await db.query(
    `INSERT INTO weigh_ins (athlete_id, local_date, local_time, logged_at, weight_kg, entered_value,
                            entered_unit, protocol_confirmed)
     SELECT athlete_id, local_date, '07:10', local_date + time '07:10', w, w, 'kg', true
       FROM (SELECT g.*, round((70 + (g.i % 25) + 0.012 * g.day + (random() - 0.5) * 1.2)::numeric, 1)::float8 AS w
               FROM (${grid}) g) x
      WHERE random() > 0.08`,
    params,
  );
  await db.query(
    `INSERT INTO fluid_entries (athlete_id, local_date, local_time, logged_at, client_id, volume_ml,
                                entered_value, entered_unit, kind)
     SELECT athlete_id, local_date, t, local_date + t::time, gen_random_uuid(), v, v, 'ml',
            (ARRAY['water', 'coffee_tea', 'water', 'other'])[k]
       FROM (SELECT g.*, k, to_char(time '08:00' + make_interval(hours => 3 * (k - 1), mins => (random() * 50)::int), 'HH24:MI') AS t,
                    (250 + 50 * floor(random() * 11))::float8 AS v
               FROM (${grid}) g, generate_series(1, 4) k) x`,
    params,
  );
  await db.query(
    `INSERT INTO meal_entries (athlete_id, local_date, local_time, logged_at, client_id, name, source,
                               protein_g, carbohydrate_g, fat_g, energy_kcal, sodium_mg)
     SELECT athlete_id, local_date, t, local_date + t::time, gen_random_uuid(),
            (ARRAY['Breakfast', 'Lunch', 'Afternoon snack', 'Dinner'])[k], 'macros', p, c, f,
            4 * p + 4 * c + 9 * f, s
       FROM (SELECT g.*, k, to_char(time '07:30' + make_interval(hours => 4 * (k - 1), mins => (random() * 40)::int), 'HH24:MI') AS t,
                    round((25 + random() * 20)::numeric)::float8 AS p, round((40 + random() * 50)::numeric)::float8 AS c,
                    round((8 + random() * 15)::numeric)::float8 AS f, round((300 + random() * 500)::numeric)::float8 AS s
               FROM (${grid}) g, generate_series(1, 4) k) x`,
    params,
  );
  await db.query(
    `INSERT INTO evening_logs (athlete_id, local_date, steps, sleep_hours, cardio_minutes, training_done)
     SELECT athlete_id, local_date, (6000 + random() * 8000)::int, round((6 + random() * 2.5)::numeric, 1)::float8,
            (random() * 40)::int, random() > 0.3
       FROM (${grid}) g`,
    params,
  );
}

/** Writes the bench's teams, athletes and history (about 560,000 rows); returns who is who. */
export async function createBenchData(db: pg.Client): Promise<BenchData> {
  await db.query('SELECT setseed(0.42)');
  const historyTeam = await createTeam(db, 'Bench history', 'bench.history.coach@driftmark.test');
  const [historyAthlete] = await createAthletes(db, historyTeam, 'bench.history.', 1, HISTORY_DAYS);
  const rosterTeam = await createTeam(db, 'Bench roster', 'bench.roster.coach@driftmark.test');
  const rosterAthletes = await createAthletes(db, rosterTeam, 'bench.roster.', ROSTER_SIZE, ROSTER_DAYS);
  await createHistory(db, [historyAthlete!.id], HISTORY_DAYS);
  await createHistory(
    db,
    rosterAthletes.map((a) => a.id),
    ROSTER_DAYS,
  );
  await db.query('ANALYZE');
  const rows: Record<string, number> = {};
  for (const table of ['weigh_ins', 'fluid_entries', 'meal_entries', 'evening_logs', 'athletes']) {
    const { rows: r } = await db.query<{ n: string }>(`SELECT count(*) AS n FROM ${table}`);
    rows[table] = Number(r[0]!.n);
  }
  return {
    history: {
      coachEmail: 'bench.history.coach@driftmark.test',
      athleteEmail: historyAthlete!.email,
      athleteId: historyAthlete!.id,
      days: HISTORY_DAYS,
    },
    roster: {
      coachEmail: 'bench.roster.coach@driftmark.test',
      teamId: rosterTeam.teamId,
      athletes: rosterAthletes,
      days: ROSTER_DAYS,
    },
    rows,
  };
}
