import type { WeighInEventView } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { NOT_A_NUMBER } from '../../../lib/number-reader';
import { toWeighInEventRequest, weighInEventFormValues, type WeighInEventFormValues } from './weigh-in-form';

// 1 lb = 0.45359237 kg exactly (International Yard and Pound Agreement, 1959; NIST SP 811 B.8).
const view: WeighInEventView = {
  date: '2026-12-13',
  limitKg: 63,
  timing: 'day_before',
  weighInTime: '18:00',
  competitionDate: '2026-12-14',
  competitionTime: '09:30',
  timeZone: 'Pacific/Auckland',
  recoveryWindowHours: 15.5,
  usualWeightKg: 67.5,
  classBelowKg: 57,
  classAboveKg: null,
};

const typed = (over: Partial<WeighInEventFormValues> = {}): WeighInEventFormValues => ({
  weighInLimitKg: '63',
  weighInTiming: 'same_day',
  weighInTime: '07:00',
  competitionTime: '13:00',
  usualWeightKg: '',
  classBelowKg: '',
  classAboveKg: '',
  ...over,
});

describe('weigh-in details form', () => {
  it('shows the saved record in the coach’s unit', () => {
    // 63 / 0.45359237 = 138.891… lb; 67.5 kg = 148.812… lb; 57 kg = 125.663… lb.
    expect(weighInEventFormValues(view, 'lb')).toEqual({
      weighInLimitKg: '138.9',
      weighInTiming: 'day_before',
      weighInTime: '18:00',
      competitionTime: '09:30',
      usualWeightKg: '148.8',
      classBelowKg: '125.7',
      classAboveKg: '',
    });
    expect(weighInEventFormValues(view, 'kg').weighInLimitKg).toBe('63');
  });

  it('sends weights typed in lb as kg, blanks as null', () => {
    const { request, numberErrors } = toWeighInEventRequest('lb')(
      typed({ weighInLimitKg: '140', usualWeightKg: '150' }),
    );
    expect(numberErrors).toEqual({});
    // 140 × 0.45359237 = 63.5029318 kg; 150 × 0.45359237 = 68.0388555 kg.
    expect(request.weighInLimitKg).toBeCloseTo(63.5029318, 7);
    expect(request.usualWeightKg).toBeCloseTo(68.0388555, 7);
    expect(request).toMatchObject({
      weighInTiming: 'same_day',
      weighInTime: '07:00',
      competitionTime: '13:00',
      classBelowKg: null,
      classAboveKg: null,
    });
  });

  it('keeps the saved kg of a box left as it was shown', () => {
    const { request } = toWeighInEventRequest('lb', view)(weighInEventFormValues(view, 'lb'));
    expect(request).toMatchObject({ weighInLimitKg: 63, usualWeightKg: 67.5, classBelowKg: 57 });
  });

  it('names the box whose text is not a number', () => {
    const { numberErrors } = toWeighInEventRequest('kg')(typed({ classAboveKg: 'seventy' }));
    expect(numberErrors).toEqual({ classAboveKg: NOT_A_NUMBER });
  });
});
