/**
 * Diuretic-type items in a schedule: the one list and the one matcher (guardrails.ts uses it).
 *
 * Medicines follow the WHO ATC classification, group C03 "Diuretics" (WHO Collaborating Centre for
 * Drug Statistics Methodology, ATC/DDD Index): C03A low-ceiling diuretics, thiazides; C03B low-ceiling
 * diuretics excluding thiazides; C03C high-ceiling (loop) diuretics; C03D potassium-sparing agents;
 * C03E diuretics and potassium-sparing agents in combination; C03X other diuretics. Carbonic
 * anhydrase inhibitors (acetazolamide S01EC01, methazolamide S01EC05, dichlorphenamide S01EC02) sit
 * in ATC S01EC, not C03, but are taken by mouth as diuretics and are included here; so is mannitol
 * (osmotic diuretic, B05BC01). The ATC codes per name are from memory of the index, unverified; the
 * group headings are the index's own. Trade names are the usual ones in the US, UK, EU and India,
 * from memory.
 *
 * Herbal "water pill" ingredients have no formal classification: that part of the list (ingredients
 * commonly sold as water pills) is common practice, no source, from memory.
 * Caffeine and green tea extract are left out on purpose: their diuretic effect is small in people
 * used to them (Maughan & Griffin 2003, J Hum Nutr Diet 16:411–420, from memory) and flagging every
 * pre-workout drink would drown the strong warning this list raises.
 */

export type DiureticGroup =
  'C03A' | 'C03B' | 'C03C' | 'C03D' | 'C03E' | 'C03X' | 'S01EC' | 'B05BC' | 'herbal' | 'words';

export interface DiureticEntry {
  /** The generic (INN) name, the herb, or the words. */
  name: string;
  /** Spelling variants (USAN/BAN/other languages) and trade names, matched like the name. */
  aliases: readonly string[];
  group: DiureticGroup;
}

/** What each group is, for messages and tests. */
export const DIURETIC_GROUPS: Record<DiureticGroup, string> = {
  C03A: 'ATC C03A low-ceiling diuretics, thiazides',
  C03B: 'ATC C03B low-ceiling diuretics, excluding thiazides',
  C03C: 'ATC C03C high-ceiling (loop) diuretics',
  C03D: 'ATC C03D potassium-sparing agents',
  C03E: 'ATC C03E diuretics and potassium-sparing agents in combination',
  C03X: 'ATC C03X other diuretics',
  S01EC: 'ATC S01EC carbonic anhydrase inhibitors (not in C03; taken as diuretics)',
  B05BC: 'ATC B05BC osmotic diuretics (not in C03)',
  herbal: 'herbal "water pill" ingredient: common practice, no formal classification',
  words: 'the words themselves',
};

export const DIURETICS: readonly DiureticEntry[] = [
  // C03A: thiazides.
  {
    name: 'hydrochlorothiazide',
    aliases: ['HCTZ', 'Microzide', 'HydroDIURIL', 'Esidrix', 'Hydrosaluric'],
    group: 'C03A',
  },
  { name: 'chlorothiazide', aliases: ['Diuril'], group: 'C03A' },
  { name: 'bendroflumethiazide', aliases: ['bendrofluazide', 'Aprinox', 'Naturetin'], group: 'C03A' },
  { name: 'cyclopenthiazide', aliases: ['Navidrex'], group: 'C03A' },
  { name: 'methyclothiazide', aliases: [], group: 'C03A' },
  { name: 'polythiazide', aliases: ['Renese'], group: 'C03A' },
  { name: 'trichlormethiazide', aliases: [], group: 'C03A' },
  // C03B: low-ceiling, excluding thiazides.
  { name: 'chlortalidone', aliases: ['chlorthalidone', 'Hygroton', 'Thalitone'], group: 'C03B' },
  { name: 'indapamide', aliases: ['Lozol', 'Natrilix', 'Lorvas'], group: 'C03B' },
  { name: 'metolazone', aliases: ['Zaroxolyn', 'Metenix', 'Mykrox'], group: 'C03B' },
  { name: 'xipamide', aliases: ['Diurexan'], group: 'C03B' },
  { name: 'clopamide', aliases: ['Brinaldix'], group: 'C03B' },
  // C03C: high-ceiling (loop).
  { name: 'furosemide', aliases: ['frusemide', 'Lasix', 'Furosemid', 'Furix'], group: 'C03C' },
  { name: 'bumetanide', aliases: ['Bumex', 'Burinex'], group: 'C03C' },
  { name: 'torasemide', aliases: ['torsemide', 'Demadex', 'Soaanz', 'Dytor'], group: 'C03C' },
  { name: 'etacrynic acid', aliases: ['ethacrynic acid', 'Edecrin'], group: 'C03C' },
  { name: 'piretanide', aliases: [], group: 'C03C' },
  { name: 'azosemide', aliases: [], group: 'C03C' },
  // C03D: potassium-sparing.
  { name: 'spironolactone', aliases: ['Aldactone', 'CaroSpir'], group: 'C03D' },
  { name: 'eplerenone', aliases: ['Inspra'], group: 'C03D' },
  { name: 'canrenone', aliases: ['potassium canrenoate', 'canrenoate'], group: 'C03D' },
  { name: 'amiloride', aliases: ['Midamor'], group: 'C03D' },
  { name: 'triamterene', aliases: ['Dyrenium'], group: 'C03D' },
  // C03E: combinations (trade and UK "co-" names).
  {
    name: 'co-amilozide',
    aliases: ['Moduretic', 'Moduret', 'co-amilofruse', 'Frumil', 'co-triamterzide', 'Dyazide', 'Maxzide'],
    group: 'C03E',
  },
  { name: 'co-flumactone', aliases: ['Aldactazide', 'Aldactide'], group: 'C03E' },
  // C03X: other diuretics (vasopressin antagonists).
  { name: 'tolvaptan', aliases: ['Samsca', 'Jinarc'], group: 'C03X' },
  // Carbonic anhydrase inhibitors, ATC S01EC.
  { name: 'acetazolamide', aliases: ['Diamox'], group: 'S01EC' },
  { name: 'methazolamide', aliases: ['Neptazane'], group: 'S01EC' },
  { name: 'dichlorphenamide', aliases: ['diclofenamide', 'Keveyis', 'Daranide'], group: 'S01EC' },
  // Osmotic, ATC B05BC.
  { name: 'mannitol', aliases: ['Osmitrol'], group: 'B05BC' },
  // Herbal "water pill" ingredients: common practice, no formal classification.
  { name: 'dandelion', aliases: ['Taraxacum officinale', 'Taraxacum'], group: 'herbal' },
  { name: 'horsetail', aliases: ['Equisetum arvense', 'Equisetum'], group: 'herbal' },
  { name: 'juniper', aliases: ['Juniperus communis', 'Juniperus'], group: 'herbal' },
  { name: 'parsley', aliases: ['Petroselinum crispum', 'Petroselinum'], group: 'herbal' },
  { name: 'uva ursi', aliases: ['bearberry', 'Arctostaphylos uva-ursi', 'Arctostaphylos'], group: 'herbal' },
  { name: 'hibiscus', aliases: ['Hibiscus sabdariffa', 'roselle'], group: 'herbal' },
  { name: 'nettle', aliases: ['Urtica dioica', 'Urtica'], group: 'herbal' },
  { name: 'buchu', aliases: ['Agathosma betulina', 'Agathosma'], group: 'herbal' },
  { name: 'corn silk', aliases: ['Zea mays stigma'], group: 'herbal' },
  { name: 'goldenrod', aliases: ['Solidago virgaurea', 'Solidago'], group: 'herbal' },
  // Over-the-counter water pills sold as such (pamabrom has no ATC code).
  { name: 'pamabrom', aliases: ['Diurex'], group: 'herbal' },
  // The words themselves.
  {
    name: 'diuretic',
    aliases: ['water pill', 'water tablet', 'fluid pill', 'fluid tablet', 'diuretika'],
    group: 'words',
  },
];

