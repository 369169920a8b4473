import {
  eveningRequest,
  fluidEntryRequest,
  mealEntryRequest,
  symptomReportRequest,
  weighInRequest,
  type DayView,
} from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import {
  eveningFormValues,
  toEveningRequest,
  toFluidRequest,
  toMealRequest,
  toSymptomRequest,
  toWeighInRequest,
  weighInFormValues,
  withoutClientId,
  type MealFormValues,
} from './form-values';
import { NOT_A_NUMBER } from '../../../lib/number-reader';
import { createRequestResolver } from '../../../lib/request-resolver';

const opts = { fields: {}, shouldUseNativeValidation: false } as never;

describe('weigh-in', () => {
  it('sends the weight as typed, in the unit chosen, and drops the cycle phase unless it is tagged', () => {
    const { request, numberErrors } = toWeighInRequest({
      weight: '154,3',
      unit: 'lb',
      time: '06:40',
      protocolConfirmed: true,
      tags: ['travel'],
      cyclePhase: 'luteal',
    });
    expect(numberErrors).toEqual({});
    expect(request).toEqual({
      weight: 154.3,
      unit: 'lb',
      time: '06:40',
      protocolConfirmed: true,
      tags: ['travel'],
      cyclePhase: null,
    });
    expect(weighInRequest.safeParse(request).success).toBe(true);
  });

  it('edits a saved weigh-in in the unit it was typed in, exactly', () => {
    const view: DayView['weighIn'] = {
      weightKg: 154.3 * 0.45359237,
      entered: { value: 154.3, unit: 'lb' },
      time: '06:40',
      tags: ['cycle_phase'],
      cyclePhase: 'follicular',
      updatedAt: '2026-12-01T06:41:00Z',
    };
    expect(weighInFormValues(view, 'kg', '09:00')).toEqual({
      weight: '154.3',
      unit: 'lb',
      time: '06:40',
      protocolConfirmed: true,
      tags: ['cycle_phase'],
      cyclePhase: 'follicular',
    });
    expect(weighInFormValues(null, 'kg', '09:00')).toMatchObject({ weight: '', unit: 'kg', time: '09:00' });
  });

  it('puts the shared schema messages on the boxes', async () => {
    const resolver = createRequestResolver(weighInRequest, toWeighInRequest);
    const result = await resolver(
      { weight: '900', unit: 'kg', time: '06:40', protocolConfirmed: false, tags: [], cyclePhase: '' },
      undefined,
      opts,
    );
    expect(result.errors.protocolConfirmed?.message).toBe(
      'Confirm the weigh-in was after waking and voiding, before food and drink',
    );
    const weight = await resolver(
      { weight: '900', unit: 'kg', time: '06:40', protocolConfirmed: true, tags: [], cyclePhase: '' },
      undefined,
      opts,
    );
    expect(weight.errors.weight?.message).toBe('Weight must be between 25 kg and 300 kg');
    const text = await resolver(
      { weight: 'heavy', unit: 'kg', time: '06:40', protocolConfirmed: true, tags: [], cyclePhase: '' },
      undefined,
      opts,
    );
    expect(text.errors.weight?.message).toBe(NOT_A_NUMBER);
  });
});

describe('fluids', () => {
  it('refuses 30 L in one entry with a message naming the volume', async () => {
    const resolver = createRequestResolver(fluidEntryRequest, toFluidRequest);
    const result = await resolver(
      { volume: '30000', unit: 'ml', kind: 'water', time: '10:00' },
      undefined,
      opts,
    );
    expect(result.errors.volume?.message).toBe('One entry can hold at most 5000 mL');
    const ok = await resolver(
      { volume: '16', unit: 'floz', kind: 'coffee_tea', time: '10:00' },
      undefined,
      opts,
    );
    expect(ok.errors).toEqual({});
    expect(ok.values).toMatchObject({ volume: 16, unit: 'floz', kind: 'coffee_tea' });
  });
});

describe('meals', () => {
  const base: MealFormValues = {
    name: 'Lunch',
    time: '12:30',
    source: 'macros',
    proteinG: '40',
    carbohydrateG: '60',
    fatG: '15',
    fibreG: '',
    alcoholG: '',
    sodiumMg: '',
    items: [],
  };

  it('sends grams of macros, optional ones as null when empty', () => {
    const { request } = toMealRequest(base);
    expect(request).toMatchObject({
      source: 'macros',
      proteinG: 40,
      fibreG: null,
      alcoholG: null,
      sodiumMg: null,
    });
    expect(mealEntryRequest.safeParse(request).success).toBe(true);
  });

  it('sends sodium in mg when typed, and says so when it is not a number', () => {
    expect(toMealRequest({ ...base, sodiumMg: '820' }).request).toMatchObject({ sodiumMg: 820 });
    expect(toMealRequest({ ...base, sodiumMg: 'lots' }).numberErrors).toEqual({ sodiumMg: NOT_A_NUMBER });
  });

  it('sends foods with grams or portions, and names the item whose amount is not a number', async () => {
    const foods = toMealRequest({
      ...base,
      source: 'foods',
      items: [
        { foodId: 'ifct:A001', amount: '150', unit: 'g' },
        { foodId: 'dm:bread-white', amount: '2', unit: 'slice' },
      ],
    });
    expect(foods.request).toMatchObject({
      source: 'foods',
      items: [
        { foodId: 'ifct:A001', quantityG: 150 },
        { foodId: 'dm:bread-white', portions: 2, portionUnit: 'slice' },
      ],
    });
    expect(foods.request).not.toHaveProperty('proteinG');
    expect(mealEntryRequest.safeParse(foods.request).success).toBe(true);
    const typo = toMealRequest({
      ...base,
      source: 'foods',
      items: [{ foodId: 'dm:banana', amount: 'two', unit: 'medium' }],
    });
    expect(typo.numberErrors).toEqual({ 'items.0.portions': NOT_A_NUMBER });
    const resolver = createRequestResolver(mealEntryRequest, toMealRequest);
    const result = await resolver({ ...base, source: 'foods' }, undefined, opts);
    expect(result.errors.items?.message).toBe('Add at least one food');
  });

  it('leaves the client id out of an edit', () => {
    const { request } = toMealRequest(base);
    expect(withoutClientId(request as { clientId: string })).not.toHaveProperty('clientId');
  });
});

describe('evening', () => {
  it('turns the ratings and the yes/no into numbers and a boolean; empty boxes clear', () => {
    const values = eveningFormValues(null);
    values.steps = '12 500';
    values.trainingDone = 'yes';
    values.trainingNote = ' legs ';
    values.ratings.energy = '4';
    values.ratings.stress = '2';
    const { request } = toEveningRequest(values);
    expect(request).toMatchObject({
      steps: 12500,
      sleepHours: null,
      trainingDone: true,
      trainingNote: 'legs',
      ratings: { energy: 4, stress: 2, mood: null },
      note: null,
    });
    expect(eveningRequest.safeParse(request).success).toBe(true);
  });
});

describe('symptoms', () => {
  it('needs at least one symptom', async () => {
    const resolver = createRequestResolver(symptomReportRequest, toSymptomRequest);
    const empty = await resolver({ symptoms: [], time: '15:00', note: '' }, undefined, opts);
    expect(empty.errors.symptoms?.message).toBe('Choose at least one symptom');
    const { request } = toSymptomRequest({ symptoms: ['dizziness', 'headache'], time: '15:00', note: '' });
    expect(request).toMatchObject({ symptoms: ['dizziness', 'headache'], note: null });
  });
});
