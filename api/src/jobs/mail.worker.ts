/**
 * Delivers the mail outbox.
 *
 * Each outbox row gets a `mail-send` job (inserted with the row, or later by the sweep). The
 * handler claims the row in its own short transaction (pending only, FOR UPDATE SKIP LOCKED):
 * status `sending`, attempts + 1, a lease as long as the job's expiry. The claim commits before the
 * send, so every attempt is counted, a kill included. Then it sends over SMTP with the row's own
 * Message-ID, holding no transaction, and marks the row `sent` with the server's answer in the next
 * statement (retried within the lease while the database is away). A failed send records the
 * error and puts the row back to pending, then rethrows so pg-boss retries with exponential
 * backoff; after the last attempt the row is marked failed.
 *
 * No loss: a job only exists for a committed row, and the sweep (at start and every minute)
 * enqueues any pending row without a live job, e.g. after a crash between commit and enqueue, or
 * when the row was written by a process that does not run the queue. A row still `sending` after
 * its lease was cut off mid-send; the sweep (or the job's own retry) sends it again.
 *
 * No double send in normal operation: only a claimed row is sent, and a row is claimed only while
 * pending (or its lease is over), so a second job for the same row (sweep vs. original, two
 * workers) finds it claimed or sent and ends. What remains at least once is inherent to SMTP: a
 * message the server accepted while the process died (or the database stayed away for the whole
 * lease) before `sent` was written goes out again; the repeat carries the same Message-ID, which
 * lets receiving systems drop the duplicate.
 */
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { createMailer, type Mailer } from '../adapters/mailer.js';
import type { Config } from '../config.js';
import type { Logger } from '../logger.js';
import {
  findOrphanedPendingIds,
  claimMessage,
  markMessageSent,
  recordFailedAttempt,
  releaseExpiredClaims,
} from '../mail/outbox.repository.js';
import {
  clearRunningQueue,
  createQueue,
  oneSetupAtATime,
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
/** Pause between tries to mark an accepted message sent while the database is away. */
const MARK_SENT_RETRY_MS = 1_000;
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
    // 1. Claim and record the attempt, committed before any byte goes to the SMTP server.
    const leaseUntil = new Date(Date.now() + tuning.expireInSeconds * 1000);
    const claim = await dataSource.transaction((manager) => claimMessage(manager, outboxId, leaseUntil));
    if (!claim) return { kind: 'skipped' };
    const { message, attempts } = claim;
    // 2. Send, holding no transaction.
    let response: string;
    try {
      ({ response } = await mailer.send({
        to: message.toAddress,
        from: config.mailFrom,
        subject: message.subject,
        text: message.textBody,
        html: message.htmlBody ?? '',
        messageId: message.messageId ?? `<${message.id}@driftmark.local>`,
        ...(message.headers ? { headers: message.headers } : {}),
      }));
    } catch (err) {
      const error = err instanceof Error ? err : new Error(String(err));
      const final = job.retryCount >= job.retryLimit || attempts >= maxAttempts;
      await recordFailedAttempt(dataSource.manager, message.id, { error: error.message, final });
      return { kind: 'failed', attempts, final, error };
    }
    // 3. Accepted: marked sent in the very next statement. Should the database be away right now,
    // keep trying within the lease, so a database restart does not turn into a second send.
    for (let tries = 1; ; tries++) {
      try {
        await markMessageSent(dataSource.manager, message.id, response);
        return { kind: 'sent', attempts };
      } catch (err) {
        if (Date.now() + MARK_SENT_RETRY_MS >= leaseUntil.getTime()) throw err;
        log.warn({ err, outboxId, tries }, 'mail accepted by SMTP but not yet marked sent; retrying');
        await new Promise((resolve) => setTimeout(resolve, MARK_SENT_RETRY_MS));
      }
    }
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
      const released = await releaseExpiredClaims(manager);
      if (released > 0) log.warn({ released }, 'mail cut off while sending goes out again');
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
    await oneSetupAtATime(dataSource, async () => {
      await boss.createQueue(MAIL_SEND_QUEUE, sendQueue);
      // createQueue keeps an existing queue as it was; apply the current settings to it.
      await boss.updateQueue(MAIL_SEND_QUEUE, sendQueue);
      await boss.createQueue(MAIL_SWEEP_QUEUE, { name: MAIL_SWEEP_QUEUE, policy: 'short', retryLimit: 0 });
    });

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
