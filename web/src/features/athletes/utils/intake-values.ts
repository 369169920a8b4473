import { parseTypedNumber, toTypedText } from '@driftmark/shared';
import {
  cmToIn,
  EVENT_TYPES,
  GOALS,
  inToCm,
  LIMITS,
  mlToFlOz,
  SEXES,
  volumeFromMl,
  volumeToMl,
  weightFromKg,
  weightToKg,
  type AthleteProfile,
  type VolumeUnit,
  type WeightUnit,
} from '@driftmark/shared';
// Relative on purpose: this module is unit-tested without the web app's path alias.
import { cmToFeetAndInches } from '../../../lib/format';
import { rangeInUnit } from '../../../lib/number-reader';

type Sex = (typeof SEXES)[number];
type Goal = (typeof GOALS)[number];
type EventType = (typeof EVENT_TYPES)[number];

/**
 * The intake form as the athlete types it: numbers as text in their own units. The shared
 * `intakeRequestOn` schema validates what these values become in SI (see toIntakeRequest).
 */
export interface IntakeFormValues {
  weightUnit: WeightUnit;
  volumeUnit: VolumeUnit;
  timeZone: string;
  sex: Sex | '';
  birthDate: string;
  /** Used with kg. */
  heightCm: string;
  /** Used with lb: feet and inches. */
  heightFt: string;
  heightIn: string;
  /** Body weight today, in kg or lb (weightUnit). */
  currentWeight: string;
  /** In mL or fl oz (volumeUnit). */
  usualWater: string;
  usualEnergyKcal: string;
  goal: Goal | '';
  eventType: EventType | '';
  eventName: string;
  eventDate: string;
  eventTime: string;
  eventTimeZone: string;
  division: string;
  /** In kg or lb (weightUnit). */
  weighInLimit: string;
  photoConsent: boolean;
  safetyAcknowledged: boolean;
}

export type IntakeFormField = keyof IntakeFormValues;

export const NOT_A_NUMBER = 'Enter a number, e.g. 72.5';

/** Height goes with the weight unit: centimetres beside kg, feet and inches beside lb. */
export function heightInFeet(weightUnit: WeightUnit): boolean {
  return weightUnit === 'lb';
}

/** Event types that may have a weigh-in limit (required for a weigh-in, optional for a show class). */
export function eventHasWeighIn(eventType: IntakeFormValues['eventType']): boolean {
  return eventType === 'weigh_in' || eventType === 'show';
}

function optionalText(text: string): string | undefined {
  const t = text.trim();
  return t === '' ? undefined : t;
}

export interface IntakeConversion {
  /** The request body in SI, not yet validated (the shared schema does that). */
  request: Record<string, unknown>;
  /** Boxes whose text is not a number, keyed by form field. */
  numberErrors: Partial<Record<IntakeFormField, string>>;
}

/** Form values → the intake request in SI units (kg, mL, cm) before validation. */
export function toIntakeRequest(v: IntakeFormValues): IntakeConversion {
  const numberErrors: IntakeConversion['numberErrors'] = {};
  const read = (field: IntakeFormField, text: string): number | undefined => {
    const n = parseTypedNumber(text);
    if (n !== undefined && Number.isNaN(n)) numberErrors[field] = NOT_A_NUMBER;
    return n;
  };

  let heightCm: number | undefined;
  if (heightInFeet(v.weightUnit)) {
    const ft = read('heightFt', v.heightFt);
    const inches = read('heightIn', v.heightIn);
    if (ft !== undefined || inches !== undefined) heightCm = inToCm((ft ?? 0) * 12 + (inches ?? 0));
  } else {
    heightCm = read('heightCm', v.heightCm);
  }

  const weight = read('currentWeight', v.currentWeight);
  const water = read('usualWater', v.usualWater);
  const request: Record<string, unknown> = {
    sex: v.sex || undefined,
    birthDate: optionalText(v.birthDate),
    heightCm,
    currentWeightKg: weight === undefined ? undefined : weightToKg(weight, v.weightUnit),
    usualWaterMl: water === undefined ? undefined : volumeToMl(water, v.volumeUnit),
    usualEnergyKcal: read('usualEnergyKcal', v.usualEnergyKcal),
    goal: v.goal || undefined,
    eventType: v.eventType || undefined,
    timeZone: v.timeZone,
    weightUnit: v.weightUnit,
    volumeUnit: v.volumeUnit,
    photoConsent: v.photoConsent,
    safetyAcknowledged: v.safetyAcknowledged,
  };

  if (v.eventType && v.eventType !== 'none') {
    request.eventName = optionalText(v.eventName);
    request.eventDate = optionalText(v.eventDate);
    request.eventTime = optionalText(v.eventTime);
    request.eventTimeZone = optionalText(v.eventTimeZone);
    request.division = optionalText(v.division);
    if (eventHasWeighIn(v.eventType)) {
      const limit = read('weighInLimit', v.weighInLimit);
      request.weighInLimitKg = limit === undefined ? undefined : weightToKg(limit, v.weightUnit);
    }
  }
  return { request, numberErrors };
}

