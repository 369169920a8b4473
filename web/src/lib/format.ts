import { utcMidnight } from '@driftmark/shared';
import {
  cmToIn,
  VOLUME_UNIT_LABELS,
  volumeFromMl,
  WEIGHT_UNIT_LABELS,
  weightFromKg,
  type VolumeUnit,
  type WeightUnit,
} from '@driftmark/shared';

/**
 * Display formatting. Values arrive in SI and are converted and rounded here, at the edge, only
 * for reading. Day-month-year order keeps dates unambiguous for every reader.
 */
export const DISPLAY_LOCALE = 'en-GB';

/** Non-breaking space between a figure and its unit, so "72.4 kg" never wraps apart. */
export const NBSP = '\u00a0';

const numberFormats = new Map<string, Intl.NumberFormat>();

export function formatNumber(value: number, maxFractionDigits = 0, minFractionDigits = 0): string {
  const key = `${maxFractionDigits}:${minFractionDigits}`;
  let fmt = numberFormats.get(key);
  if (!fmt) {
    fmt = new Intl.NumberFormat(DISPLAY_LOCALE, {
      maximumFractionDigits: maxFractionDigits,
      minimumFractionDigits: minFractionDigits,
      // A value that rounds to zero prints "0", never "-0".
      signDisplay: 'negative',
    });
    numberFormats.set(key, fmt);
  }
  return fmt.format(value);
}

/** Body weight or a weigh-in limit, in the reader's unit, one decimal. */
export function formatWeight(kg: number, unit: WeightUnit, digits = 1): string {
  return `${formatNumber(weightFromKg(kg, unit), digits, digits)}${NBSP}${WEIGHT_UNIT_LABELS[unit]}`;
}

/** A volume: whole millilitres, or US fluid ounces to one decimal. */
export function formatVolume(ml: number, unit: VolumeUnit): string {
  const digits = unit === 'ml' ? 0 : 1;
  return `${formatNumber(volumeFromMl(ml, unit), digits)}${NBSP}${VOLUME_UNIT_LABELS[unit]}`;
}

export function formatEnergy(kcal: number): string {
  return `${formatNumber(kcal, 0)}${NBSP}kcal`;
}

/** Whole feet and the remaining inches, rounded to `inchDigits` with the carry into feet. */
export function cmToFeetAndInches(cm: number, inchDigits = 0): { feet: number; inches: number } {
  const factor = 10 ** inchDigits;
  const totalInches = Math.round(cmToIn(cm) * factor) / factor;
  let feet = Math.floor(totalInches / 12);
  let inches = Math.round((totalInches - feet * 12) * factor) / factor;
  if (inches >= 12) {
    feet += 1;
    inches -= 12;
  }
  return { feet, inches };
}

/** Height: centimetres with metric weights, feet and inches with pounds. */
export function formatHeight(cm: number, weightUnit: WeightUnit): string {
  if (weightUnit === 'kg') return `${formatNumber(cm, 0)}${NBSP}cm`;
  const { feet, inches } = cmToFeetAndInches(cm);
  return `${feet}${NBSP}ft ${inches}${NBSP}in`;
}

const isoDateToUtc = utcMidnight;

/** A calendar date (YYYY-MM-DD, no time zone) such as "Sun 2 May 2027". */
export function formatDate(isoDate: string, style: 'long' | 'short' = 'long'): string {
  const opts: Intl.DateTimeFormatOptions =
    style === 'long'
      ? { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }
      : { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' };
  return new Intl.DateTimeFormat(DISPLAY_LOCALE, opts).format(isoDateToUtc(isoDate)).replace(',', '');
}

/** An instant (ISO timestamp) in a time zone, e.g. "2 Dec 2026, 09:14". */
export function formatDateTime(iso: string, timeZone?: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return new Intl.DateTimeFormat(DISPLAY_LOCALE, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
  }).format(d);
}

/** The calendar date of an instant in a time zone, e.g. "9 Dec 2026". */
export function formatInstantDate(iso: string, timeZone?: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return new Intl.DateTimeFormat(DISPLAY_LOCALE, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone,
  }).format(d);
}

/** The hour (0–23) on a clock in `timeZone`. */
export function hourIn(timeZone: string, now: Date = new Date()): number {
  const h = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', hourCycle: 'h23' }).format(now);
  return Number(h);
}

/** "6 days to go", "1 day to go", "Event day", "3 days ago". */
export function formatDaysToEvent(days: number): string {
  if (days === 0) return 'Event day';
  if (days > 0) return `${formatNumber(days)} ${days === 1 ? 'day' : 'days'} to go`;
  const ago = -days;
  return `${formatNumber(ago)} ${ago === 1 ? 'day' : 'days'} ago`;
}

export function greetingFor(hour: number): string {
  if (hour < 5) return 'Good evening';
  if (hour < 12) return 'Good morning';
  if (hour < 18) return 'Good afternoon';
  return 'Good evening';
}

/** First name for greetings: the first word of a display name. */
export function firstName(name: string): string {
  return name.trim().split(/\s+/)[0] ?? name;
}

/** Clock time "HH:MM" in 24 h stays as typed; this only guards against missing values. */
export function formatClock(time: string | null | undefined): string | null {
  return time && /^\d{2}:\d{2}$/.test(time) ? time : null;
}

// Calendar dates and today in a zone: one implementation, in shared/src/calendar.ts.
export { daysBetween, todayIn } from '@driftmark/shared';
