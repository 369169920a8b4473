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
 * Locks a pending message for delivery. Returns null when it is not pending any more (sent or
 * failed), is gone, or another worker holds the lock right now (SKIP LOCKED: that worker is
 * delivering it, so this one must not).
 */
export async function lockPendingMessage(manager: EntityManager, id: string): Promise<OutboxMessage | null> {
  return manager
    .getRepository(OutboxMessage)
    .createQueryBuilder('message')
    .setLock('pessimistic_write')
    .setOnLocked('skip_locked')
    .where('message.id = :id', { id })
    .andWhere('message.status = :status', { status: 'pending' })
    .getOne();
}

export async function markMessageSent(manager: EntityManager, id: string, attempts: number): Promise<void> {
  await manager
    .getRepository(OutboxMessage)
    .update({ id }, { status: 'sent', sentAt: new Date(), attempts, lastError: null });
}

export async function recordFailedAttempt(
  manager: EntityManager,
  id: string,
  failure: { attempts: number; error: string; final: boolean },
): Promise<void> {
  await manager.getRepository(OutboxMessage).update(
    { id },
    {
      attempts: failure.attempts,
      lastError: failure.error.slice(0, 2000),
      status: failure.final ? 'failed' : 'pending',
    },
  );
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
