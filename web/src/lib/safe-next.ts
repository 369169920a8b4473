/**
 * The `next` query value after sign-in, only when it is a path inside this app: an absolute URL,
 * a protocol-relative `//host` or a back-slash trick would send the user elsewhere.
 */
export function safeNextPath(next: string | null | undefined, fallback = '/'): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  if (/[\u0000-\u001f]/.test(next)) return fallback;
  const path = next.split(/[?#]/)[0] ?? '';
  if (path === '/sign-in') return fallback;
  return next;
}
