import { parseTypedNumber } from '@driftmark/shared';
import { intakeRequestOn, type AthleteProfile } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { createIntakeResolver } from './intake-resolver';
import {
  convertForUnitChange,
  formFieldFor,
  initialIntakeValues,
  messageInUnits,
  NOT_A_NUMBER,
  rangeInUnits,
  toIntakeRequest,
  type IntakeFormValues,
} from './intake-values';

const metric: IntakeFormValues = {
  weightUnit: 'kg',
  volumeUnit: 'ml',
  timeZone: 'Europe/Lisbon',
  sex: 'female',
  birthDate: '1997-08-21',
  heightCm: '168',
  heightFt: '',
  heightIn: '',
  currentWeight: '64.8',
  usualWater: '2800',
  usualEnergyKcal: '2050',
  goal: 'lose',
  eventType: 'weigh_in',
  eventName: '  Harbour Open ',
  eventDate: '2027-05-02',
  eventTime: '08:30',
  eventTimeZone: 'Europe/Lisbon',
  division: '-63 kg',
  weighInLimit: '63',
  photoConsent: true,
  safetyAcknowledged: true,
};

const imperial: IntakeFormValues = {
  ...metric,
  weightUnit: 'lb',
  volumeUnit: 'floz',
  heightCm: '',
  heightFt: '5',
  heightIn: '6',
  usualWater: '96',
  weighInLimit: '139',
  currentWeight: '143',
};

describe('parseTypedNumber', () => {
  it('reads plain numbers and a decimal comma', () => {
    expect(parseTypedNumber(' 72.5 ')).toBe(72.5);
    expect(parseTypedNumber('72,5')).toBe(72.5);
    expect(parseTypedNumber('')).toBeUndefined();
    expect(parseTypedNumber('abc')).toBeNaN();
    expect(parseTypedNumber('1e3')).toBeNaN();
  });
});

describe('toIntakeRequest', () => {
  it('keeps metric values as typed and trims text', () => {
    const { request, numberErrors } = toIntakeRequest(metric);
    expect(numberErrors).toEqual({});
    expect(request).toMatchObject({
      heightCm: 168,
      currentWeightKg: 64.8,
      usualWaterMl: 2800,
      usualEnergyKcal: 2050,
      weighInLimitKg: 63,
      eventName: 'Harbour Open',
    });
    expect(intakeRequestOn('2026-06-01').safeParse(request).success).toBe(true);
  });

  it('converts feet/inches, fluid ounces and pounds to SI with the exact factors', () => {
    const { request } = toIntakeRequest(imperial);
    // 66 in × 2.54 = 167.64 cm; 96 fl oz × 29.5735295625 = 2839.0588… mL; 139 lb × 0.45359237 = 63.0493… kg
    expect(request.heightCm).toBeCloseTo(167.64, 10);
    expect(request.usualWaterMl).toBeCloseTo(2839.058838, 5);
    expect(request.weighInLimitKg).toBeCloseTo(63.04933943, 7);
    // 143 lb × 0.45359237 = 64.86370891 kg
    expect(request.currentWeightKg).toBeCloseTo(64.86370891, 7);
  });

  it('drops every event field when there is no event', () => {
    const { request } = toIntakeRequest({ ...metric, eventType: 'none' });
    expect(request).not.toHaveProperty('eventDate');
    expect(request).not.toHaveProperty('weighInLimitKg');
    expect(request).not.toHaveProperty('division');
  });

  it('drops the weigh-in limit for a photo shoot and sends blanks as absent', () => {
    const { request } = toIntakeRequest({ ...metric, eventType: 'shoot', eventTime: '', division: ' ' });
    expect(request).not.toHaveProperty('weighInLimitKg');
    expect(request.eventTime).toBeUndefined();
    expect(request.division).toBeUndefined();
  });

  it('flags text that is not a number', () => {
    expect(toIntakeRequest({ ...metric, heightCm: '1,68m' }).numberErrors).toEqual({
      heightCm: NOT_A_NUMBER,
    });
  });
});

describe('messages in the athlete units', () => {
  it('states the shared ranges in ft/in, fl oz and lb', () => {
    const units = { weightUnit: 'lb', volumeUnit: 'floz' } as const;
    // 120 cm = 47.24 in → 47.3 in (rounded inside the range); 230 cm = 90.55 in → 90.5 in
    expect(rangeInUnits('heightCm', units)).toEqual({ min: '3 ft 11.3 in', max: '7 ft 6.5 in' });
    // 500 mL = 16.91 fl oz; 12000 mL = 405.77 fl oz
    expect(rangeInUnits('usualWaterMl', units)).toEqual({ min: '17 fl oz', max: '405.7 fl oz' });
    // 25 kg = 55.12 lb; 300 kg = 661.39 lb
    expect(rangeInUnits('weighInLimitKg', units)).toEqual({ min: '55.2 lb', max: '661.3 lb' });
    expect(messageInUnits('heightCm', 'too_small', 'Height must be at least 120 cm', units)).toBe(
      'Height must be at least 3 ft 11.3 in',
    );
    expect(
      messageInUnits('heightCm', 'too_small', 'Height must be at least 120 cm', {
        weightUnit: 'kg',
        volumeUnit: 'ml',
      }),
    ).toBe('Height must be at least 120 cm');
  });

  it('puts SI field errors on the box the athlete typed into', () => {
    expect(formFieldFor('heightCm', 'kg')).toBe('heightCm');
    expect(formFieldFor('heightCm', 'lb')).toBe('heightFt');
    expect(formFieldFor('usualWaterMl', 'kg')).toBe('usualWater');
    expect(formFieldFor('weighInLimitKg', 'lb')).toBe('weighInLimit');
    expect(formFieldFor('eventDate', 'kg')).toBe('eventDate');
    expect(formFieldFor('nonsense', 'kg')).toBeNull();
  });
});

