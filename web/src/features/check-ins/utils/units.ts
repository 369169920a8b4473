import { toTypedText } from '@driftmark/shared';
import {
  VOLUME_UNIT_LABELS,
  volumeFromMl,
  WEIGHT_UNIT_LABELS,
  weightFromKg,
  type VolumeUnit,
  type WeightUnit,
} from '@driftmark/shared';
// Relative on purpose: these helpers are unit-tested without the web app's path alias.
import { formatNumber, NBSP } from '../../../lib/format';

/** Quick-add buttons: common glass and bottle sizes in the athlete's own unit. */
export const QUICK_VOLUMES: Record<VolumeUnit, readonly number[]> = {
  ml: [250, 500, 750],
  floz: [8, 16, 24],
};

export function quickVolumes(unit: VolumeUnit): readonly number[] {
  return QUICK_VOLUMES[unit];
}

/** The words on a quick-add button ("+250 mL", "+8 fl oz"), also its accessible name. */
export function quickVolumeLabel(value: number, unit: VolumeUnit): string {
  return `+${value} ${VOLUME_UNIT_LABELS[unit]}`;
}

/** Display rounding: weight to 0.1, fl oz to 0.1, mL whole. */
export const WEIGHT_DIGITS = 1;
export function volumeDigits(unit: VolumeUnit): number {
  return unit === 'ml' ? 0 : 1;
}

interface Entered<U extends string> {
  value: number;
  unit: U;
}

/**
 * A stored value in the reader's unit: the value exactly as typed when it was typed in that unit
 * (so 154.3 lb comes back as 154.3 lb, not 154.29999), else converted from SI.
 */
export function weightIn(
  kg: number,
  entered: Entered<WeightUnit> | null | undefined,
  unit: WeightUnit,
): number {
  return entered && entered.unit === unit ? entered.value : weightFromKg(kg, unit);
}

export function volumeIn(
  ml: number,
  entered: Entered<VolumeUnit> | null | undefined,
  unit: VolumeUnit,
): number {
  return entered && entered.unit === unit ? entered.value : volumeFromMl(ml, unit);
}

/** "72.4 kg", "159.6 lb" (one decimal, always shown). */
export function displayWeight(kg: number, entered: Entered<WeightUnit> | null | undefined, unit: WeightUnit) {
  const v = weightIn(kg, entered, unit);
  return `${formatNumber(v, WEIGHT_DIGITS, WEIGHT_DIGITS)}${NBSP}${WEIGHT_UNIT_LABELS[unit]}`;
}

/** "1,250 mL", "42.3 fl oz" (mL whole, fl oz to one decimal, trailing zero dropped). */
export function displayVolume(ml: number, entered: Entered<VolumeUnit> | null | undefined, unit: VolumeUnit) {
  const v = volumeIn(ml, entered, unit);
  return `${formatNumber(v, volumeDigits(unit))}${NBSP}${VOLUME_UNIT_LABELS[unit]}`;
}

/** What an edit box starts with: the typed value when units match, else the rounded conversion. */
export function weightInputText(
  kg: number,
  entered: Entered<WeightUnit> | null | undefined,
  unit: WeightUnit,
): string {
  if (entered && entered.unit === unit) return String(entered.value);
  return toTypedText(weightFromKg(kg, unit), WEIGHT_DIGITS);
}

export function volumeInputText(
  ml: number,
  entered: Entered<VolumeUnit> | null | undefined,
  unit: VolumeUnit,
): string {
  if (entered && entered.unit === unit) return String(entered.value);
  return toTypedText(volumeFromMl(ml, unit), volumeDigits(unit));
}
