/**
 * Delivers the mail outbox.
 *
 * Each outbox row gets a `mail-send` job (inserted with the row, or later by the sweep). The
 * handler locks the row (FOR UPDATE SKIP LOCKED, pending only), sends it over SMTP with the
 * row's own Message-ID and marks it sent, all inside one transaction. A failed send records the
 * attempt and the error, then rethrows so pg-boss retries with exponential backoff; after the
 * last attempt the row is marked failed.
 *
 * No loss: a job only exists for a committed row, and the sweep (at start and every minute)
 * enqueues any pending row without a live job, e.g. after a crash between commit and enqueue,
 * or when the row was written by a process that does not run the queue.
 *
 * No double send in normal operation: a row is only sent while its lock is held, and only while
 * it is still pending, so a second job for the same row (sweep vs. original, two workers) finds
 * it locked or already sent and ends. The one remaining edge is inherent to SMTP: if the server
 * accepted the message but the process dies (or the database fails) before the "sent" update
 * commits, the row stays pending and is sent again later. Delivery is therefore at least once;
 * the repeat carries the same Message-ID, which lets receiving systems drop the duplicate.
 */
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { createMailer, type Mailer } from '../adapters/mailer.js';
import type { Config } from '../config.js';
import type { Logger } from '../logger.js';
import {
  findOrphanedPendingIds,
  lockPendingMessage,
  markMessageSent,
  recordFailedAttempt,
} from '../mail/outbox.repository.js';
import {
  clearRunningQueue,
  createQueue,
  MAIL_SEND_QUEUE,
  MAIL_SWEEP_QUEUE,
  QUEUE_SCHEMA,
  setRunningQueue,
  transactionDb,
  type MailSendJob,
} from './queue.js';

export interface MailWorkerTuning {
  /** How often an idle worker looks for jobs. */
  pollingIntervalSeconds: number;
  /** Retries after the first attempt (pg-boss retryLimit). */
  retryLimit: number;
  /** Base delay of the exponential backoff: the n-th retry waits about delay·2ⁿ⁻¹ to delay·2ⁿ. */
  retryDelaySeconds: number;
  /** A job running longer than this is failed by pg-boss (and retried). Above the SMTP timeouts. */
  expireInSeconds: number;
  /** Cron for the sweep (pg-boss runs a schedule once per tick across processes); null: only at start. */
  sweepCron: string | null;
  /** How long stop() waits for a send in progress (below the server's forced-exit timer). */
  stopTimeoutMs: number;
}

export const DEFAULT_MAIL_WORKER_TUNING: MailWorkerTuning = {
  pollingIntervalSeconds: 1,
  retryLimit: 8,
  retryDelaySeconds: 10,
  expireInSeconds: 120,
  sweepCron: '* * * * *',
  stopTimeoutMs: 8_000,
};

export interface MailWorkerOptions {
  config: Config;
  dataSource: DataSource;
  logger: Logger;
  tuning?: Partial<MailWorkerTuning>;
  /** Replaces the SMTP adapter (tests). */
  mailer?: Mailer;
}

export interface MailWorker {
  stop(): Promise<void>;
  /** Enqueues pending rows that have no live job; returns how many it enqueued. */
  sweep(): Promise<number>;
}

const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const SWEEP_BATCH = 500;
// Two sweeps at once (two processes) would enqueue the same rows twice: harmless, but wasteful.
const SWEEP_LOCK_KEY = 'driftmark:mail-sweep';

type DeliveryOutcome =
  | { kind: 'sent'; attempts: number }
  | { kind: 'skipped' }
  | { kind: 'failed'; attempts: number; final: boolean; error: Error };

