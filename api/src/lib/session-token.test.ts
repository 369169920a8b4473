import jwt from 'jsonwebtoken';
import { describe, expect, it } from 'vitest';
import { signSessionToken, verifySessionToken } from './session-token.js';

const secret = 's'.repeat(40);

describe('session tokens', () => {
  it('round-trips user and session ids with the given expiry (HS256)', () => {
    const expiresAt = new Date(Date.now() + 15 * 60_000);
    const token = signSessionToken({ userId: 'user-1', sessionId: 'session-1', expiresAt }, secret);
    expect(jwt.decode(token, { complete: true })?.header.alg).toBe('HS256');
    const claims = verifySessionToken(token, secret);
    expect(claims).toMatchObject({
      sub: 'user-1',
      sid: 'session-1',
      exp: Math.floor(expiresAt.getTime() / 1000),
    });
  });

  it('rejects a wrong secret, an expired token and another algorithm', () => {
    const token = signSessionToken(
      { userId: 'u', sessionId: 's', expiresAt: new Date(Date.now() + 60_000) },
      secret,
    );
    expect(verifySessionToken(token, 't'.repeat(40))).toBeNull();
    const expired = jwt.sign({ sid: 's', iat: 1, exp: 2 }, secret, { subject: 'u' });
    expect(verifySessionToken(expired, secret)).toBeNull();
    const hs512 = jwt.sign({ sid: 's' }, secret, { subject: 'u', algorithm: 'HS512', expiresIn: 60 });
    expect(verifySessionToken(hs512, secret)).toBeNull();
    expect(verifySessionToken('garbage', secret)).toBeNull();
  });

  it('reads tokens jsonwebtoken signs with the plain secret, and the other way round (the cached key is the same HMAC key)', () => {
    // jsonwebtoken is the reference: a string secret is the HMAC key as its UTF-8 bytes (RFC 7518 §3.2).
    const exp = Math.floor(Date.now() / 1000) + 60;
    const plain = jwt.sign({ sid: 's', exp }, secret, { subject: 'u', algorithm: 'HS256' });
    expect(verifySessionToken(plain, secret)).toMatchObject({ sub: 'u', sid: 's', exp });
    const ours = signSessionToken({ userId: 'u', sessionId: 's', expiresAt: new Date(exp * 1000) }, secret);
    expect(jwt.verify(ours, secret, { algorithms: ['HS256'] })).toMatchObject({ sub: 'u', sid: 's', exp });
    // A second secret gets its own key.
    expect(verifySessionToken(plain, 'u'.repeat(40))).toBeNull();
  });
});