describe('switching units', () => {
  it('rewrites typed values so they keep their meaning', () => {
    expect(convertForUnitChange(metric, { weightUnit: 'lb', volumeUnit: 'floz' })).toEqual({
      heightCm: '',
      heightFt: '5',
      heightIn: '6.1', // 168 cm = 66.14 in
      weighInLimit: '138.9', // 63 kg = 138.89 lb
      currentWeight: '142.9', // 64.8 kg = 142.86 lb
      usualWater: '94.7', // 2800 mL = 94.68 fl oz
    });
    expect(convertForUnitChange(imperial, { weightUnit: 'kg', volumeUnit: 'ml' })).toEqual({
      heightCm: '167.6',
      heightFt: '',
      heightIn: '',
      weighInLimit: '63', // 139 lb = 63.05 kg
      currentWeight: '64.9', // 143 lb = 64.86 kg
      usualWater: '2839',
    });
  });
});

describe('initialIntakeValues', () => {
  const profile: AthleteProfile = {
    id: '00000000-0000-4000-8000-000000000001',
    userId: '00000000-0000-4000-8000-000000000002',
    name: 'A',
    email: 'a@x.test',
    status: 'active',
    coach: { id: '00000000-0000-4000-8000-000000000003', name: 'C' },
    sex: 'male',
    birthDate: '1990-01-01',
    heightCm: 180,
    intakeWeightKg: 82,
    usualWaterMl: 3000,
    usualEnergyKcal: 2600,
    goal: 'maintain',
    eventType: 'show',
    eventName: 'Classic',
    eventDate: '2027-01-01',
    eventTime: null,
    eventTimeZone: 'Europe/Berlin',
    division: 'Classic physique',
    weighInLimitKg: null,
    timeZone: 'Europe/Berlin',
    units: { weight: 'kg', volume: 'ml' },
    photoConsent: true,
    intakeCompletedAt: '2026-11-01T10:00:00Z',
    countdownMismatch: null,
  };

  it('starts a first intake from the device time zone and the user units', () => {
    const v = initialIntakeValues(undefined, { weightUnit: 'kg', volumeUnit: 'ml', timeZone: 'Asia/Tokyo' });
    expect(v.timeZone).toBe('Asia/Tokyo');
    expect(v.eventTimeZone).toBe('Asia/Tokyo');
    expect(v.safetyAcknowledged).toBe(false);
  });

  it('shows a saved intake in the user units and asks for the acknowledgement again', () => {
    const v = initialIntakeValues(profile, { weightUnit: 'lb', volumeUnit: 'floz', timeZone: 'Asia/Tokyo' });
    expect(v).toMatchObject({
      timeZone: 'Europe/Berlin',
      heightFt: '5',
      heightIn: '10.9',
      usualWater: '101.4',
      currentWeight: '180.8', // 82 kg = 180.78 lb
    });
    expect(v.eventTime).toBe('');
    expect(v.safetyAcknowledged).toBe(false);
  });
});

describe('createIntakeResolver', () => {
  const resolver = createIntakeResolver();
  const opts = { fields: {}, shouldUseNativeValidation: false } as never;

  it('hands over the SI request when the shared schema accepts it', async () => {
    const result = await resolver(imperial, undefined, opts);
    expect(result.errors).toEqual({});
    expect(result.values).toMatchObject({ weightUnit: 'lb', eventName: 'Harbour Open' });
    expect((result.values as { heightCm: number }).heightCm).toBeCloseTo(167.64, 10);
  });

  it('reports the schema errors on the typed boxes, in the athlete units', async () => {
    const result = await resolver(
      { ...imperial, heightFt: '3', heightIn: '0', safetyAcknowledged: false },
      undefined,
      opts,
    );
    expect(result.errors.heightFt?.message).toBe('Height must be at least 3 ft 11.3 in');
    expect(result.errors.safetyAcknowledged?.message).toBe('Please read and tick this to continue');
    expect(result.values).toEqual({});
  });

  it('reports the cross-field rules (a weigh-in needs its limit) once the fields themselves pass', async () => {
    // zod runs the schema's superRefine only after every field parsed, so these come second.
    const result = await resolver({ ...imperial, weighInLimit: '' }, undefined, opts);
    expect(result.errors.weighInLimit?.message).toBe('Weigh-in limit is required for a weigh-in');
  });

  it('says "enter a number" rather than "required" for text that is not a number', async () => {
    const result = await resolver({ ...metric, usualEnergyKcal: 'lots' }, undefined, opts);
    expect(result.errors.usualEnergyKcal?.message).toBe(NOT_A_NUMBER);
  });
});
