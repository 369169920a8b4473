/** The words of a food search, lower-cased, punctuation dropped ("Milk, cow" → ["milk", "cow"]). */
export function searchWords(q: string | undefined): string[] {
  if (!q) return [];
  return q
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter((w) => w.length > 0)
    .slice(0, 8);
}

/** True when every word occurs in the name, in any order, ignoring case. */
export function nameMatches(name: string, words: readonly string[]): boolean {
  const lower = name.toLowerCase();
  return words.every((w) => lower.includes(w));
}

/**
 * Search order: names starting with the first word, then names with a word starting with it,
 * then the rest; alphabetical within each.
 */
export function compareByRelevance(words: readonly string[]) {
  const first = words[0];
  const rank = (name: string) => {
    if (!first) return 0;
    const lower = name.toLowerCase();
    if (lower.startsWith(first)) return 0;
    return lower.split(/[^\p{L}\p{N}]+/u).some((w) => w.startsWith(first)) ? 1 : 2;
  };
  return (a: { name: string }, b: { name: string }) =>
    rank(a.name) - rank(b.name) || a.name.localeCompare(b.name, 'en', { sensitivity: 'base' });
}
