import jwt from 'jsonwebtoken';
import { describe, expect, it } from 'vitest';
import { signSessionToken, verifySessionToken } from './session-token.js';

const secret = 's'.repeat(40);
const now = new Date('2026-03-01T08:00:00Z');

describe('session tokens', () => {
  it('round-trips user and session ids with the given issue and expiry times (HS256)', () => {
    const expiresAt = new Date(now.getTime() + 15 * 60_000);
    const token = signSessionToken(
      { userId: 'user-1', sessionId: 'session-1', issuedAt: now, expiresAt },
      secret,
    );
    expect(jwt.decode(token, { complete: true })?.header.alg).toBe('HS256');
    expect(verifySessionToken(token, secret, now)).toEqual({
      sub: 'user-1',
      sid: 'session-1',
      iat: now.getTime() / 1000,
      exp: expiresAt.getTime() / 1000,
      expired: false,
    });
  });

  it('reads expiry against the given clock: an expired token still names its session', () => {
    const token = signSessionToken(
      { userId: 'u', sessionId: 's', issuedAt: now, expiresAt: new Date(now.getTime() + 60_000) },
      secret,
    );
    expect(verifySessionToken(token, secret, new Date(now.getTime() + 59_000))?.expired).toBe(false);
    expect(verifySessionToken(token, secret, new Date(now.getTime() + 60_000))).toMatchObject({
      sid: 's',
      expired: true,
    });
  });

  it('rejects a wrong secret, another algorithm and garbage', () => {
    const token = signSessionToken(
      { userId: 'u', sessionId: 's', issuedAt: now, expiresAt: new Date(now.getTime() + 60_000) },
      secret,
    );
    expect(verifySessionToken(token, 't'.repeat(40), now)).toBeNull();
    const hs512 = jwt.sign({ sid: 's' }, secret, { subject: 'u', algorithm: 'HS512', expiresIn: 60 });
    expect(verifySessionToken(hs512, secret, now)).toBeNull();
    const none = jwt.sign({ sid: 's', iat: 1, exp: 2 }, '', { subject: 'u', algorithm: 'none' });
    expect(verifySessionToken(none, secret, now)).toBeNull();
    expect(verifySessionToken('garbage', secret, now)).toBeNull();
  });

  it('reads tokens jsonwebtoken signs with the plain secret, and the other way round (the cached key is the same HMAC key)', () => {
    // jsonwebtoken is the reference: a string secret is the HMAC key as its UTF-8 bytes (RFC 7518 §3.2).
    const exp = Math.floor(now.getTime() / 1000) + 60;
    const plain = jwt.sign({ sid: 's', exp }, secret, { subject: 'u', algorithm: 'HS256' });
    expect(verifySessionToken(plain, secret, now)).toMatchObject({ sub: 'u', sid: 's', exp, expired: false });
    const ours = signSessionToken(
      { userId: 'u', sessionId: 's', issuedAt: now, expiresAt: new Date(exp * 1000) },
      secret,
    );
    expect(jwt.verify(ours, secret, { algorithms: ['HS256'], ignoreExpiration: true })).toMatchObject({
      sub: 'u',
      sid: 's',
      exp,
    });
    // A second secret gets its own key.
    expect(verifySessionToken(plain, 'u'.repeat(40), now)).toBeNull();
  });
});
