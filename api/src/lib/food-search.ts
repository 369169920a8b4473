/**
 * Food search: what people type against food names and the other words they use for a food.
 * Pure functions; `FoodService.search` feeds them the team's foods, our everyday foods, the
 * reference table and how often this athlete and the team have logged each food.
 *
 * - Words are compared by their starts, never inside a word: "oat" finds "Oats" and "oatmeal",
 *   not "Goat".
 * - Plural and singular are one word ("eggs" = "egg", "potatoes" = "potato", "berries" = "berry"),
 *   and a few spellings are one ("yoghurt" = "yogurt"): the same normalising on both sides.
 * - A food's other words (`terms`, e.g. "rolled oats", "oat flakes", "porridge oats") count like its
 *   name, so a synonym finds it.
 * - Ranking: a query that is exactly the name or one of the terms first, then names starting with the
 *   first word and with fewer other words; the team's own (and the athlete's personal foods) and our
 *   everyday foods before the reference table; then the athlete's own use and the team's. The weights are ours (common practice, no
 *   source), checked by the thirty everyday searches in `everyday-searches.ts`.
 */

/** Spellings of one word (British/American, the reference table's own). */
const SPELLINGS: Record<string, string> = {
  yoghurt: 'yogurt',
  yoghourt: 'yogurt',
  omlet: 'omelet',
  omelette: 'omelet',
  wholemeal: 'wholewheat',
  fibre: 'fiber',
};

/** A word as search compares it: lower case, accents gone, plural made singular, spelling unified. */
export function normaliseWord(word: string): string {
  let w = word.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase();
  w = SPELLINGS[w] ?? w;
  if (w.length > 4 && w.endsWith('ies')) w = `${w.slice(0, -3)}y`;
  else if (w.length > 4 && w.endsWith('oes')) w = w.slice(0, -2);
  else if (w.length > 4 && /(ches|shes|xes|sses)$/.test(w)) w = w.slice(0, -2);
  else if (w.length > 3 && w.endsWith('s') && !/(ss|us|is)$/.test(w)) w = w.slice(0, -1);
  return SPELLINGS[w] ?? w;
}

/** The words of a text as search compares them ("Eggs, boiled" → ["egg", "boiled"]). */
export function searchWords(text: string | undefined | null): string[] {
  if (!text) return [];
  return text
    .split(/[^\p{L}\p{N}]+/u)
    .filter((w) => w.length > 0)
    .map(normaliseWord)
    .slice(0, 8);
}

/** A food as search sees it. */
export interface SearchableFood {
  id: string;
  name: string;
  /** Other words people use for it. */
  terms?: readonly string[];
  /** 'raw' or 'cooked' counts as a word of the food ("rice cooked"). */
  preparation?: 'raw' | 'cooked' | null;
  source: 'team' | 'personal' | 'everyday' | 'reference';
}

/** How often a food was logged in the window: by this athlete, by the whole team (athlete included). */
export interface FoodUsage {
  mine: number;
  team: number;
  /** When this athlete last logged it (ms since the epoch); null when never. */
  lastMineAt: number | null;
}

/** A food's words, worked out once: the name and each term as its own list. */
export interface IndexedFood<F extends SearchableFood = SearchableFood> {
  food: F;
  docs: string[][];
  all: Set<string>;
}

export function indexFood<F extends SearchableFood>(food: F): IndexedFood<F> {
  const docs = [food.name, ...(food.terms ?? [])].map((t) => searchWords(t));
  const all = new Set(docs.flat());
  if (food.preparation) all.add(food.preparation);
  return { food, docs, all };
}

const matchesWord = (q: string, word: string) => word === q || (q.length >= 2 && word.startsWith(q));

/**
 * Bonus by where a food comes from: the team's own (and the athlete's personal foods, weighed like
 * them) and our everyday foods before the reference table.
 */
const SOURCE_BONUS: Record<SearchableFood['source'], number> = {
  team: 8,
  personal: 8,
  everyday: 6,
  reference: 0,
};

/**
 * How well a food answers the query's words (higher is better), or null when some word starts no
 * word of the food. Usage is not counted here.
 */
export function matchScore(query: readonly string[], indexed: IndexedFood): number | null {
  if (query.length === 0) return 0;
  if (!query.every((q) => [...indexed.all].some((w) => matchesWord(q, w)))) return null;
  let best = 10 + query.filter((q) => indexed.all.has(q)).length * 3;
  for (const doc of indexed.docs) {
    if (!query.every((q) => doc.some((w) => matchesWord(q, w)))) continue;
    const whole = query.filter((q) => doc.includes(q)).length;
    const exact = whole === query.length && new Set(doc).size === new Set(query).size;
    const score = exact
      ? 60
      : 30 +
        whole * 5 -
        Math.max(0, doc.length - query.length) * 2 +
        (matchesWord(query[0]!, doc[0] ?? '') ? 8 : 0);
    best = Math.max(best, score);
  }
  return best + SOURCE_BONUS[indexed.food.source];
}

/**
 * Points for use (log-scaled): the athlete's own logs weigh 20 a doubling and 10 more when logged in
 * the last 7 days, so a food they log beats a better-worded one they never log; the rest of the
 * team's logs weigh 8 a doubling.
 */
export function usageScore(usage: FoodUsage | undefined, now: number): number {
  if (!usage) return 0;
  const recent = usage.lastMineAt !== null && now - usage.lastMineAt <= 7 * 86_400_000 ? 10 : 0;
  return 20 * Math.log2(1 + usage.mine) + 8 * Math.log2(1 + Math.max(0, usage.team - usage.mine)) + recent;
}

/**
 * The foods answering `q`, best first, at most `limit`. An empty query lists the foods this athlete
 * and the team have logged (recent and frequent first), then our everyday foods.
 */
export function rankFoods<F extends SearchableFood>(
  q: string | undefined,
  foods: readonly IndexedFood<F>[],
  usage: ReadonlyMap<string, FoodUsage>,
  limit: number,
  now: number,
): F[] {
  const query = searchWords(q);
  const scored: { food: F; score: number }[] = [];
  for (const indexed of foods) {
    const used = usage.get(indexed.food.id.toLowerCase());
    if (query.length === 0) {
      if (used) scored.push({ food: indexed.food, score: 1000 + usageScore(used, now) });
      else if (indexed.food.source === 'everyday') scored.push({ food: indexed.food, score: 0 });
      continue;
    }
    const match = matchScore(query, indexed);
    if (match !== null) scored.push({ food: indexed.food, score: match + usageScore(used, now) });
  }
  return scored
    .sort(
      (a, b) =>
        b.score - a.score ||
        a.food.name.length - b.food.name.length ||
        a.food.name.localeCompare(b.food.name, 'en', { sensitivity: 'base' }),
    )
    .slice(0, limit)
    .map((s) => s.food);
}
