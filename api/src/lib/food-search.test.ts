import { describe, expect, it } from 'vitest';
import { compareByRelevance, nameMatches, searchWords } from './food-search.js';

describe('food search', () => {
  it('splits a query into lower-case words', () => {
    expect(searchWords('  Milk, COW ')).toEqual(['milk', 'cow']);
    expect(searchWords('')).toEqual([]);
    expect(searchWords(undefined)).toEqual([]);
  });

  it('matches every word in any order, ignoring case', () => {
    expect(nameMatches('Milk, whole, Cow', ['cow', 'milk'])).toBe(true);
    expect(nameMatches('Milk, whole, Cow', ['cow', 'goat'])).toBe(false);
    expect(nameMatches('Anything', [])).toBe(true);
  });

  it('ranks names starting with the first word first', () => {
    const names = ['Bread, rice', 'Ricebean', 'Rice, raw, milled', 'Puffed rice cake'].map((name) => ({
      name,
    }));
    expect(names.sort(compareByRelevance(['rice'])).map((n) => n.name)).toEqual([
      'Rice, raw, milled',
      'Ricebean',
      'Bread, rice',
      'Puffed rice cake',
    ]);
  });
});
