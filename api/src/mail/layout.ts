/**
 * Our own e-mail layout: one plain-text part and one small HTML part with inline styles, no
 * images and no remote assets (nothing loads when the message is opened). Values interpolated
 * into the HTML go through `escapeHtml`; templates build paragraphs with the `html` tag below.
 */

const HTML_ESCAPES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => HTML_ESCAPES[ch] ?? ch);
}

/** A piece of HTML that is already safe to insert. */
export class SafeHtml {
  constructor(readonly value: string) {}
  toString(): string {
    return this.value;
  }
}

/** Tagged template: every interpolated value is escaped unless it is already `SafeHtml`. */
export function html(strings: TemplateStringsArray, ...values: unknown[]): SafeHtml {
  let out = strings[0] ?? '';
  values.forEach((value, i) => {
    out += value instanceof SafeHtml ? value.value : escapeHtml(String(value));
    out += strings[i + 1] ?? '';
  });
  return new SafeHtml(out);
}

/** Links in our mail point only at our own http(s) pages; anything else is a bug upstream. */
export function assertWebLink(link: string): string {
  let url: URL;
  try {
    url = new URL(link);
  } catch {
    throw new Error(`Mail link is not a URL: ${link}`);
  }
  if (url.protocol !== 'https:' && url.protocol !== 'http:') {
    throw new Error(`Mail link must be http(s): ${link}`);
  }
  return url.toString();
}

/** Header values must stay on one line. */
export function oneLine(value: string): string {
  return value
    .replace(/[\r\n\t]+/g, ' ')
    .replace(/\s{2,}/g, ' ')
    .trim();
}

/** "10 December 2026 at 14:32 UTC" in the given time zone (UTC when not known). */
export function formatDateTime(at: Date, timeZone = 'UTC'): string {
  const date = new Intl.DateTimeFormat('en-GB', { dateStyle: 'long', timeZone }).format(at);
  // en-US names zones the way most readers know them ("PST", "GMT+13"); the clock stays 24 h.
  const time = new Intl.DateTimeFormat('en-US', {
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
    timeZoneName: 'short',
  })
    .format(at)
    .replace(/GMT\+0\b/, 'GMT');
  return `${date} at ${time}`;
}

export interface LayoutInput {
  /** Shown in the window title and as the heading. */
  title: string;
  /** Short line some clients show beside the subject. */
  preheader: string;
  /** Paragraphs before the button. */
  intro: SafeHtml[];
  action: { label: string; url: string };
  /** Paragraphs after the button. */
  after: SafeHtml[];
  /** Why the recipient got this message (the footer adds that it is automated). */
  reason: string;
}

const COLORS = {
  page: '#eef1ef',
  card: '#ffffff',
  ink: '#1d2628',
  muted: '#4f5c5e',
  accent: '#24545c',
  rule: '#d5dcd9',
};
const FONT = "-apple-system, 'Segoe UI', Roboto, Helvetica, Arial, sans-serif";

export const AUTOMATED_NOTE = 'This is an automated message from Driftmark; replies are not read.';

export function renderHtmlLayout(input: LayoutInput): string {
  const url = assertWebLink(input.action.url);
  const paragraph = (p: SafeHtml) =>
    `<p style="margin:0 0 16px;font-size:16px;line-height:1.5;color:${COLORS.ink};">${p.value}</p>`;
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="color-scheme" content="light">
<title>${escapeHtml(input.title)}</title>
</head>
<body style="margin:0;padding:0;background:${COLORS.page};">
<div style="display:none;max-height:0;overflow:hidden;">${escapeHtml(input.preheader)}</div>
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="background:${COLORS.page};">
<tr><td align="center" style="padding:24px 12px;">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="max-width:560px;background:${COLORS.card};border:1px solid ${COLORS.rule};border-radius:8px;">
<tr><td style="padding:20px 28px;border-bottom:1px solid ${COLORS.rule};font-family:${FONT};font-size:20px;font-weight:700;letter-spacing:0.02em;color:${COLORS.accent};">Driftmark</td></tr>
<tr><td style="padding:28px;font-family:${FONT};">
<h1 style="margin:0 0 20px;font-size:22px;line-height:1.3;color:${COLORS.ink};">${escapeHtml(input.title)}</h1>
${input.intro.map(paragraph).join('\n')}
<table role="presentation" cellpadding="0" cellspacing="0" style="margin:8px 0 24px;"><tr>
<td style="border-radius:6px;background:${COLORS.accent};">
<a href="${escapeHtml(url)}" style="display:inline-block;padding:12px 22px;font-family:${FONT};font-size:16px;font-weight:600;color:#ffffff;text-decoration:none;border-radius:6px;">${escapeHtml(input.action.label)}</a>
</td></tr></table>
<p style="margin:0 0 16px;font-size:14px;line-height:1.5;color:${COLORS.muted};">If the button does not work, copy this address into your browser:<br><a href="${escapeHtml(url)}" style="color:${COLORS.accent};word-break:break-all;">${escapeHtml(url)}</a></p>
${input.after.map(paragraph).join('\n')}
</td></tr>
<tr><td style="padding:16px 28px;border-top:1px solid ${COLORS.rule};font-family:${FONT};font-size:13px;line-height:1.5;color:${COLORS.muted};">${escapeHtml(AUTOMATED_NOTE)} ${escapeHtml(input.reason)}</td></tr>
</table>
</td></tr>
</table>
</body>
</html>
`;
}

export interface TextLayoutInput {
  title: string;
  intro: string[];
  action: { label: string; url: string };
  after: string[];
  reason: string;
}

export function renderTextLayout(input: TextLayoutInput): string {
  const url = assertWebLink(input.action.url);
  return [
    'Driftmark',
    '',
    input.title,
    '',
    ...input.intro.flatMap((p) => [p, '']),
    `${input.action.label}:`,
    url,
    '',
    ...input.after.flatMap((p) => [p, '']),
    '--',
    `${AUTOMATED_NOTE} ${input.reason}`,
    '',
  ].join('\n');
}
