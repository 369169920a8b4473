import { describe, expect, it } from 'vitest';
import { futureEntryProblem, localDateTime, localInstant } from './local-time.js';

describe('localDateTime', () => {
  it('gives the athlete their own date around midnight (UTC+13 and UTC−10)', () => {
    // Tonga keeps UTC+13 all year; Honolulu UTC−10.
    expect(localDateTime(new Date('2026-12-01T10:30:00Z'), 'Pacific/Tongatapu')).toEqual({
      date: '2026-12-01',
      time: '23:30',
    });
    expect(localDateTime(new Date('2026-12-01T11:30:00Z'), 'Pacific/Tongatapu')).toEqual({
      date: '2026-12-02',
      time: '00:30',
    });
    expect(localDateTime(new Date('2026-12-02T09:30:00Z'), 'Pacific/Honolulu')).toEqual({
      date: '2026-12-01',
      time: '23:30',
    });
    // Auckland is on daylight time (UTC+13) in December.
    expect(localDateTime(new Date('2026-12-01T11:30:00Z'), 'Pacific/Auckland').date).toBe('2026-12-02');
  });
});

describe('localInstant', () => {
  it('turns a local date and time into the instant it names', () => {
    expect(localInstant('2026-12-01', '23:30', 'Pacific/Tongatapu').toISOString()).toBe(
      '2026-12-01T10:30:00.000Z',
    );
    expect(localInstant('2026-12-01', '23:30', 'Pacific/Honolulu').toISOString()).toBe(
      '2026-12-02T09:30:00.000Z',
    );
    expect(localInstant('2026-07-01', '07:05', 'Europe/Oslo').toISOString()).toBe('2026-07-01T05:05:00.000Z');
  });
});

describe('futureEntryProblem', () => {
  const now = new Date('2026-12-01T10:30:00Z'); // 23:30 on 1 Dec in Tonga, 00:30 on 1 Dec in Honolulu

  it('refuses a date after the athlete’s today', () => {
    expect(futureEntryProblem({ date: '2026-12-02', time: '00:10' }, 'Pacific/Tongatapu', now)).toEqual({
      date: 'That date is still in the future',
    });
    expect(futureEntryProblem({ date: '2026-12-02' }, 'Pacific/Honolulu', now)).toEqual({
      date: 'That date is still in the future',
    });
  });

  it('allows now plus the slack, refuses a later time today', () => {
    expect(futureEntryProblem({ date: '2026-12-01', time: '23:35' }, 'Pacific/Tongatapu', now)).toBeNull();
    expect(futureEntryProblem({ date: '2026-12-01', time: '23:36' }, 'Pacific/Tongatapu', now)).toEqual({
      time: 'That time is still in the future',
    });
    expect(futureEntryProblem({ date: '2026-12-01', time: '00:30' }, 'Pacific/Honolulu', now)).toBeNull();
    expect(futureEntryProblem({ date: '2026-12-01', time: '07:00' }, 'Pacific/Honolulu', now)).toEqual({
      time: 'That time is still in the future',
    });
  });

  it('accepts any time on an earlier day', () => {
    expect(futureEntryProblem({ date: '2026-11-30', time: '23:59' }, 'Pacific/Honolulu', now)).toBeNull();
  });
});