/** Names at least this long (after folding) tolerate one edit: common practice, no source. */
const FUZZY_MIN_LENGTH = 7;

/**
 * Folds one word so common spelling variants meet: lower case, no diacritics, ph → f, th → t,
 * y → i, ae/oe → e, doubled letters once, a final "s" (plural) and a final "e" (-ide/-id,
 * -one/-on) dropped. The same folding is applied to the list and to what was typed.
 */
function foldWord(word: string): string {
  let w = word
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/ph/g, 'f')
    .replace(/th/g, 't')
    .replace(/y/g, 'i')
    .replace(/[ao]e/g, 'e')
    .replace(/(.)\1+/g, '$1');
  if (w.length > 3 && w.endsWith('s')) w = w.slice(0, -1);
  if (w.length > 4 && w.endsWith('e')) w = w.slice(0, -1);
  return w;
}

/** The folded words of a text: letters and digits only, hyphens and punctuation split words. */
function foldedWords(text: string): string[] {
  return text
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .split(/[^\p{L}\p{N}]+/u)
    .filter((w) => w.length > 0)
    .map(foldWord);
}

/** Optimal string alignment distance (Levenshtein with adjacent transpositions), capped at 2. */
function editDistance(a: string, b: string): number {
  if (Math.abs(a.length - b.length) > 1) return 2;
  const d: number[][] = Array.from({ length: a.length + 1 }, (_, i) =>
    Array.from({ length: b.length + 1 }, (_, j) => (i === 0 ? j : j === 0 ? i : 0)),
  );
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let v = Math.min(d[i - 1]![j]! + 1, d[i]![j - 1]! + 1, d[i - 1]![j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1])
        v = Math.min(v, d[i - 2]![j - 2]! + 1);
      d[i]![j] = v;
    }
  }
  return Math.min(d[a.length]![b.length]!, 2);
}

function sameWord(typed: string, listed: string): boolean {
  if (typed === listed) return true;
  return listed.length >= FUZZY_MIN_LENGTH && editDistance(typed, listed) <= 1;
}

interface Pattern {
  entry: DiureticEntry;
  words: string[];
}

const PATTERNS: readonly Pattern[] = DIURETICS.flatMap((entry) =>
  [entry.name, ...entry.aliases].map((n) => ({ entry, words: foldedWords(n) })),
);

function matchesAt(typed: readonly string[], at: number, words: readonly string[]): boolean {
  // Word by word ("uva ursi", "uva-ursi")…
  if (words.every((w, k) => typed[at + k] !== undefined && sameWord(typed[at + k]!, w))) return true;
  // …or a multi-word name run together ("waterpills", "uvaursi").
  return words.length > 1 && typed[at] !== undefined && sameWord(typed[at]!, foldWord(words.join('')));
}

/**
 * The list entry `text` names (a schedule item as typed: "Furosemid 40 mg", "Taraxacum officinale
 * root", "water pills"), or null. Case, diacritics, hyphens, plurals and the spelling variants of
 * `foldWord` are tolerated, and one edit for names of 7 or more letters.
 */
export function findDiuretic(text: string): DiureticEntry | null {
  const typed = foldedWords(text);
  for (let at = 0; at < typed.length; at++) {
    for (const p of PATTERNS) if (matchesAt(typed, at, p.words)) return p.entry;
  }
  return null;
}

/** True when `text` names a diuretic-type item (`findDiuretic`). */
export function isDiureticItem(text: string): boolean {
  return findDiuretic(text) !== null;
}
