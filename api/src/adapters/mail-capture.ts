/**
 * The capture folder's format, read in one place: the local SMTP fake (scripts/src/lib/smtp-fake.ts)
 * writes one JSON file per message in MAIL_CAPTURE_DIR, named `<ms>-<random>.json`; the demo inbox
 * (routes/dev-mail.routes.ts), the fake's own wait helper and the tests read it through here.
 */
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';

export interface CapturedMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  messageId: string | null;
  /** Raw List-Unsubscribe and List-Unsubscribe-Post header values, when present. */
  listUnsubscribe?: string | null;
  listUnsubscribePost?: string | null;
}

/** File base names the fake writes: `<ms>-<random>`; nothing that could leave the folder. */
export const CAPTURE_ID_PATTERN = /^[A-Za-z0-9-]{1,100}$/;

function stampOf(id: string): number {
  const stamp = Number(id.split('-')[0]);
  return Number.isFinite(stamp) ? stamp : 0;
}

/** Ids of the captured messages, newest first. */
export async function listCapturedIds(dir: string): Promise<string[]> {
  let names: string[];
  try {
    names = await readdir(dir);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return [];
    throw err;
  }
  return names
    .filter((n) => n.endsWith('.json'))
    .map((n) => n.slice(0, -'.json'.length))
    .filter((id) => CAPTURE_ID_PATTERN.test(id))
    .sort((a, b) => stampOf(b) - stampOf(a) || (a < b ? 1 : a > b ? -1 : 0));
}

/** One captured message, or null when the id is not one the fake wrote. */
export async function readCapturedMail(dir: string, id: string): Promise<CapturedMail | null> {
  if (!CAPTURE_ID_PATTERN.test(id)) return null;
  try {
    const parsed = JSON.parse(await readFile(path.join(dir, `${id}.json`), 'utf8')) as Partial<CapturedMail>;
    return {
      id,
      receivedAt: String(parsed.receivedAt ?? ''),
      from: String(parsed.from ?? ''),
      to: Array.isArray(parsed.to) ? parsed.to.map(String) : [],
      subject: String(parsed.subject ?? ''),
      text: String(parsed.text ?? ''),
      html: typeof parsed.html === 'string' ? parsed.html : null,
      messageId: typeof parsed.messageId === 'string' ? parsed.messageId : null,
      ...(parsed.listUnsubscribe !== undefined && { listUnsubscribe: parsed.listUnsubscribe }),
      ...(parsed.listUnsubscribePost !== undefined && { listUnsubscribePost: parsed.listUnsubscribePost }),
    };
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || err instanceof SyntaxError) return null;
    throw err;
  }
}

/** Every captured message, newest first; one removed between listing and reading is skipped. */
export async function readAllCapturedMail(dir: string): Promise<CapturedMail[]> {
  const mails = await Promise.all((await listCapturedIds(dir)).map((id) => readCapturedMail(dir, id)));
  return mails.filter((m): m is CapturedMail => m !== null);
}
