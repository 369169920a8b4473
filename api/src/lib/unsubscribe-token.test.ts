import jwt from 'jsonwebtoken';
import { describe, expect, it } from 'vitest';
import { signUnsubscribeToken, verifyUnsubscribeToken } from './unsubscribe-token.js';

const secret = '0123456789abcdef0123456789abcdef';
const userId = '6f1c2a4e-8d1b-4c1e-9a55-0b6a3c1f2d3e';

describe('unsubscribe tokens', () => {
  it('round-trips the user and kind', () => {
    const token = signUnsubscribeToken(userId, 'morning_reminder', secret);
    expect(verifyUnsubscribeToken(token, secret)).toEqual({ userId, kind: 'morning_reminder' });
  });

  it('refuses another secret, a changed token, another audience and an unknown kind', () => {
    const token = signUnsubscribeToken(userId, 'weekly_summary', secret);
    expect(verifyUnsubscribeToken(token, `${secret}x`)).toBeNull();
    expect(verifyUnsubscribeToken(`${token.slice(0, -2)}xx`, secret)).toBeNull();
    expect(
      verifyUnsubscribeToken(jwt.sign({ sub: userId, kind: 'weekly_summary' }, secret), secret),
    ).toBeNull();
    const odd = jwt.sign({ sub: userId, kind: 'everything' }, secret, { audience: 'driftmark:unsubscribe' });
    expect(verifyUnsubscribeToken(odd, secret)).toBeNull();
    expect(verifyUnsubscribeToken('', secret)).toBeNull();
  });
});
