import {
  LENGTH_UNIT_LABELS,
  lengthFromCm,
  lengthToCm,
  LIMITS,
  parseTypedNumber,
  SKINFOLD_SITES,
  toTypedText,
  type LengthUnit,
  type BodyCompositionMethod,
  type DensityEquation,
  type SkinfoldSite,
} from '@driftmark/shared';
// Relative on purpose: these helpers are unit-tested without the web app's path alias.
import { rangeMessageInUnit, savedIfShown } from '../../../lib/number-reader';

/**
 * A measurement as typed: each length as text (read by the shared number rule), so a half-typed
 * figure never becomes NaN inside the form. Circumferences and height are typed in the viewer's
 * length unit (cm, or inches beside lb) under the request's field names, so each message lands on
 * its box; skinfolds are always mm. Which sites count is the server's to say (it knows the
 * athlete's sex and answers with the missing ones by field).
 */
export interface MeasurementFormValues {
  date: string;
  method: BodyCompositionMethod;
  densityEquation: DensityEquation;
  skinfoldsMm: Record<SkinfoldSite, string>;
  neckCm: string;
  waistCm: string;
  hipCm: string;
  heightCm: string;
  measuredBy: string;
}

/** The circumference method's boxes, typed in the viewer's length unit and sent in cm. */
export const LENGTH_FIELDS = ['neckCm', 'waistCm', 'hipCm', 'heightCm'] as const;
type LengthField = (typeof LENGTH_FIELDS)[number];

const LENGTH_SUBJECTS: Record<LengthField, string> = {
  neckCm: 'Neck',
  waistCm: 'Waist',
  hipCm: 'Hip',
  heightCm: 'Height',
};

/** A length as its box shows it: to 0.1 in the viewer's unit. */
export function lengthText(cm: number | null, unit: LengthUnit): string {
  return cm === null ? '' : toTypedText(lengthFromCm(cm, unit), 1);
}

export function emptyMeasurementForm(
  today: string,
  heightCm: number | null,
  unit: LengthUnit = 'cm',
): MeasurementFormValues {
  return {
    date: today,
    method: 'skinfold_3',
    densityEquation: 'siri',
    skinfoldsMm: Object.fromEntries(SKINFOLD_SITES.map((s) => [s, ''])) as Record<SkinfoldSite, string>,
    neckCm: '',
    waistCm: '',
    hipCm: '',
    heightCm: lengthText(heightCm, unit),
    measuredBy: '',
  };
}

/**
 * Form values → the request body: only the method's own kind of figures, blanks left out, lengths
 * in cm through the shared conversion. A box still showing the profile's height sends that height
 * exactly (the box's 0.1 in rounding would otherwise nudge it). A box that is not a number goes as
 * NaN, which the shared schema refuses with "… must be a number".
 */
export function toMeasurementRequest(
  v: MeasurementFormValues,
  unit: LengthUnit = 'cm',
  profileHeightCm: number | null = null,
): {
  request: Record<string, unknown>;
  numberErrors: Record<string, never>;
} {
  const read = (text: string) => parseTypedNumber(text);
  const cm = (field: LengthField) => {
    const kept =
      field === 'heightCm'
        ? savedIfShown(v.heightCm, profileHeightCm, (c) => lengthText(c, unit))
        : undefined;
    if (kept !== undefined) return kept;
    const n = read(v[field]);
    return n === undefined || Number.isNaN(n) ? n : lengthToCm(n, unit);
  };
  const request: Record<string, unknown> = {
    date: v.date,
    method: v.method,
    densityEquation: v.densityEquation,
    measuredBy: v.measuredBy,
  };
  if (v.method === 'circumference') {
    for (const field of LENGTH_FIELDS) request[field] = cm(field);
  } else {
    request.skinfoldsMm = Object.fromEntries(
      SKINFOLD_SITES.flatMap((s) => {
        const n = read(v.skinfoldsMm[s]);
        return n === undefined ? [] : [[s, n]];
      }),
    );
  }
  return { request, numberErrors: {} };
}

/** A schema message for a length box, its range said in the viewer's unit (cm messages stand as they are). */
export function measurementMessage(
  field: string,
  error: { type?: string; message?: string },
  unit: LengthUnit,
): string | undefined {
  if (unit === 'cm' || !(LENGTH_FIELDS as readonly string[]).includes(field)) return error.message;
  const f = field as LengthField;
  return rangeMessageInUnit(error, {
    subject: LENGTH_SUBJECTS[f],
    limits: LIMITS[f],
    fromSi: (n) => lengthFromCm(n, unit),
    unit: LENGTH_UNIT_LABELS[unit],
  });
}
