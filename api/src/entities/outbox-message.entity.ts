import { Check, Column, Entity, Index } from 'typeorm';
import { BaseRecord } from './base.entity.js';

export const OUTBOX_STATUSES = ['pending', 'sending', 'sent', 'failed'] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

/**
 * An e-mail waiting to be sent (or sent). Written in the same transaction as the change that
 * caused it, so a rolled-back change never mails and a committed one is never lost.
 */
@Entity({ name: 'outbox_messages' })
@Check('CHK_outbox_messages_status', `"status" IN ('pending', 'sending', 'sent', 'failed')`)
@Index('IDX_outbox_messages_status_created_at', ['status', 'createdAt'])
export class OutboxMessage extends BaseRecord {
  /** What kind of mail (e.g. `invitation`, `password_reset`). */
  @Column({ type: 'varchar', length: 40 })
  kind: string;

  @Column({ name: 'to_address', type: 'varchar', length: 254 })
  toAddress: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ name: 'text_body', type: 'text' })
  textBody: string;

  @Column({ name: 'html_body', type: 'text', nullable: true })
  htmlBody: string | null;

  @Column({ type: 'varchar', length: 10, default: 'pending' })
  status: OutboxStatus;

  @Column({ type: 'integer', default: 0 })
  attempts: number;

  @Column({ name: 'last_error', type: 'text', nullable: true })
  lastError: string | null;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;

  /** While `sending`: until when the claiming worker owns the send (after that it was cut off). */
  @Column({ name: 'sending_until', type: 'timestamptz', nullable: true })
  sendingUntil: Date | null;

  /** The SMTP server's answer when it accepted the message (recorded with `sent`). */
  @Column({ name: 'smtp_response', type: 'varchar', length: 500, nullable: true })
  smtpResponse: string | null;

  /** Extra headers sent with the mail (List-Unsubscribe on reminders), or null. */
  @Column({ type: 'jsonb', nullable: true })
  headers: Record<string, string> | null;

  /** The Message-ID header used for this mail; unique so a retry can never send it twice. */
  @Index('UQ_outbox_messages_message_id', { unique: true })
  @Column({ name: 'message_id', type: 'varchar', length: 255, nullable: true })
  messageId: string | null;
}
