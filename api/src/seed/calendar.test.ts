import { describe, expect, it } from 'vitest';
import { addDays, daysBetween, localDate } from './calendar.js';

describe('calendar', () => {
  it('gives the local date in far-apart zones', () => {
    const at = new Date('2026-12-01T11:30:00Z');
    expect(localDate(at, 'Pacific/Auckland')).toBe('2026-12-02');
    expect(localDate(at, 'Pacific/Honolulu')).toBe('2026-12-01');
    expect(localDate(new Date('2026-12-01T09:30:00Z'), 'Pacific/Honolulu')).toBe('2026-11-30');
  });

  it('adds days across month and year ends', () => {
    expect(addDays('2026-12-30', 4)).toBe('2027-01-03');
    expect(addDays('2028-03-01', -1)).toBe('2028-02-29');
    expect(daysBetween('2026-12-30', '2027-01-03')).toBe(4);
  });
});
