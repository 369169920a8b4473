import type { DataSource } from 'typeorm';
import { OutboxMessage } from '../../../api/src/entities/outbox-message.entity.js';

/** Outbox rows addressed to `to`, oldest first. */
export function outboxFor(db: DataSource, to: string): Promise<OutboxMessage[]> {
  return db.getRepository(OutboxMessage).find({ where: { toAddress: to }, order: { createdAt: 'ASC' } });
}

/** The token in the first link of a mail's text that matches `${origin}${path}`. */
export function tokenFromMail(message: OutboxMessage, origin: string, kind: 'reset' | 'invite'): string {
  const escaped = origin.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const pattern =
    kind === 'reset'
      ? new RegExp(`${escaped}/reset-password\\?token=([A-Za-z0-9_-]+)`)
      : new RegExp(`${escaped}/invite/([A-Za-z0-9_-]+)`);
  const match = pattern.exec(message.textBody);
  if (!match?.[1]) throw new Error(`no ${kind} link in mail ${message.id}:\n${message.textBody}`);
  return match[1];
}