/** Which box shows an error the schema (or the server) reports for an SI field. */
export function formFieldFor(path: string, weightUnit: WeightUnit): IntakeFormField | null {
  switch (path) {
    case 'heightCm':
      return heightInFeet(weightUnit) ? 'heightFt' : 'heightCm';
    case 'usualWaterMl':
      return 'usualWater';
    case 'weighInLimitKg':
      return 'weighInLimit';
    case 'currentWeightKg':
      return 'currentWeight';
    default:
      return FORM_FIELDS.has(path as IntakeFormField) ? (path as IntakeFormField) : null;
  }
}

const FORM_FIELDS = new Set<IntakeFormField>([
  'weightUnit',
  'volumeUnit',
  'timeZone',
  'sex',
  'birthDate',
  'heightCm',
  'heightFt',
  'heightIn',
  'currentWeight',
  'usualWater',
  'usualEnergyKcal',
  'goal',
  'eventType',
  'eventName',
  'eventDate',
  'eventTime',
  'eventTimeZone',
  'division',
  'weighInLimit',
  'photoConsent',
  'safetyAcknowledged',
]);

function feetInches(totalInches: number): string {
  const feet = Math.floor(totalInches / 12);
  const inches = Math.round((totalInches - feet * 12) * 10) / 10;
  return `${feet} ft ${inches} in`;
}

type RangePath = 'heightCm' | 'usualWaterMl' | 'weighInLimitKg' | 'currentWeightKg';

/** The plausible ranges in the athlete's own units, for messages they can act on. */
export function rangeInUnits(
  path: RangePath,
  units: { weightUnit: WeightUnit; volumeUnit: VolumeUnit },
): { min: string; max: string } | null {
  if (path === 'heightCm' && heightInFeet(units.weightUnit)) {
    const r = rangeInUnit(LIMITS.heightCm, cmToIn);
    return { min: feetInches(r.min), max: feetInches(r.max) };
  }
  if (path === 'usualWaterMl' && units.volumeUnit === 'floz') {
    const r = rangeInUnit(LIMITS.usualWaterMl, mlToFlOz);
    return { min: `${r.min} fl oz`, max: `${r.max} fl oz` };
  }
  if ((path === 'weighInLimitKg' || path === 'currentWeightKg') && units.weightUnit === 'lb') {
    const r = rangeInUnit(LIMITS.weightKg, (kg) => weightFromKg(kg, 'lb'));
    return { min: `${r.min} lb`, max: `${r.max} lb` };
  }
  return null;
}

const RANGE_SUBJECT: Record<RangePath, string> = {
  heightCm: 'Height',
  usualWaterMl: 'Usual water',
  weighInLimitKg: 'Weigh-in limit',
  currentWeightKg: 'Current weight',
};

/**
 * The schema's range messages are in SI ("at least 120 cm"); an athlete typing feet, fluid ounces
 * or pounds gets the same rule in their unit.
 */
export function messageInUnits(
  path: string,
  type: string,
  message: string,
  units: { weightUnit: WeightUnit; volumeUnit: VolumeUnit },
): string {
  if (!(path in RANGE_SUBJECT)) return message;
  const rangePath = path as RangePath;
  const range = rangeInUnits(rangePath, units);
  if (!range) return message;
  if (type === 'too_small') return `${RANGE_SUBJECT[rangePath]} must be at least ${range.min}`;
  if (type === 'too_big') return `${RANGE_SUBJECT[rangePath]} must be at most ${range.max}`;
  return message;
}

