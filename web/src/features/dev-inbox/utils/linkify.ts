export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; text: string; href: string };

const URL_PATTERN = /https?:\/\/[^\s<>"']+/g;
/** Punctuation that ends a sentence rather than a link ("…/invite/abc)." → "…/invite/abc"). */
const TRAILING = /[).,;:!?\]]+$/;

/** Splits e-mail text into plain runs and http(s) links, so links can be shown as links. */
export function linkify(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    let url = match[0];
    const trail = TRAILING.exec(url)?.[0] ?? '';
    if (trail) url = url.slice(0, -trail.length);
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) });
    parts.push({ kind: 'link', text: url, href: url });
    last = start + url.length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}

/** The distinct links in a text, in order. */
export function linksIn(text: string): string[] {
  return [...new Set(linkify(text).flatMap((p) => (p.kind === 'link' ? [p.href] : [])))];
}
