/**
 * Body composition: body density from skinfolds (Jackson & Pollock for men, Jackson, Pollock &
 * Ward for women), % fat from density (Siri, Brozek), % fat from circumferences (Hodgdon &
 * Beckett, the US Navy method), and fat and lean mass from a body weight. Pure functions, the one
 * place these equations live; the server applies them and the web shows what it sends.
 *
 * Coefficients as printed in the reference sheet (docs: REFERENCES.md §3), whose basis is
 * secondary pages (S), confidence H except the JPW 3-site constant (Med, see below).
 */

/** The seven Jackson–Pollock skinfold sites (the same seven for men and women). */
export const SKINFOLD_SITES = [
  'chest',
  'midaxillary',
  'triceps',
  'subscapular',
  'abdomen',
  'suprailiac',
  'thigh',
] as const;
export type SkinfoldSite = (typeof SKINFOLD_SITES)[number];

export const SKINFOLD_SITE_LABELS: Record<SkinfoldSite, string> = {
  chest: 'Chest',
  midaxillary: 'Midaxillary',
  triceps: 'Triceps',
  subscapular: 'Subscapular',
  abdomen: 'Abdomen',
  suprailiac: 'Suprailiac',
  thigh: 'Thigh',
};

export const BODY_COMPOSITION_METHODS = ['skinfold_3', 'skinfold_7', 'circumference'] as const;
export type BodyCompositionMethod = (typeof BODY_COMPOSITION_METHODS)[number];

export const BODY_COMPOSITION_METHOD_LABELS: Record<BodyCompositionMethod, string> = {
  skinfold_3: 'Skinfolds, 3 sites',
  skinfold_7: 'Skinfolds, 7 sites',
  circumference: 'Circumferences (neck, waist, hip)',
};

/** Density → % fat conversions. */
export const DENSITY_EQUATIONS = ['siri', 'brozek'] as const;
export type DensityEquation = (typeof DENSITY_EQUATIONS)[number];
export const DENSITY_EQUATION_LABELS: Record<DensityEquation, string> = {
  siri: 'Siri',
  brozek: 'Brozek',
};

type Sex = 'female' | 'male';

/**
 * The sites a skinfold method sums: 3 sites are chest, abdomen, thigh for men (Jackson & Pollock
 * 1978) and triceps, suprailiac, thigh for women (Jackson, Pollock & Ward 1980); 7 sites are all.
 */
export function skinfoldSites(sex: Sex, method: 'skinfold_3' | 'skinfold_7'): readonly SkinfoldSite[] {
  if (method === 'skinfold_7') return SKINFOLD_SITES;
  return sex === 'male' ? ['chest', 'abdomen', 'thigh'] : ['triceps', 'suprailiac', 'thigh'];
}

/**
 * Body density (g/mL) from the sum of skinfolds `sumMm` and age in years.
 * - Men: Jackson AS, Pollock ML (1978) Br J Nutr 40:497–504.
 * - Women: Jackson AS, Pollock ML, Ward A (1980) Med Sci Sports Exerc 12:175–182. The 3-site
 *   constant is 1.0994921 (three secondary pages); one vendor prints 1.0994291 (+0.03 % fat).
 */
export function skinfoldDensity(
  sex: Sex,
  method: 'skinfold_3' | 'skinfold_7',
  sumMm: number,
  ageYears: number,
): number {
  const s = sumMm;
  const a = ageYears;
  if (sex === 'male') {
    return method === 'skinfold_7'
      ? 1.112 - 0.00043499 * s + 0.00000055 * s * s - 0.00028826 * a
      : 1.10938 - 0.0008267 * s + 0.0000016 * s * s - 0.0002574 * a;
  }
  return method === 'skinfold_7'
    ? 1.097 - 0.00046971 * s + 0.00000056 * s * s - 0.00012828 * a
    : 1.0994921 - 0.0009929 * s + 0.0000023 * s * s - 0.0001392 * a;
}

/**
 * % fat from body density: Siri (1961) 495/Db − 450; Brozek, Grande, Anderson & Keys (1963)
 * 457/Db − 414.2.
 */
export function fatPercentFromDensity(density: number, equation: DensityEquation): number {
  return equation === 'siri' ? 495 / density - 450 : 457 / density - 414.2;
}

const CM_PER_INCH = 2.54;

/**
 * % fat from circumferences and height in cm, by the inch form of the US Navy equations (Hodgdon
 * & Beckett 1984, NHRC 84-11/84-29; inch form as printed in Hodgdon & Friedl 1999, NHRC TD 99-2B):
 * men 86.010·log10(waist − neck) − 70.041·log10(height) + 36.76; women
 * 163.205·log10(waist + hip − neck) − 97.684·log10(height) − 78.387, lengths in inches. The cm
 * forms in circulation differ from it by up to ~0.4 points; this one form is used everywhere.
 * Null when the lengths give no logarithm (waist not above neck).
 */
