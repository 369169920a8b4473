import {
  parseTypedNumber,
  SKINFOLD_SITES,
  type BodyCompositionMethod,
  type DensityEquation,
  type SkinfoldSite,
} from '@driftmark/shared';

/**
 * A measurement as typed: each length as text (read by the shared number rule), so a half-typed
 * figure never becomes NaN inside the form. Which sites count is the server's to say (it knows the
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

export function emptyMeasurementForm(today: string, heightCm: number | null): MeasurementFormValues {
  return {
    date: today,
    method: 'skinfold_3',
    densityEquation: 'siri',
    skinfoldsMm: Object.fromEntries(SKINFOLD_SITES.map((s) => [s, ''])) as Record<SkinfoldSite, string>,
    neckCm: '',
    waistCm: '',
    hipCm: '',
    heightCm: heightCm === null ? '' : String(heightCm),
    measuredBy: '',
  };
}

/**
 * Form values → the request body: only the method's own kind of figures, blanks left out. A box
 * that is not a number goes as NaN, which the shared schema refuses with "… must be a number".
 */
export function toMeasurementRequest(v: MeasurementFormValues): {
  request: Record<string, unknown>;
  numberErrors: Record<string, never>;
} {
  const read = (text: string) => parseTypedNumber(text);
  const request: Record<string, unknown> = {
    date: v.date,
    method: v.method,
    densityEquation: v.densityEquation,
    measuredBy: v.measuredBy,
  };
  if (v.method === 'circumference') {
    request.neckCm = read(v.neckCm);
    request.waistCm = read(v.waistCm);
    request.hipCm = read(v.hipCm);
    request.heightCm = read(v.heightCm);
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
