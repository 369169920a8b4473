import { describe, expect, it } from 'vitest';
import { isLoopbackAddress } from './dev-inbox.js';

// Loopback per RFC 1122 §3.2.1.3 (127.0.0.0/8) and RFC 4291 §2.5.3 (::1); IPv4-mapped form per
// RFC 4291 §2.5.5.2, as Node reports an IPv4 peer on a dual-stack socket.
describe('isLoopbackAddress', () => {
  it.each(['127.0.0.1', '127.1.2.3', '::1', '::ffff:127.0.0.1', '0:0:0:0:0:0:0:1'])('%s is loopback', (a) => {
    expect(isLoopbackAddress(a)).toBe(true);
  });

  it.each([
    undefined,
    '',
    '10.0.0.5',
    '192.168.1.20',
    '::ffff:10.0.0.5',
    '128.0.0.1',
    '127.0.0.1.example.org',
    'fe80::1',
    '::',
    '0.0.0.0',
  ])('%s is not', (a) => {
    expect(isLoopbackAddress(a)).toBe(false);
  });
});
