// Runs in a worker thread of the password pool (api/src/lib/passwords.ts): bcrypt's rounds take
// ~250 ms of CPU each, which would stall every other request on the main thread. Plain JavaScript so
// the same file runs under the built server, tsx and vitest alike.
import bcrypt from 'bcryptjs';

/** @param {{ op: 'hash', password: string, cost: number } | { op: 'compare', password: string, hash: string }} task */
export default function run(task) {
  if (task.op === 'hash') return bcrypt.hashSync(task.password, task.cost);
  return bcrypt.compareSync(task.password, task.hash);
}
