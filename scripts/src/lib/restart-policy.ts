/**
 * When `npm start` starts the API server again after it died: 1 s, 2 s, 4 s … at most 30 s, and a
 * run of a minute or more counts as healthy and starts the series over (common practice, no
 * source).
 */
export interface RestartPolicy {
  firstDelayMs: number;
  maxDelayMs: number;
  healthyAfterMs: number;
}

export const API_RESTART: RestartPolicy = { firstDelayMs: 1000, maxDelayMs: 30_000, healthyAfterMs: 60_000 };

/**
 * The server died after running `ranForMs`, with `streak` short-lived runs in a row before this
 * one: how long to wait before starting it again, and the streak to remember for next time.
 */
export function nextRestart(
  streak: number,
  ranForMs: number,
  policy: RestartPolicy = API_RESTART,
): { delayMs: number; streak: number } {
  const before = ranForMs >= policy.healthyAfterMs ? 0 : streak;
  return {
    delayMs: Math.min(policy.maxDelayMs, policy.firstDelayMs * 2 ** before),
    streak: before + 1,
  };
}