export async function startMailWorker(opts: MailWorkerOptions): Promise<MailWorker> {
  const { config, dataSource, logger } = opts;
  const tuning = { ...DEFAULT_MAIL_WORKER_TUNING, ...opts.tuning };
  const log = logger.child({ component: 'mail-worker' });

  if (!config.smtpUrl && !opts.mailer) {
    log.warn('SMTP_URL is not set: mail stays in the outbox until a worker with SMTP runs');
    return { stop: () => Promise.resolve(), sweep: () => Promise.resolve(0) };
  }

  const mailer = opts.mailer ?? createMailer(config);
  const maxAttempts = tuning.retryLimit + 1;
  const boss = createQueue(config);
  let stopping = false;

  boss.on('error', (err) => log.error({ err }, 'job queue error'));

  async function deliver(
    outboxId: string,
    job: PgBoss.JobWithMetadata<MailSendJob>,
  ): Promise<DeliveryOutcome> {
    return dataSource.transaction(async (manager) => {
      const message = await lockPendingMessage(manager, outboxId);
      if (!message) return { kind: 'skipped' };
      const attempts = message.attempts + 1;
      try {
        await mailer.send({
          to: message.toAddress,
          from: config.mailFrom,
          subject: message.subject,
          text: message.textBody,
          html: message.htmlBody ?? '',
          messageId: message.messageId ?? `<${message.id}@driftmark.local>`,
          ...(message.headers ? { headers: message.headers } : {}),
        });
      } catch (err) {
        const error = err instanceof Error ? err : new Error(String(err));
        const final = job.retryCount >= job.retryLimit || attempts >= maxAttempts;
        await recordFailedAttempt(manager, message.id, { attempts, error: error.message, final });
        return { kind: 'failed', attempts, final, error };
      }
      // Same transaction as the send's row lock: see the module comment for the one edge.
      await markMessageSent(manager, message.id, attempts);
      return { kind: 'sent', attempts };
    });
  }

  async function handleSend(jobs: PgBoss.JobWithMetadata<MailSendJob>[]): Promise<void> {
    for (const job of jobs) {
      const outboxId = job.data?.outboxId;
      if (typeof outboxId !== 'string' || !UUID_PATTERN.test(outboxId)) {
        log.warn({ jobId: job.id }, 'mail job without a valid outbox id; dropped');
        continue;
      }
      // A job fetched while stopping goes back to the queue rather than racing the shutdown.
      if (stopping) throw new Error('mail worker is stopping');
      const outcome = await deliver(outboxId, job);
      if (outcome.kind === 'sent') {
        log.info({ outboxId, attempts: outcome.attempts }, 'mail sent');
      } else if (outcome.kind === 'failed') {
        log[outcome.final ? 'error' : 'warn'](
          { outboxId, attempts: outcome.attempts, err: outcome.error },
          outcome.final ? 'mail failed for good' : 'mail send failed; will retry',
        );
        throw outcome.error;
      }
    }
  }

  async function sweep(): Promise<number> {
    return dataSource.transaction(async (manager) => {
      const [lock] = (await manager.query('SELECT pg_try_advisory_xact_lock(hashtext($1)) AS locked', [
        SWEEP_LOCK_KEY,
      ])) as { locked: boolean }[];
      if (!lock?.locked) return 0;
      const ids = await findOrphanedPendingIds(
        manager,
        { schema: QUEUE_SCHEMA, queueName: MAIL_SEND_QUEUE },
        SWEEP_BATCH,
      );
      if (ids.length === 0) return 0;
      await boss.insert(
        ids.map((outboxId) => ({ name: MAIL_SEND_QUEUE, data: { outboxId } satisfies MailSendJob })),
        { db: transactionDb(manager) },
      );
      return ids.length;
    });
  }

  async function runSweep(): Promise<void> {
    const count = await sweep();
    if (count > 0) log.info({ count }, 'enqueued pending mail without a job');
  }

  try {
    await boss.start();
    const sendQueue: PgBoss.Queue = {
      name: MAIL_SEND_QUEUE,
      policy: 'standard',
      retryLimit: tuning.retryLimit,
      retryDelay: tuning.retryDelaySeconds,
      retryBackoff: true,
      expireInSeconds: tuning.expireInSeconds,
    };
    await boss.createQueue(MAIL_SEND_QUEUE, sendQueue);
    // createQueue keeps an existing queue as it was; apply the current settings to it.
    await boss.updateQueue(MAIL_SEND_QUEUE, sendQueue);
    await boss.createQueue(MAIL_SWEEP_QUEUE, { name: MAIL_SWEEP_QUEUE, policy: 'short', retryLimit: 0 });

    await runSweep();
    await boss.work<MailSendJob>(
      MAIL_SEND_QUEUE,
      { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: tuning.pollingIntervalSeconds },
      handleSend,
    );
    await boss.work(MAIL_SWEEP_QUEUE, { pollingIntervalSeconds: 5 }, runSweep);
    if (tuning.sweepCron) await boss.schedule(MAIL_SWEEP_QUEUE, tuning.sweepCron);
  } catch (err) {
    // Do not leave pg-boss's pool and timers behind when start-up fails half-way.
    await boss.stop({ graceful: false, wait: true }).catch(() => undefined);
    throw err;
  }
  setRunningQueue(boss);
  log.info({ queue: MAIL_SEND_QUEUE }, 'mail worker started');

  let stopped: Promise<void> | null = null;
  return {
    sweep,
    stop() {
      stopped ??= (async () => {
        stopping = true;
        clearRunningQueue(boss);
        // Graceful: waits (up to the timeout) for a send in progress to finish and commit. A send
        // cut off here leaves its row pending, and it is delivered after the next start.
        await boss.stop({ graceful: true, wait: true, timeout: tuning.stopTimeoutMs });
        mailer.close();
        log.info('mail worker stopped');
      })();
      return stopped;
    },
  };
}
