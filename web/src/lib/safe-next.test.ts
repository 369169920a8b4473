import { describe, expect, it } from 'vitest';
import { safeNextPath } from './safe-next';

describe('safeNextPath', () => {
  it('keeps paths inside the app', () => {
    expect(safeNextPath('/coach/invitations?x=1')).toBe('/coach/invitations?x=1');
  });
  it('refuses anything that would leave the app or loop', () => {
    for (const bad of [
      'https://evil.test',
      '//evil.test',
      '/\\evil.test',
      'coach',
      '',
      null,
      '/sign-in?next=/x',
    ]) {
      expect(safeNextPath(bad, '/home')).toBe('/home');
    }
  });
});
