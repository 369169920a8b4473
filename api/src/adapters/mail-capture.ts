/**
 * Reads the messages the local SMTP fake captured: one JSON file per message in MAIL_CAPTURE_DIR,
 * named `<ms>-<random>.json`. Used by the demo inbox (routes/dev-mail.routes.ts) and the browser
 * tests, which read the folder directly.
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
}

/** File base names the fake writes: `<ms>-<random>`; nothing that could leave the folder. */
const ID_PATTERN = /^[A-Za-z0-9-]{1,100}$/;

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
    .filter((id) => ID_PATTERN.test(id))
    .sort((a, b) => stampOf(b) - stampOf(a) || (a < b ? 1 : a > b ? -1 : 0));
}

/** One captured message, or null when the id is not one the fake wrote. */
export async function readCapturedMail(dir: string, id: string): Promise<CapturedMail | null> {
  if (!ID_PATTERN.test(id)) return null;
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
    };
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || err instanceof SyntaxError) return null;
    throw err;
  }
}
