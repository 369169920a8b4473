import { describe, expect, it } from 'vitest';
import { linkify, linksIn } from './linkify';

describe('linkify', () => {
  it('finds links and leaves sentence punctuation outside them', () => {
    const text = 'Open http://127.0.0.1:3000/invite/abc123. Or (https://x.test/reset?token=t).';
    expect(linksIn(text)).toEqual(['http://127.0.0.1:3000/invite/abc123', 'https://x.test/reset?token=t']);
    const parts = linkify(text);
    expect(parts.map((p) => p.text).join('')).toBe(text);
    expect(parts.filter((p) => p.kind === 'link')).toHaveLength(2);
  });
  it('returns plain text when there is no link', () => {
    expect(linkify('Hello')).toEqual([{ kind: 'text', text: 'Hello' }]);
  });
});
