/**
 * Exact conversion factors (1959 international yard and pound agreement; NIST SP 811 App. B).
 * Values are stored in SI (kg, mL, cm) and converted only at the edges; round only for display.
 */
export const KG_PER_LB = 0.45359237;
export const ML_PER_US_FL_OZ = 29.5735295625;
export const CM_PER_IN = 2.54;

export const WEIGHT_UNITS = ['kg', 'lb'] as const;
export type WeightUnit = (typeof WEIGHT_UNITS)[number];
export const VOLUME_UNITS = ['ml', 'floz'] as const;
export type VolumeUnit = (typeof VOLUME_UNITS)[number];

export const lbToKg = (lb: number): number => lb * KG_PER_LB;
export const kgToLb = (kg: number): number => kg / KG_PER_LB;
export const flOzToMl = (floz: number): number => floz * ML_PER_US_FL_OZ;
export const mlToFlOz = (ml: number): number => ml / ML_PER_US_FL_OZ;
export const inToCm = (inches: number): number => inches * CM_PER_IN;
export const cmToIn = (cm: number): number => cm / CM_PER_IN;

/** Weight in the viewer's unit → kg. */
export function weightToKg(value: number, unit: WeightUnit): number {
  return unit === 'kg' ? value : lbToKg(value);
}
/** kg → the viewer's unit. */
export function weightFromKg(kg: number, unit: WeightUnit): number {
  return unit === 'kg' ? kg : kgToLb(kg);
}
/** Volume in the viewer's unit → mL. */
export function volumeToMl(value: number, unit: VolumeUnit): number {
  return unit === 'ml' ? value : flOzToMl(value);
}
/** mL → the viewer's unit. */
export function volumeFromMl(ml: number, unit: VolumeUnit): number {
  return unit === 'ml' ? ml : mlToFlOz(ml);
}

/** Body lengths (circumferences, height): centimetres, or inches for those who weigh in pounds. */
export const LENGTH_UNITS = ['cm', 'in'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];
/** Lengths go with the weight unit: cm beside kg, inches beside lb. */
export function lengthUnitFor(weightUnit: WeightUnit): LengthUnit {
  return weightUnit === 'lb' ? 'in' : 'cm';
}
/** Length in the viewer's unit → cm. */
export function lengthToCm(value: number, unit: LengthUnit): number {
  return unit === 'cm' ? value : inToCm(value);
}
/** cm → the viewer's unit. */
export function lengthFromCm(cm: number, unit: LengthUnit): number {
  return unit === 'cm' ? cm : cmToIn(cm);
}

export const WEIGHT_UNIT_LABELS: Record<WeightUnit, string> = { kg: 'kg', lb: 'lb' };
export const VOLUME_UNIT_LABELS: Record<VolumeUnit, string> = { ml: 'mL', floz: 'fl oz' };
export const LENGTH_UNIT_LABELS: Record<LengthUnit, string> = { cm: 'cm', in: 'in' };
