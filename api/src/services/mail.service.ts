import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { OutboxMessage } from '../entities/outbox-message.entity.js';
import { getRunningQueue, MAIL_SEND_QUEUE, transactionDb, type MailSendJob } from '../jobs/queue.js';
import { insertPendingMessage } from '../mail/outbox.repository.js';

export interface QueuedMail {
  /** What kind of mail, e.g. `invitation`, `password_reset`. */
  kind: string;
  to: string;
  subject: string;
  text: string;
  html: string;
  /** Extra headers (e.g. List-Unsubscribe); names and values must stay on one line. */
  headers?: Record<string, string>;
}

/** Domain of our Message-ID headers; it only has to be ours and stable. */
const MESSAGE_ID_DOMAIN = 'driftmark.local';

/**
 * Puts a mail into the outbox as part of the caller's transaction: if that transaction rolls
 * back, no row and no job remain; once it commits, the mail worker delivers it (at the latest on
 * its next sweep). When this process runs the queue, the pg-boss job is inserted in the same
 * transaction, so delivery starts without waiting for a sweep. A manager outside a transaction
 * gets its own one.
 */
export async function queueMail(manager: EntityManager, mail: QueuedMail): Promise<OutboxMessage> {
  if (!manager.queryRunner?.isTransactionActive) {
    return manager.transaction((tx) => queueMail(tx, mail));
  }
  if (/[\r\n]/.test(mail.to) || !/^[^\s@]+@[^\s@]+$/.test(mail.to)) {
    throw new Error(`queueMail: not a single e-mail address: ${JSON.stringify(mail.to)}`);
  }
  const message = await insertPendingMessage(manager, {
    kind: mail.kind,
    toAddress: mail.to,
    subject: mail.subject.replace(/[\r\n]+/g, ' ').trim(),
    textBody: mail.text,
    htmlBody: mail.html,
    messageId: `<${randomUUID()}@${MESSAGE_ID_DOMAIN}>`,
    headers: mail.headers
      ? Object.fromEntries(
          Object.entries(mail.headers).map(([k, v]) => [
            k.replace(/[^A-Za-z0-9-]/g, ''),
            v.replace(/[\r\n]+/g, ' '),
          ]),
        )
      : null,
  });

  const queue = getRunningQueue();
  if (queue) {
    const job: MailSendJob = { outboxId: message.id };
    await queue.send(MAIL_SEND_QUEUE, job, { db: transactionDb(manager) });
  }
  return message;
}
