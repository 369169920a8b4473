/**
 * A local SMTP server that accepts every message and writes it, parsed, as one JSON file into a
 * capture folder (format: api/src/adapters/mail-capture.ts, which reads it for the dev inbox and the tests).
 * Loopback only, no TLS, no real authentication: it is a development and test tool.
 */
import { randomBytes } from 'node:crypto';
import { mkdir, rename, writeFile } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer, type SMTPServerAddress } from 'smtp-server';
// The folder's format is read in one place, next to the demo inbox that serves it.
import { readAllCapturedMail, type CapturedMail } from '../../../api/src/adapters/mail-capture.js';

export { readAllCapturedMail, type CapturedMail };

export interface SmtpFakeOptions {
  /** 0 picks a free port; the returned `port` is the real one. */
  port: number;
  host?: string;
  captureDir: string;
  /** Largest accepted message in bytes (default 10 MiB). */
  maxMessageBytes?: number;
  /**
   * Waits this long after capturing a message before answering 250 (default 0): a slow server, so
   * that a sender killed mid-send leaves a message captured but never confirmed (reliability run).
   */
  answerDelayMs?: number;
}

export interface SmtpFake {
  port: number;
  host: string;
  close(): Promise<void>;
}

const DEFAULT_MAX_BYTES = 10 * 1024 * 1024;

function addressList(field: AddressObject | AddressObject[] | undefined): string[] {
  if (!field) return [];
  const objects = Array.isArray(field) ? field : [field];
  return objects
    .flatMap((o) =>
      o.value.flatMap((a) => (a.group ? a.group.map((g) => g.address ?? '') : [a.address ?? ''])),
    )
    .filter(Boolean);
}

/** `Name <address>` (or the bare address): mailparser's own text form quotes the name. */
function formatSender(field: AddressObject | undefined): string | null {
  const first = field?.value[0];
  if (!first?.address) return field?.text ?? null;
  return first.name ? `${first.name} <${first.address}>` : first.address;
}

/** The unfolded value of a header from mailparser's raw lines, or null. */
function rawHeader(lines: readonly { key: string; line: string }[], key: string): string | null {
  const found = lines.find((l) => l.key === key);
  if (!found) return null;
  return found.line
    .slice(found.line.indexOf(':') + 1)
    .replace(/\r?\n[ \t]+/g, ' ')
    .trim();
}

export async function startSmtpFake(options: SmtpFakeOptions): Promise<SmtpFake> {
  const host = options.host ?? '127.0.0.1';
  const captureDir = path.resolve(options.captureDir);
  const maxBytes = options.maxMessageBytes ?? DEFAULT_MAX_BYTES;
  await mkdir(captureDir, { recursive: true });

  // File names sort by arrival: the millisecond prefix never repeats or goes back within one fake.
  let lastStamp = 0;
  const nextStamp = (): number => {
    lastStamp = Math.max(Date.now(), lastStamp + 1);
    return lastStamp;
  };

  const server = new SMTPServer({
    name: 'driftmark-smtp-fake',
    banner: 'Driftmark SMTP fake (development only)',
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: maxBytes,
    logger: false,
    // Closing should not wait the default 30 s for idle clients.
    closeTimeout: 1000,
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? 'anonymous' });
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', (err: Error) => callback(err));
      stream.on('end', () => {
        if (stream.sizeExceeded) {
          const err = Object.assign(new Error(`Message exceeds the ${maxBytes}-byte limit`), {
            responseCode: 552,
          });
          callback(err);
          return;
        }
        const stamp = nextStamp();
        const envelopeTo = session.envelope.rcptTo.map((r: SMTPServerAddress) => r.address);
        const receivedAt = new Date(stamp).toISOString();
        simpleParser(Buffer.concat(chunks))
          .then(async (parsed) => {
            const id = `${stamp}-${randomBytes(6).toString('hex')}`;
            const mail: CapturedMail = {
              id,
              receivedAt,
              from:
                formatSender(parsed.from) ??
                (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
              to: envelopeTo.length > 0 ? envelopeTo : addressList(parsed.to),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              html: parsed.html === false ? null : parsed.html,
              messageId: parsed.messageId ?? null,
              listUnsubscribe: rawHeader(parsed.headerLines, 'list-unsubscribe'),
              listUnsubscribePost: rawHeader(parsed.headerLines, 'list-unsubscribe-post'),
            };
            const finalPath = path.join(captureDir, `${id}.json`);
            const tmpPath = `${finalPath}.tmp`;
            // Readers never see a half-written file: they skip *.tmp and rename is atomic.
            await writeFile(tmpPath, JSON.stringify(mail, null, 2), 'utf8');
            await rename(tmpPath, finalPath);
            if (options.answerDelayMs) await new Promise((r) => setTimeout(r, options.answerDelayMs));
            callback(null, `Captured as ${id}`);
          })
          .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))));
      });
    },
  });

  const port = await new Promise<number>((resolve, reject) => {
    const onError = (err: Error) => reject(err);
    server.once('error', onError);
    server.listen(options.port, host, () => {
      server.off('error', onError);
      resolve((server.server.address() as AddressInfo).port);
    });
  });
  // Client errors (a dropped connection) must not crash the process hosting the fake.
  server.on('error', () => undefined);

  let closing: Promise<void> | null = null;
  return {
    port,
    host,
    close() {
      closing ??= new Promise<void>((resolve) => server.close(() => resolve()));
      return closing;
    },
  };
}

/**
 * Polls `captureDir` until a message matches `predicate` and returns the newest match.
 * Throws after `timeoutMs`, naming the subjects it did see.
 */
export async function waitForMail(
  captureDir: string,
  predicate: (mail: CapturedMail) => boolean,
  timeoutMs = 10_000,
): Promise<CapturedMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const mails = await readAllCapturedMail(captureDir);
    const match = mails.find(predicate);
    if (match) return match;
    if (Date.now() >= deadline) {
      const seen = mails.map((m) => `${m.to.join(',')}: ${m.subject}`).join('; ') || 'none';
      throw new Error(`No matching mail in ${captureDir} within ${timeoutMs} ms (seen: ${seen})`);
    }
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}
