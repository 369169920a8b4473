// The list follows the WHO ATC classification, group C03 "Diuretics" (WHO Collaborating Centre for
// Drug Statistics Methodology, ATC/DDD Index; codes per name from memory), plus the carbonic anhydrase
// inhibitors of ATC S01EC and herbal "water pill" ingredients (common practice, no formal classification).
import { describe, expect, it } from 'vitest';
import { DIURETIC_GROUPS, DIURETICS, findDiuretic, isDiureticItem } from './diuretics.js';

const groupOf = (text: string) => findDiuretic(text)?.group ?? null;

describe('every name of the list matches itself', () => {
  it.each(DIURETICS.flatMap((e) => [e.name, ...e.aliases].map((n) => [n, e.group] as const)))(
    '%s (%s)',
    (name, group) => {
      expect(groupOf(name)).toBe(group);
      expect(groupOf(name.toUpperCase())).toBe(group);
    },
  );

  it('each group is described; the herbal ones say they have no formal classification', () => {
    for (const e of DIURETICS) expect(DIURETIC_GROUPS[e.group]).toBeTruthy();
    expect(DIURETIC_GROUPS.herbal).toContain('no formal classification');
    expect(DIURETIC_GROUPS.S01EC).toContain('not in C03');
  });
});

describe('the names the issue found missing, generic and trade (ATC C03; S01EC for acetazolamide)', () => {
  it.each([
    // C03D potassium-sparing
    ['Spironolactone', 'C03D'],
    ['Aldactone 25 mg', 'C03D'],
    ['Eplerenone', 'C03D'],
    ['Inspra', 'C03D'],
    ['Amiloride', 'C03D'],
    ['Triamterene', 'C03D'],
    // S01EC carbonic anhydrase inhibitor
    ['Acetazolamide', 'S01EC'],
    ['Diamox 250 mg', 'S01EC'],
    // C03C loop
    ['Bumetanide', 'C03C'],
    ['Bumex', 'C03C'],
    ['Burinex 1 mg', 'C03C'],
    ['Torsemide', 'C03C'],
    ['Torasemide', 'C03C'],
    ['Demadex', 'C03C'],
    ['Furosemide 40 mg', 'C03C'],
    ['Lasix', 'C03C'],
    ['Furosemid', 'C03C'],
    ['Frusemide', 'C03C'],
    // C03B
    ['Metolazone', 'C03B'],
    ['Zaroxolyn', 'C03B'],
    ['Chlorthalidone', 'C03B'],
    ['Chlortalidone', 'C03B'],
    ['Indapamide', 'C03B'],
    // C03A
    ['Hydrochlorothiazide 12.5 mg', 'C03A'],
    ['HCTZ', 'C03A'],
    // Herbal: common practice, no formal classification
    ['Dandelion root tea', 'herbal'],
    ['Taraxacum officinale', 'herbal'],
    ['Horsetail extract', 'herbal'],
    ['Equisetum arvense', 'herbal'],
    ['Juniper berry', 'herbal'],
    ['Parsley tea', 'herbal'],
    ['Uva ursi', 'herbal'],
    ['Hibiscus tea', 'herbal'],
    // The words
    ['Water pill', 'words'],
    ['water pills', 'words'],
    ['Herbal diuretic', 'words'],
    ['Diuretics', 'words'],
  ])('“%s” → %s', (text, group) => {
    expect(groupOf(text)).toBe(group);
  });
});

describe('case- and spelling-tolerant', () => {
  it.each([
    ['FUROSEMIDE', 'C03C'],
    ['furosémide', 'C03C'], // diacritics (French spelling)
    ['Furosemid-ratiopharm', 'C03C'], // hyphen, -id spelling
    ['Hydrochlorothiazid', 'C03A'], // -ide / -id
    ['hydro-chlorothiazide', 'C03A'], // run apart by a hyphen
    ['Spironolacton', 'C03D'], // German spelling (-one / -on)
    ['spironolactone', 'C03D'],
    ['spirnolactone', 'C03D'], // one letter missing, long name
    ['Acetazolamid', 'S01EC'],
    ['acetazolomide', 'S01EC'], // one letter wrong
    ['Chlortalidon', 'C03B'],
    ['Etacrynic acid', 'C03C'],
    ['ethacrynic acid', 'C03C'], // th / t
    ['Uva-ursi leaf', 'herbal'],
    ['UvaUrsi', 'herbal'],
    ['waterpills', 'words'],
    ['Water-tablets', 'words'],
    ['parsely', 'herbal'], // letters swapped
    ['Dandelions', 'herbal'],
  ])('“%s” → %s', (text, group) => {
    expect(groupOf(text)).toBe(group);
  });

  it('short names (under 7 letters) must match exactly: no edit tolerance', () => {
    expect(isDiureticItem('Lasix')).toBe(true);
    expect(isDiureticItem('Lasik')).toBe(false);
    expect(isDiureticItem('Bumax')).toBe(false);
  });
});

describe('ordinary supplements and foods are not diuretic-type items', () => {
  it.each([
    'Creatine monohydrate',
    'Caffeine 200 mg',
    'Green tea extract',
    'Magnesium citrate',
    'Magnesium chloride',
    'Potassium citrate',
    'Sodium bicarbonate',
    'Electrolytes',
    'Multivitamin',
    'Fish oil',
    'Omega-3',
    'Vitamin D3',
    'Melatonin',
    'Ashwagandha',
    'Beta-alanine',
    'L-carnitine',
    'L-glutamine',
    'Citrulline malate',
    'Whey protein',
    'Maltodextrin',
    'Dextrose',
    'Glycerol',
    'Maltitol',
    'Xylitol',
    'Zinc',
    'Iron',
    'Ibuprofen',
    'Paracetamol',
    'Endurox',
    'Water',
    'Pill organiser',
  ])('“%s”', (text) => {
    expect(findDiuretic(text)).toBeNull();
  });
});
