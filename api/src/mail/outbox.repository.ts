/** Every query on outbox_messages. Callers pass the EntityManager of their transaction. */
import type { EntityManager } from 'typeorm';
import { OutboxMessage } from '../entities/outbox-message.entity.js';

export interface NewOutboxMessage {
  kind: string;
  toAddress: string;
  subject: string;
  textBody: string;
  htmlBody: string;
  messageId: string;
  headers?: Record<string, string> | null;
}

export async function insertPendingMessage(
  manager: EntityManager,
  message: NewOutboxMessage,
): Promise<OutboxMessage> {
  const repo = manager.getRepository(OutboxMessage);
  return repo.save(
    repo.create({ ...message, status: 'pending', attempts: 0, lastError: null, sentAt: null }),
  );
}

/**
 * Claims a message for one delivery attempt, in the caller's (short) transaction: a pending
 * message, or one left `sending` past its lease (a worker cut off mid-send). Locked with SKIP
 * LOCKED, so a message another worker is claiming right now is not claimed twice. The claim
 * records the attempt (attempts + 1) and a lease until `leaseUntil`; null when there is nothing to
 * claim (sent, failed, gone, or being sent by a worker whose lease still runs).
 */
export async function claimMessage(
  manager: EntityManager,
  id: string,
  leaseUntil: Date,
): Promise<{ message: OutboxMessage; attempts: number } | null> {
  const message = await manager
    .getRepository(OutboxMessage)
    .createQueryBuilder('message')
    .setLock('pessimistic_write')
    .setOnLocked('skip_locked')
    .where('message.id = :id', { id })
    .andWhere(
      "(message.status = 'pending' OR (message.status = 'sending' AND message.sending_until < now()))",
    )
    .getOne();
  if (!message) return null;
  const attempts = message.attempts + 1;
  await manager
    .getRepository(OutboxMessage)
    .update({ id }, { status: 'sending', attempts, sendingUntil: leaseUntil });
  return { message, attempts };
}

/** Marks a claimed message sent with the SMTP server's answer, in one statement. */
export async function markMessageSent(
  manager: EntityManager,
  id: string,
  smtpResponse: string,
): Promise<void> {
  await manager.getRepository(OutboxMessage).update(
    { id, status: 'sending' },
    {
      status: 'sent',
      sentAt: new Date(),
      sendingUntil: null,
      smtpResponse: smtpResponse.slice(0, 500),
      lastError: null,
    },
  );
}

/** Ends a claimed attempt that failed: back to pending (retried) or, after the last, failed. */
export async function recordFailedAttempt(
  manager: EntityManager,
  id: string,
  failure: { error: string; final: boolean },
): Promise<void> {
  await manager.getRepository(OutboxMessage).update(
    { id, status: 'sending' },
    {
      lastError: failure.error.slice(0, 2000),
      sendingUntil: null,
      status: failure.final ? 'failed' : 'pending',
    },
  );
}

/**
 * Messages left `sending` past their lease (the worker was killed mid-send, so whether the SMTP
 * server accepted them is unknown) go back to pending, to be sent again: the at-least-once edge.
 */
export async function releaseExpiredClaims(manager: EntityManager): Promise<number> {
  const rows: unknown[] = await manager.query(
    `UPDATE outbox_messages
        SET status = 'pending', sending_until = NULL,
            last_error = 'cut off while sending; no SMTP answer was recorded'
      WHERE status = 'sending' AND sending_until < now()
      RETURNING id`,
  );
  return rows.length;
}

/**
 * Pending messages that no queued, retrying or active job of `queueName` points at: the ones a
 * crash between commit and enqueue (or a process without the queue) left behind.
 */
export async function findOrphanedPendingIds(
  manager: EntityManager,
  jobs: { schema: string; queueName: string },
  limit: number,
): Promise<string[]> {
  const rows: { id: string }[] = await manager.query(
    `SELECT m.id
       FROM outbox_messages m
      WHERE m.status = 'pending'
        AND NOT EXISTS (
              SELECT 1 FROM "${jobs.schema}".job j
               WHERE j.name = $1
                 AND j.state < 'completed'
                 AND j.data->>'outboxId' = m.id::text)
      ORDER BY m.created_at
      LIMIT $2`,
    [jobs.queueName, limit],
  );
  return rows.map((r) => r.id);
}
