import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { chooseDataRoot, fallbackDataRoot, pathChain } from './data-root.js';
import { newestVersion } from './pg-binaries.js';

describe('chooseDataRoot', () => {
  it('uses <repo>/.data when the postgres user can traverse the checkout', () => {
    expect(chooseDataRoot('/work/main', true).dir).toBe('/work/main/.data');
  });

  it('falls back to /var/tmp/driftmark-<sha1 of the repo path, 12 hex> otherwise', () => {
    const digest = createHash('sha1').update('/root/driftmark').digest('hex').slice(0, 12);
    expect(chooseDataRoot('/root/driftmark', false)).toEqual({
      dir: `/var/tmp/driftmark-${digest}`,
      reason: 'the postgres user cannot traverse every folder above /root/driftmark/.data',
    });
  });

  it('falls back when the socket path would exceed the unix socket limit', () => {
    const deep = `/home/${'nested/'.repeat(12)}driftmark`;
    expect(chooseDataRoot(deep, true).dir).toBe(fallbackDataRoot(deep));
  });

  it('keys the fallback by the resolved checkout path', () => {
    expect(fallbackDataRoot('/root/a/../driftmark')).toBe(fallbackDataRoot('/root/driftmark'));
    expect(fallbackDataRoot('/root/one')).not.toBe(fallbackDataRoot('/root/two'));
  });
});

describe('pathChain', () => {
  it('lists every folder from / down to the target', () => {
    expect(pathChain('/root/src/driftmark')).toEqual(['/', '/root', '/root/src', '/root/src/driftmark']);
    expect(pathChain('/')).toEqual(['/']);
  });
});

describe('newestVersion', () => {
  it('orders major versions numerically, like ls -v', () => {
    expect(newestVersion(['9.6', '15', '13', '17'])).toBe('17');
    expect(newestVersion(['9.6', '10'])).toBe('10');
    expect(newestVersion([])).toBeUndefined();
  });
});