/** Height in cm → what the height boxes show in the given unit. */
export function heightToInputs(
  cm: number,
  weightUnit: WeightUnit,
): Pick<IntakeFormValues, 'heightCm' | 'heightFt' | 'heightIn'> {
  if (heightInFeet(weightUnit)) {
    const { feet, inches } = cmToFeetAndInches(cm, 1);
    return { heightCm: '', heightFt: String(feet), heightIn: String(inches) };
  }
  return { heightCm: toTypedText(cm, 1), heightFt: '', heightIn: '' };
}

/** Boxes rewritten when the athlete switches units, so typed values keep their meaning. */
export function convertForUnitChange(
  v: IntakeFormValues,
  next: { weightUnit: WeightUnit; volumeUnit: VolumeUnit },
): Partial<IntakeFormValues> {
  const out: Partial<IntakeFormValues> = {};
  if (next.weightUnit !== v.weightUnit) {
    const { request } = toIntakeRequest(v);
    const cm = request.heightCm;
    if (typeof cm === 'number' && Number.isFinite(cm))
      Object.assign(out, heightToInputs(cm, next.weightUnit));
    const limit = parseTypedNumber(v.weighInLimit);
    if (limit !== undefined && Number.isFinite(limit)) {
      out.weighInLimit = toTypedText(weightFromKg(weightToKg(limit, v.weightUnit), next.weightUnit), 1);
    }
    const weight = parseTypedNumber(v.currentWeight);
    if (weight !== undefined && Number.isFinite(weight)) {
      out.currentWeight = toTypedText(weightFromKg(weightToKg(weight, v.weightUnit), next.weightUnit), 1);
    }
  }
  if (next.volumeUnit !== v.volumeUnit) {
    const water = parseTypedNumber(v.usualWater);
    if (water !== undefined && Number.isFinite(water)) {
      const ml = volumeToMl(water, v.volumeUnit);
      out.usualWater = toTypedText(volumeFromMl(ml, next.volumeUnit), next.volumeUnit === 'ml' ? 0 : 1);
    }
  }
  return out;
}

/** Starting values: the saved profile when there is one (editing), else the user's settings. */
export function initialIntakeValues(
  profile: AthleteProfile | undefined,
  defaults: { weightUnit: WeightUnit; volumeUnit: VolumeUnit; timeZone: string },
): IntakeFormValues {
  const { weightUnit, volumeUnit } = defaults;
  // A first intake starts from the device's zone; a saved intake keeps what the athlete chose.
  const timeZone = profile?.intakeCompletedAt && profile.timeZone ? profile.timeZone : defaults.timeZone;
  const height =
    profile?.heightCm != null
      ? heightToInputs(profile.heightCm, weightUnit)
      : { heightCm: '', heightFt: '', heightIn: '' };
  return {
    weightUnit,
    volumeUnit,
    timeZone,
    sex: profile?.sex ?? '',
    birthDate: profile?.birthDate ?? '',
    ...height,
    currentWeight:
      profile?.intakeWeightKg != null ? toTypedText(weightFromKg(profile.intakeWeightKg, weightUnit), 1) : '',
    usualWater:
      profile?.usualWaterMl != null
        ? toTypedText(volumeFromMl(profile.usualWaterMl, volumeUnit), volumeUnit === 'ml' ? 0 : 1)
        : '',
    usualEnergyKcal: profile?.usualEnergyKcal != null ? toTypedText(profile.usualEnergyKcal, 0) : '',
    goal: profile?.goal ?? '',
    eventType: profile?.eventType ?? '',
    eventName: profile?.eventName ?? '',
    eventDate: profile?.eventDate ?? '',
    eventTime: profile?.eventTime ?? '',
    eventTimeZone: profile?.eventTimeZone ?? timeZone,
    division: profile?.division ?? '',
    weighInLimit:
      profile?.weighInLimitKg != null ? toTypedText(weightFromKg(profile.weighInLimitKg, weightUnit), 1) : '',
    photoConsent: profile?.photoConsent ?? false,
    // Agreement is given again on every save: it is stored with the text's version and time.
    safetyAcknowledged: false,
  };
}
