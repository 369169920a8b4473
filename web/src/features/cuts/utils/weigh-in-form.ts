import {
  toTypedText,
  weightFromKg,
  weightToKg,
  type WeighInEventView,
  type WeightUnit,
  type WEIGH_IN_TIMINGS,
} from '@driftmark/shared';
// Relative on purpose: these helpers are unit-tested without the web app's path alias.
import { numberReader, savedIfShown } from '../../../lib/number-reader';

/** Weights in a weigh-in form are shown to 0.1 in the coach's unit. */
const WEIGHT_DIGITS = 1;

/**
 * The weigh-in's record as the coach types it: weights as text in their own unit (kg or lb), clock
 * times on the venue's clock. Field names match the request's, so each schema message lands on its
 * box; the conversion to kg is the shared one.
 */
export interface WeighInEventFormValues {
  weighInLimitKg: string;
  weighInTiming: (typeof WEIGH_IN_TIMINGS)[number] | '';
  weighInTime: string;
  competitionTime: string;
  usualWeightKg: string;
  classBelowKg: string;
  classAboveKg: string;
}

type Field = keyof WeighInEventFormValues;

function weightText(kg: number | null, unit: WeightUnit): string {
  return kg === null ? '' : toTypedText(weightFromKg(kg, unit), WEIGHT_DIGITS);
}

/** The form's starting values: the saved record, weights in the coach's unit. */
export function weighInEventFormValues(view: WeighInEventView, unit: WeightUnit): WeighInEventFormValues {
  return {
    weighInLimitKg: weightText(view.limitKg, unit),
    weighInTiming: view.timing ?? '',
    weighInTime: view.weighInTime ?? '',
    competitionTime: view.competitionTime ?? '',
    usualWeightKg: weightText(view.usualWeightKg, unit),
    classBelowKg: weightText(view.classBelowKg, unit),
    classAboveKg: weightText(view.classAboveKg, unit),
  };
}

type WeightField = 'weighInLimitKg' | 'usualWeightKg' | 'classBelowKg' | 'classAboveKg';

/**
 * Form values → the PUT body, every weight in kg; a blank optional weight clears it (null). A box
 * still showing the saved weight sends the saved kg, so saving in lb does not nudge a 63 kg limit
 * to 63.004 kg through the 0.1 lb rounding of the box.
 */
export function toWeighInEventRequest(unit: WeightUnit, saved?: WeighInEventView) {
  const savedKg: Record<WeightField, number | null> | undefined = saved && {
    weighInLimitKg: saved.limitKg,
    usualWeightKg: saved.usualWeightKg,
    classBelowKg: saved.classBelowKg,
    classAboveKg: saved.classAboveKg,
  };
  return (v: WeighInEventFormValues) => {
    const read = numberReader<Field>();
    const kg = (field: WeightField, n: number | null | undefined) => {
      if (n === null || n === undefined || Number.isNaN(n)) return n;
      return savedIfShown(v[field], savedKg?.[field], (kg) => weightText(kg, unit)) ?? weightToKg(n, unit);
    };
    return {
      request: {
        weighInLimitKg: kg('weighInLimitKg', read.required('weighInLimitKg', v.weighInLimitKg)),
        weighInTiming: v.weighInTiming === '' ? undefined : v.weighInTiming,
        weighInTime: v.weighInTime === '' ? undefined : v.weighInTime,
        competitionTime: v.competitionTime === '' ? undefined : v.competitionTime,
        usualWeightKg: kg('usualWeightKg', read.optional('usualWeightKg', v.usualWeightKg)),
        classBelowKg: kg('classBelowKg', read.optional('classBelowKg', v.classBelowKg)),
        classAboveKg: kg('classAboveKg', read.optional('classAboveKg', v.classAboveKg)),
      },
      numberErrors: read.errors,
    };
  };
}
