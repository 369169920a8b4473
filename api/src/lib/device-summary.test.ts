import { describe, expect, it } from 'vitest';
import { deviceSummary, UNKNOWN_DEVICE } from './device-summary.js';

describe('deviceSummary', () => {
  // The example strings of MDN's "User-Agent" HTTP header reference (developer.mozilla.org,
  // Web/HTTP/Headers/User-Agent): the two Firefox strings and the reduced Chrome-on-Android one
  // checked against the page, the others as remembered from it (from memory).
  it.each([
    ['Mozilla/5.0 (Windows NT 6.1; Win64; x64; rv:47.0) Gecko/20100101 Firefox/47.0', 'Firefox on Windows'],
    ['Mozilla/5.0 (Macintosh; Intel Mac OS X x.y; rv:42.0) Gecko/20100101 Firefox/42.0', 'Firefox on Mac'],
    [
      'Mozilla/5.0 (X11; Linux x86_64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/51.0.2704.103 Safari/537.36',
      'Chrome on Linux',
    ],
    [
      'Mozilla/5.0 (Windows NT 10.0; Win64; x64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/51.0.2704.106 Safari/537.36 OPR/38.0.2220.41',
      'Opera on Windows',
    ],
    [
      'Mozilla/5.0 (Windows NT 10.0; Win64; x64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/91.0.4472.124 Safari/537.36 Edg/91.0.864.59',
      'Edge on Windows',
    ],
    [
      'Mozilla/5.0 (iPhone; CPU iPhone OS 13_5_1 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/13.1.1 Mobile/15E148 Safari/604.1',
      'Safari on iPhone',
    ],
    [
      'Mozilla/5.0 (Linux; Android 10; K) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/143.0.0.0 Mobile Safari/537.36',
      'Chrome on Android',
    ],
    ['curl/7.64.1', 'curl'],
  ])('%s → %s', (ua, expected) => {
    expect(deviceSummary(ua)).toBe(expected);
  });

  it('names a missing or unreadable agent as unknown', () => {
    expect(deviceSummary(null)).toBe(UNKNOWN_DEVICE);
    expect(deviceSummary('')).toBe(UNKNOWN_DEVICE);
    expect(deviceSummary('something/1.0')).toBe(UNKNOWN_DEVICE);
  });
});
