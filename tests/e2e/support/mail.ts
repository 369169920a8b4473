import { baseUrl } from './browser.js';

interface MailSummary {
  id: string;
  receivedAt: string;
  to: string[];
  subject: string;
}
interface MailMessage extends MailSummary {
  from: string;
  text: string;
  html: string | null;
}

/** Waits for a captured message to `to` (read through the demo inbox API) and returns it. */
export async function waitForMailTo(to: string, timeoutMs = 20_000): Promise<MailMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const res = await fetch(`${baseUrl}/api/dev/mail`);
    if (res.ok) {
      const { data } = (await res.json()) as { data: MailSummary[] };
      const hit = data.find((m) => m.to.some((addr) => addr.toLowerCase().includes(to.toLowerCase())));
      if (hit) {
        const full = await fetch(`${baseUrl}/api/dev/mail/${hit.id}`);
        return ((await full.json()) as { data: MailMessage }).data;
      }
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`No e-mail to ${to} within ${timeoutMs} ms`);
}

/** The first link in a message's text part that points at the app and contains `pathPart`. */
export function linkIn(message: MailMessage, pathPart: string): string {
  const links = message.text.match(/https?:\/\/\S+/g) ?? [];
  const link = links.find((l) => l.includes(pathPart));
  if (!link) throw new Error(`No link containing ${pathPart} in: ${message.text}`);
  return link.replace(/[).,]+$/, '');
}
