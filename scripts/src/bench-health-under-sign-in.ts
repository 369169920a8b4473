/**
 * Benchmark (not a test): how long `/api/health` takes while 20 sign-ins run at once.
 * Starts nothing itself; point it at a running server:
 *
 *   node --import tsx scripts/src/bench-health-under-sign-in.ts http://127.0.0.1:3456
 *
 * Each round fires CONCURRENT sign-ins spread over the demo accounts with their password (successful
 * sign-ins are not counted by the rate limits, and each costs one bcrypt compare like a wrong
 * password; the per-account limit counts requests in flight, so one account alone would answer 429
 * beyond its limit) and polls `/api/health`
 * one request after another until the round ends. Prints p50 / p99 / max of the health latencies,
 * with a baseline measured before any sign-in.
 */
import { performance } from 'node:perf_hooks';

const base = (process.argv[2] ?? process.env.BENCH_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '');
const CONCURRENT = Number(process.env.BENCH_CONCURRENT ?? 20);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);
const EMAILS = (
  process.env.BENCH_EMAILS ??
  'coach@driftmark.test,assistant@driftmark.test,athlete@driftmark.test,aroha.tane@driftmark.test,' +
    'priya.raman@driftmark.test,hannah.kowalski@driftmark.test,kenji.watanabe@driftmark.test,' +
    'leilani.akana@driftmark.test'
).split(',');
const PASSWORD = process.env.BENCH_PASSWORD ?? 'driftmark-demo';

async function timedHealth(): Promise<number> {
  const start = performance.now();
  const res = await fetch(`${base}/api/health`);
  await res.arrayBuffer();
  return performance.now() - start;
}

async function signIn(email: string): Promise<number> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  await res.arrayBuffer();
  return res.status;
}

/** Nearest-rank percentile. */
function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  const rank = Math.min(sorted.length, Math.max(1, Math.ceil((p / 100) * sorted.length)));
  return sorted[rank - 1]!;
}

function summary(label: string, samples: number[]): string {
  const sorted = [...samples].sort((a, b) => a - b);
  const f = (n: number) => `${n.toFixed(1)} ms`;
  return `${label}: n=${sorted.length} p50=${f(percentile(sorted, 50))} p99=${f(percentile(sorted, 99))} max=${f(sorted.at(-1) ?? NaN)}`;
}

async function main(): Promise<void> {
  const idle: number[] = [];
  for (let i = 0; i < 50; i += 1) idle.push(await timedHealth());
  console.log(summary('health, idle', idle));

  const loaded: number[] = [];
  const statuses = new Map<number, number>();
  const started = performance.now();
  for (let round = 0; round < ROUNDS; round += 1) {
    let done = false;
    const signIns = Promise.all(
      Array.from({ length: CONCURRENT }, (_, i) => signIn(EMAILS[i % EMAILS.length]!)),
    ).then((all) => {
      done = true;
      return all;
    });
    while (!done) loaded.push(await timedHealth());
    for (const status of await signIns) statuses.set(status, (statuses.get(status) ?? 0) + 1);
  }
  const seconds = (performance.now() - started) / 1000;
  console.log(summary(`health, ${CONCURRENT} sign-ins at once × ${ROUNDS}`, loaded));
  console.log(
    `sign-ins: ${[...statuses].map(([s, n]) => `${n}× ${s}`).join(', ')} in ${seconds.toFixed(1)} s`,
  );
}

await main();
