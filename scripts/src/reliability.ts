/**
 * `npm run test:reliability`: the reliability run with its full counts (thousands of writes, a
 * database restart, two kill -9s, a SIGTERM) against a copy of the product of its own; see
 * scripts/src/lib/reliability.ts. `RELIABILITY_COUNTS=small` runs the counts of the `npm test`
 * stage. Exits 1 on any loss, promised-once duplicate, orphan file or 500.
 */
import { color, fail, log } from './lib/log.js';
import { repoPath } from './lib/paths.js';
import { onShutdownSignal } from './lib/proc.js';
import { FULL_COUNTS, runReliability, SMALL_COUNTS } from './lib/reliability.js';
import { formatResult, scenarioFailed } from './lib/reliability-tally.js';

onShutdownSignal(() => {
  fail('Interrupted.');
  process.exit(130);
});

async function main(): Promise<number> {
  const counts = process.env.RELIABILITY_COUNTS === 'small' ? SMALL_COUNTS : FULL_COUNTS;
  const started = Date.now();
  const results = await runReliability({ counts, workDir: repoPath('test-results', 'reliability') }, (r) =>
    console.log(formatResult(r)),
  );
  const failed = results.filter(scenarioFailed);
  const took = `${((Date.now() - started) / 1000).toFixed(0)} s`;
  if (failed.length > 0) {
    fail(`Reliability: ${failed.length} of ${results.length} scenarios failed (${took}).`);
    return 1;
  }
  log(color.green(`Reliability: all ${results.length} scenarios held (${took}).`));
  return 0;
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    fail(error instanceof Error ? (error.stack ?? error.message) : String(error));
    process.exit(1);
  },
);
