/**
 * The job queue: pg-boss 10 in its own `pgboss` schema of the app's database. Jobs are inserted
 * inside the caller's transaction (see services/mail.service.ts), so a job exists exactly when
 * the change that caused it committed.
 */
import PgBoss from 'pg-boss';
import type { DataSource, EntityManager } from 'typeorm';
import type { Config } from '../config.js';

export const QUEUE_SCHEMA = 'pgboss';
/** One job per outbox message: data `{ outboxId }`. */
export const MAIL_SEND_QUEUE = 'mail-send';
/** Periodic job that re-enqueues pending outbox messages without a live job. */
export const MAIL_SWEEP_QUEUE = 'mail-sweep';

export interface MailSendJob {
  outboxId: string;
}

export function createQueue(config: Pick<Config, 'databaseUrl'>): PgBoss {
  return new PgBoss({
    connectionString: config.databaseUrl,
    schema: QUEUE_SCHEMA,
    application_name: 'driftmark-jobs',
    // The worker fetches one job at a time; maintenance and cron share the rest.
    max: 3,
  });
}

const QUEUE_SETUP_LOCK_KEY = 'driftmark:queue-setup';

/**
 * Runs queue set-up (pg-boss `createQueue`/`updateQueue`) in one process at a time, under a
 * transaction-scoped advisory lock: two instances starting together deadlock inside pg-boss's
 * `create_queue` otherwise (found by tests/integration/multi-instance.test.ts), and the loser exits.
 */
export async function oneSetupAtATime<T>(dataSource: DataSource, work: () => Promise<T>): Promise<T> {
  return dataSource.transaction(async (manager) => {
    await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', [QUEUE_SETUP_LOCK_KEY]);
    return work();
  });
}

/** pg-boss's db hook, running its SQL on the connection (and transaction) of `manager`. */
export function transactionDb(manager: EntityManager): PgBoss.Db {
  return {
    async executeSql(text, values) {
      const runner = manager.queryRunner;
      if (!runner) throw new Error('transactionDb needs an EntityManager bound to a transaction');
      const result = await runner.query(text, values, true);
      return { rows: result.records ?? [] };
    },
  };
}

// The queue started by this process (the mail worker), if any. queueMail enqueues through it;
// without it the outbox row waits for the next sweep of whichever worker runs.
let runningQueue: PgBoss | null = null;

export function setRunningQueue(boss: PgBoss): void {
  runningQueue = boss;
}

export function clearRunningQueue(boss: PgBoss): void {
  if (runningQueue === boss) runningQueue = null;
}

export function getRunningQueue(): PgBoss | null {
  return runningQueue;
}
