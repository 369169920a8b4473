/**
 * The only module that talks to nodemailer. Everything else sends mail by writing an outbox row
 * (services/mail.service.ts); the mail worker hands each row to this adapter.
 */
import nodemailer from 'nodemailer';
import type { Config } from '../config.js';

export interface OutgoingMail {
  to: string;
  from: string;
  subject: string;
  text: string;
  html: string;
  /** The Message-ID header, stable across retries so a receiver can spot a duplicate. */
  messageId: string;
  /** Extra headers, e.g. List-Unsubscribe. */
  headers?: Record<string, string>;
}

export interface SendResult {
  messageId: string;
  response: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<SendResult>;
  close(): void;
}

/** Raised when the SMTP server refused the message or a recipient; retrying may help. */
export class MailSendError extends Error {
  override readonly name = 'MailSendError';
}

// A send runs while the worker holds a row lock: never let a dead server keep it for minutes.
const CONNECTION_TIMEOUT_MS = 10_000;
const GREETING_TIMEOUT_MS = 10_000;
const SOCKET_TIMEOUT_MS = 30_000;

export function createMailer(config: Pick<Config, 'smtpUrl'>): Mailer {
  const { smtpUrl } = config;
  if (!smtpUrl) {
    return {
      send: () => Promise.reject(new MailSendError('SMTP_URL is not set: cannot send mail')),
      close: () => undefined,
    };
  }
  const transport = nodemailer.createTransport({
    url: smtpUrl,
    connectionTimeout: CONNECTION_TIMEOUT_MS,
    greetingTimeout: GREETING_TIMEOUT_MS,
    socketTimeout: SOCKET_TIMEOUT_MS,
  });

  return {
    async send(mail) {
      const info = await transport.sendMail({
        to: mail.to,
        from: mail.from,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        messageId: mail.messageId,
        ...(mail.headers ? { headers: mail.headers } : {}),
      });
      if (info.rejected.length > 0) {
        throw new MailSendError(
          `SMTP server rejected ${info.rejected.map(String).join(', ')}: ${info.response}`,
        );
      }
      return { messageId: info.messageId, response: info.response };
    },
    close() {
      transport.close();
    },
  };
}