export function circumferenceFatPercent(
  sex: Sex,
  c: { neckCm: number; waistCm: number; hipCm: number | null; heightCm: number },
): number | null {
  const neck = c.neckCm / CM_PER_INCH;
  const waist = c.waistCm / CM_PER_INCH;
  const height = c.heightCm / CM_PER_INCH;
  if (sex === 'male') {
    if (waist - neck <= 0) return null;
    return 86.01 * Math.log10(waist - neck) - 70.041 * Math.log10(height) + 36.76;
  }
  if (c.hipCm === null) return null;
  const hip = c.hipCm / CM_PER_INCH;
  if (waist + hip - neck <= 0) return null;
  return 163.205 * Math.log10(waist + hip - neck) - 97.684 * Math.log10(height) - 78.387;
}

/** Fat mass and fat-free (lean) mass, kg: FM = W·%fat/100, FFM = W − FM. */
export function fatAndLeanMass(weightKg: number, fatPercent: number): { fatKg: number; leanKg: number } {
  const fatKg = (weightKg * fatPercent) / 100;
  return { fatKg, leanKg: weightKg - fatKg };
}

/**
 * What the screens say beside every estimate. The figure is the order of the equations' standard
 * errors of estimate as reported with them (about 3.5–4 % fat points for the skinfold equations,
 * Jackson & Pollock 1978, Jackson, Pollock & Ward 1980; about 3.5–4 for the Navy equations,
 * Hodgdon & Beckett 1984); these figures are from memory, not re-read.
 */
export const BODY_FAT_METHOD_ERROR =
  'An estimate, not a measurement: skinfold and circumference equations carry an error of about ±3–4 % fat points for one person (standard errors reported by Jackson & Pollock 1978 and Hodgdon & Beckett 1984). Compare measurements by the same method and measurer over time rather than single values.';

/** What a measurement needs to be estimated. */
export interface BodyMeasurementInput {
  method: BodyCompositionMethod;
  densityEquation: DensityEquation;
  skinfoldsMm: Partial<Record<SkinfoldSite, number | null>>;
  neckCm: number | null;
  waistCm: number | null;
  hipCm: number | null;
  heightCm: number | null;
}

export interface BodyFatEstimate {
  /** Sum of the method's skinfolds, mm; null for circumferences. */
  sumMm: number | null;
  /** g/mL; null for circumferences (the Navy inch form gives % fat directly). */
  densityGPerMl: number | null;
  fatPercent: number;
  /** Which equations gave it ("Jackson & Pollock 3-site, Siri"). */
  equation: string;
}

/**
 * The estimate for one measurement, or the fields it still needs (site or length → message):
 * which sites and lengths count depends on sex, so this is where a request is held to them.
 */
export function estimateBodyFat(
  m: BodyMeasurementInput,
  person: { sex: Sex; ageYears: number },
): { estimate: BodyFatEstimate } | { missing: Record<string, string> } {
  const missing: Record<string, string> = {};
  if (m.method === 'circumference') {
    const need: [string, number | null][] = [
      ['neckCm', m.neckCm],
      ['waistCm', m.waistCm],
      ['heightCm', m.heightCm],
    ];
    if (person.sex === 'female') need.push(['hipCm', m.hipCm]);
    for (const [field, v] of need) if (v == null) missing[field] = 'Required for the circumference method';
    if (Object.keys(missing).length > 0) return { missing };
    const pct = circumferenceFatPercent(person.sex, {
      neckCm: m.neckCm!,
      waistCm: m.waistCm!,
      hipCm: m.hipCm,
      heightCm: m.heightCm!,
    });
    if (pct === null) return { missing: { waistCm: 'The waist must measure more than the neck' } };
    return {
      estimate: {
        sumMm: null,
        densityGPerMl: null,
        fatPercent: pct,
        equation: 'Hodgdon & Beckett (US Navy, circumferences)',
      },
    };
  }
  const sites = skinfoldSites(person.sex, m.method);
  for (const site of sites) {
    if (m.skinfoldsMm[site] == null) missing[`skinfoldsMm.${site}`] = 'Required for this method';
  }
  if (Object.keys(missing).length > 0) return { missing };
  const sumMm = sites.reduce((s, site) => s + (m.skinfoldsMm[site] ?? 0), 0);
  const density = skinfoldDensity(person.sex, m.method, sumMm, person.ageYears);
  const authors = person.sex === 'male' ? 'Jackson & Pollock' : 'Jackson, Pollock & Ward';
  return {
    estimate: {
      sumMm,
      densityGPerMl: density,
      fatPercent: fatPercentFromDensity(density, m.densityEquation),
      equation: `${authors} ${m.method === 'skinfold_3' ? 3 : 7}-site, ${DENSITY_EQUATION_LABELS[m.densityEquation]}`,
    },
  };
}
