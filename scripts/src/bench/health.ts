/**
 * How long `/api/health` takes while 20 sign-ins run at once, against the same while idle.
 *
 * A round fires SIGN_INS sign-ins spread over the demo accounts with their password (successful
 * sign-ins are not counted by the rate limits, and each costs one bcrypt compare like a wrong
 * password; the per-account limit counts requests in flight, so one account alone would answer 429
 * beyond its limit) and polls `/api/health` one request after another until the round ends.
 */
import { request } from './http.js';
import { percentile } from './stats.js';

export const SIGN_INS = 20;
const IDLE_SAMPLES = 50;
const ACCOUNTS = [
  'coach@driftmark.test',
  'assistant@driftmark.test',
  'athlete@driftmark.test',
  'aroha.tane@driftmark.test',
  'priya.raman@driftmark.test',
  'hannah.kowalski@driftmark.test',
  'kenji.watanabe@driftmark.test',
  'leilani.akana@driftmark.test',
];

export interface HealthFigures {
  p50Ms: number;
  p99Ms: number;
  samples: number;
  /** Sign-in answers by status (under load only). */
  statuses: Record<string, number>;
}

async function health(baseUrl: string): Promise<number> {
  return (await request(baseUrl, { path: '/api/health' })).ms;
}

export async function healthIdle(baseUrl: string): Promise<HealthFigures> {
  const ms: number[] = [];
  for (let i = 0; i < IDLE_SAMPLES; i += 1) ms.push(await health(baseUrl));
  return { p50Ms: percentile(ms, 50), p99Ms: percentile(ms, 99), samples: ms.length, statuses: {} };
}

export async function healthUnderSignIns(baseUrl: string, password: string): Promise<HealthFigures> {
  const ms: number[] = [];
  let done = false;
  const signIns = Promise.all(
    Array.from({ length: SIGN_INS }, (_, i) =>
      request(baseUrl, {
        method: 'POST',
        path: '/api/auth/sign-in',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: ACCOUNTS[i % ACCOUNTS.length], password }),
      }).then((r) => r.status),
    ),
  ).finally(() => {
    done = true;
  });
  while (!done) ms.push(await health(baseUrl));
  const statuses: Record<string, number> = {};
  for (const status of await signIns) statuses[status] = (statuses[status] ?? 0) + 1;
  return { p50Ms: percentile(ms, 50), p99Ms: percentile(ms, 99), samples: ms.length, statuses };
}
