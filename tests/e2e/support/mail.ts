import { listCapturedIds, readCapturedMail } from '../../../api/src/adapters/mail-capture.js';

/** The SMTP fake's capture folder, set by scripts/src/test.ts (the e2e server runs in test mode, without the demo inbox). */
function captureDir(): string {
  const dir = process.env.MAIL_CAPTURE_DIR;
  if (!dir) throw new Error('MAIL_CAPTURE_DIR is not set: run the browser tests through npm run test:e2e');
  return dir;
}

interface MailSummary {
  id: string;
  receivedAt: string;
  to: string[];
  subject: string;
}
export interface MailMessage extends MailSummary {
  from: string;
  text: string;
  html: string | null;
}

export interface MailQuery {
  /** Part of a recipient address (case-insensitive). */
  to: string;
  /** Part of the subject (case-insensitive), or a pattern it must match. */
  subject?: string | RegExp;
  /** Only messages received after this instant (e.g. `new Date()` taken before the action that sends). */
  since?: Date;
  timeoutMs?: number;
}

function matches(m: MailSummary, query: MailQuery): boolean {
  const to = query.to.toLowerCase();
  if (!m.to.some((addr) => addr.toLowerCase().includes(to))) return false;
  if (query.subject instanceof RegExp && !query.subject.test(m.subject)) return false;
  if (typeof query.subject === 'string' && !m.subject.toLowerCase().includes(query.subject.toLowerCase())) {
    return false;
  }
  if (query.since && !(Date.parse(m.receivedAt) > query.since.getTime())) return false;
  return true;
}

/**
 * Waits for the newest captured message matching `query` (read from the capture folder, newest
 * first) and returns it with its text and HTML parts.
 */
export async function waitForMail(query: MailQuery): Promise<MailMessage> {
  const timeoutMs = query.timeoutMs ?? 20_000;
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const dir = captureDir();
    for (const id of await listCapturedIds(dir)) {
      const message = await readCapturedMail(dir, id);
      if (message && matches(message, query)) return message;
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  const what = [query.to, query.subject ? `subject ${String(query.subject)}` : null].filter(Boolean);
  throw new Error(`No e-mail to ${what.join(', ')} within ${timeoutMs} ms`);
}

/** Waits for a captured message to `to` (read from the capture folder) and returns it. */
export async function waitForMailTo(to: string, timeoutMs = 20_000): Promise<MailMessage> {
  return waitForMail({ to, timeoutMs });
}

function decodeEntities(href: string): string {
  return href
    .replace(/&amp;/g, '&')
    .replace(/&#x2F;/gi, '/')
    .replace(/&#47;/g, '/')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'");
}

/** Every http(s) link in a message: the text part's URLs, then the HTML part's hrefs; no duplicates. */
export function linksIn(message: MailMessage): string[] {
  const fromText = (message.text.match(/https?:\/\/[^\s<>"]+/g) ?? []).map((l) => l.replace(/[).,;:]+$/, ''));
  const fromHtml = [...(message.html ?? '').matchAll(/href\s*=\s*["']([^"']+)["']/gi)]
    .map((m) => decodeEntities(m[1] ?? ''))
    .filter((l) => /^https?:\/\//.test(l));
  return [...new Set([...fromText, ...fromHtml])];
}

/** The first link in a message's text part that points at the app and contains `pathPart`. */
export function linkIn(message: MailMessage, pathPart: string): string {
  const links = message.text.match(/https?:\/\/\S+/g) ?? [];
  const link = links.find((l) => l.includes(pathPart));
  if (!link) throw new Error(`No link containing ${pathPart} in: ${message.text}`);
  return link.replace(/[).,]+$/, '');
}

/** The first link (text or HTML part) containing `pathPart`, e.g. '/unsubscribe?token='. */
export function anyLinkIn(message: MailMessage, pathPart: string): string {
  const link = linksIn(message).find((l) => l.includes(pathPart));
  if (!link)
    throw new Error(`No link containing ${pathPart} in: ${linksIn(message).join(', ') || message.text}`);
  return link;
}

/**
 * A link's path, query and hash ("/unsubscribe?token=…"), for `page.goto` against the test server
 * whatever origin the e-mail was written with.
 */
export function appPath(link: string): string {
  const url = new URL(link);
  return `${url.pathname}${url.search}${url.hash}`;
}
