import { describe, expect, it } from 'vitest';
import {
  cmToFeetAndInches,
  daysBetween,
  formatDate,
  formatDaysToEvent,
  formatEnergy,
  formatHeight,
  formatNumber,
  formatVolume,
  formatWeight,
  greetingFor,
  hourIn,
  NBSP,
  todayIn,
} from './format';

describe('unit formatting', () => {
  it('prints weights in the reader unit with one decimal (1 lb = 0.45359237 kg exactly)', () => {
    expect(formatWeight(72.45, 'kg')).toBe(`72.5${NBSP}kg`);
    // 100 kg / 0.45359237 = 220.462…
    expect(formatWeight(100, 'lb')).toBe(`220.5${NBSP}lb`);
    expect(formatWeight(0.45359237, 'lb')).toBe(`1.0${NBSP}lb`);
  });

  it('prints volumes as whole mL or fl oz to one decimal (1 US fl oz = 29.5735295625 mL)', () => {
    expect(formatVolume(2800, 'ml')).toBe(`2,800${NBSP}mL`);
    // 2800 / 29.5735295625 = 94.679…
    expect(formatVolume(2800, 'floz')).toBe(`94.7${NBSP}fl oz`);
    expect(formatVolume(29.5735295625 * 16, 'floz')).toBe(`16${NBSP}fl oz`);
  });

  it('prints energy with a thousands separator', () => {
    expect(formatEnergy(2050)).toBe(`2,050${NBSP}kcal`);
    expect(formatEnergy(1999.6)).toBe(`2,000${NBSP}kcal`);
  });

  it('never prints a negative zero', () => {
    expect(formatNumber(-0.0001, 1)).toBe('0');
  });

  it('splits centimetres into feet and inches with the carry (1 in = 2.54 cm)', () => {
    expect(cmToFeetAndInches(182.88)).toEqual({ feet: 6, inches: 0 });
    expect(cmToFeetAndInches(168)).toEqual({ feet: 5, inches: 6 }); // 66.14 in
    // 182.7 cm = 71.93 in → rounds to 72 in → 6 ft 0 in, not 5 ft 12 in
    expect(cmToFeetAndInches(182.7)).toEqual({ feet: 6, inches: 0 });
    expect(cmToFeetAndInches(178, 1)).toEqual({ feet: 5, inches: 10.1 }); // 70.08 in
  });

  it('prints height in cm beside kg and ft/in beside lb', () => {
    expect(formatHeight(168, 'kg')).toBe(`168${NBSP}cm`);
    expect(formatHeight(168, 'lb')).toBe(`5${NBSP}ft 6${NBSP}in`);
  });
});

describe('dates', () => {
  it('formats a calendar date without shifting it by a time zone', () => {
    expect(formatDate('2027-05-02')).toBe('Sun 2 May 2027');
    expect(formatDate('2026-12-31', 'short')).toBe('31 Dec 2026');
  });

  it('reads today in the athlete time zone, not the device one', () => {
    const instant = new Date('2026-12-01T23:30:00Z');
    expect(todayIn('UTC', instant)).toBe('2026-12-01');
    expect(todayIn('Pacific/Auckland', instant)).toBe('2026-12-02');
    expect(todayIn('America/Los_Angeles', instant)).toBe('2026-12-01');
    expect(hourIn('Pacific/Auckland', instant)).toBe(12);
  });

  it('counts whole days between dates, across a daylight-saving change', () => {
    expect(daysBetween('2026-12-01', '2026-12-07')).toBe(6);
    expect(daysBetween('2027-03-27', '2027-03-29')).toBe(2);
    expect(daysBetween('2026-12-07', '2026-12-01')).toBe(-6);
  });

  it('words the countdown', () => {
    expect(formatDaysToEvent(6)).toBe('6 days to go');
    expect(formatDaysToEvent(1)).toBe('1 day to go');
    expect(formatDaysToEvent(0)).toBe('Event day');
    expect(formatDaysToEvent(-3)).toBe('3 days ago');
  });

  it('greets by the clock', () => {
    expect(greetingFor(7)).toBe('Good morning');
    expect(greetingFor(13)).toBe('Good afternoon');
    expect(greetingFor(21)).toBe('Good evening');
    expect(greetingFor(2)).toBe('Good evening');
  });
});
