/**
 * `npm run bench`: the speed table of issue 13, every line against a reference measured in the
 * same run (see bench/run.ts). Sets up its own database and server; leaves the cluster running.
 */
import { fail } from './lib/log.js';
import { runBench } from './bench/run.js';

runBench().then(
  () => process.exit(0),
  (error: unknown) => {
    fail(error instanceof Error ? (error.stack ?? error.message) : String(error));
    process.exit(1);
  },
);
