import { numberReader } from '@/lib/number-reader';

/** A nutrition label as typed: every figure as text, read by the shared number rule on submit. */
export interface LabelFormValues {
  name: string;
  basis: 'per100g' | 'perServing';
  servingSize: string;
  servingUnit: 'g' | 'ml';
  densityGPerMl: string;
  energy: string;
  energyUnit: 'kcal' | 'kJ';
  proteinG: string;
  carbohydrateG: string;
  fatG: string;
  fibreG: string;
  alcoholG: string;
  sodiumMg: string;
}

type NumberField = Exclude<keyof LabelFormValues, 'name' | 'basis' | 'servingUnit' | 'energyUnit'>;

export function emptyLabelForm(name = ''): LabelFormValues {
  return {
    name,
    basis: 'per100g',
    servingSize: '',
    servingUnit: 'g',
    densityGPerMl: '',
    energy: '',
    energyUnit: 'kcal',
    proteinG: '',
    carbohydrateG: '',
    fatG: '',
    fibreG: '',
    alcoholG: '',
    sodiumMg: '',
  };
}

/** Form values → the request body; the serving only with a per-serving label, blanks left out. */
export function toLabelRequest(v: LabelFormValues) {
  const read = numberReader<NumberField>();
  const perServing = v.basis === 'perServing';
  const request: Record<string, unknown> = {
    name: v.name,
    basis: v.basis,
    servingSize: perServing ? read.required('servingSize', v.servingSize) : null,
    servingUnit: perServing ? v.servingUnit : null,
    densityGPerMl:
      perServing && v.servingUnit === 'ml' ? read.optional('densityGPerMl', v.densityGPerMl) : null,
    energy: read.required('energy', v.energy),
    energyUnit: v.energyUnit,
    proteinG: read.required('proteinG', v.proteinG),
    carbohydrateG: read.required('carbohydrateG', v.carbohydrateG),
    fatG: read.required('fatG', v.fatG),
    fibreG: read.optional('fibreG', v.fibreG),
    alcoholG: read.optional('alcoholG', v.alcoholG),
    sodiumMg: read.optional('sodiumMg', v.sodiumMg),
  };
  return { request, numberErrors: read.errors };
}
