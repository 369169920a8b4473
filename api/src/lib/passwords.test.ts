import { LIMITS, newPassword, passwordFitsHash, utf8Bytes } from '@driftmark/shared';
import bcrypt from 'bcryptjs';
import { describe, expect, it } from 'vitest';
import { verifyPassword } from './passwords.js';

// Reference: bcryptjs's own `truncates()` ("its length is greater than 72 bytes when converted to
// UTF-8", bcryptjs 3 README) and Node's Buffer.byteLength for UTF-8.
const samples = [
  'a'.repeat(72),
  'a'.repeat(73),
  'é'.repeat(36),
  'é'.repeat(36) + 'a',
  '🏋️'.repeat(10),
  'x'.repeat(70) + '€',
  'correct horse battery staple',
  '\ud800'.repeat(25),
];

describe('password byte limit', () => {
  it.each(samples)('agrees with bcryptjs.truncates and Buffer.byteLength for %s', (pw) => {
    expect(utf8Bytes(pw)).toBe(Buffer.byteLength(pw, 'utf8'));
    expect(passwordFitsHash(pw)).toBe(!bcrypt.truncates(pw));
  });

  it('refuses a new password over 72 bytes with a message naming bytes, though it has under 72 characters', () => {
    const pw = 'é'.repeat(40); // 40 characters, 80 bytes
    const r = newPassword.safeParse(pw);
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.message).toMatch(/At most 72 bytes/);
    expect(newPassword.safeParse('é'.repeat(36)).success).toBe(true);
    expect(LIMITS.password.maxBytes).toBe(72);
  });

  it('never matches a password over 72 bytes, even one whose first 72 bytes are right', async () => {
    const base = 'p'.repeat(72);
    const hash = await bcrypt.hash(base, 4);
    // bcryptjs itself would accept the longer one (it reads only 72 bytes) …
    expect(await bcrypt.compare(`${base}-other-tail`, hash)).toBe(true);
    // … ours does not.
    expect(await verifyPassword(`${base}-other-tail`, hash)).toBe(false);
    expect(await verifyPassword(base, hash)).toBe(true);
  });
});
