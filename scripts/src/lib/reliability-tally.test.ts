import { describe, expect, it } from 'vitest';
import { crc32, formatResult, scenarioFailed, tally, type WriteRecord } from './reliability-tally.js';

const write = (key: string, acknowledged: boolean, sent = 1): WriteRecord => ({ key, sent, acknowledged });

describe('tally', () => {
  it('counts an acknowledged write without a row as lost, and fails on it', () => {
    const result = tally('x', [write('a', true), write('b', true, 3)], new Map([['a', 1]]), true);
    expect(result).toMatchObject({ sent: 4, acknowledged: 2, present: 1, lost: 1, duplicated: 0 });
    expect(scenarioFailed(result)).toBe(true);
  });

  it('lets an unacknowledged write be present or absent (an aborted request may have landed)', () => {
    const result = tally('x', [write('a', false), write('b', false)], new Map([['a', 1]]), true);
    expect(result).toMatchObject({ acknowledged: 0, present: 1, lost: 0 });
    expect(scenarioFailed(result)).toBe(false);
  });

  it('fails on a second row only where exactly once is promised', () => {
    const rows = new Map([['a', 2]]);
    expect(scenarioFailed(tally('ids', [write('a', true)], rows, true))).toBe(true);
    const mail = tally('mail', [write('a', true)], rows, false);
    expect(mail.duplicated).toBe(1);
    expect(scenarioFailed(mail)).toBe(false);
  });

  it('prints the figures on one line, marked ok or FAIL', () => {
    const result = tally('b. restart', [write('a', true, 2)], new Map([['a', 1]]), true);
    result.serverErrors = 1;
    result.unavailable503 = 1;
    expect(formatResult(result)).toBe(
      'ok   b. restart: sent 2 / acknowledged 1 / present 1 / lost 0 / duplicated 0 / 5xx 1 (503 with Retry-After: 1)',
    );
  });
});

describe('crc32', () => {
  it('gives the CRC every PNG IEND chunk carries', () => {
    // PNG spec (W3C 2003), 11.2.5: IEND has no data, so every file ends with the CRC AE 42 60 82.
    expect(crc32(Buffer.from('IEND', 'ascii'))).toBe(0xae426082);
  });

  it('gives the check value of CRC-32/ISO-HDLC', () => {
    // The standard check input "123456789" (Williams, "A painless guide to CRC error detection
    // algorithms", 1993; the CRC RevEng catalogue lists check=0xcbf43926 for CRC-32/ISO-HDLC).
    expect(crc32(Buffer.from('123456789', 'ascii'))).toBe(0xcbf43926);
  });
});
