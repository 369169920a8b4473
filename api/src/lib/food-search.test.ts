import { describe, expect, it } from 'vitest';
import { listEverydayFoods } from '../adapters/everyday-foods.js';
import { listReferenceFoods } from '../adapters/reference-foods.js';
import { preparationOf } from '../presenters/food.presenter.js';
import { EVERYDAY_SEARCHES } from './everyday-searches.js';
import {
  indexFood,
  matchScore,
  normaliseWord,
  rankFoods,
  searchWords,
  type FoodUsage,
  type IndexedFood,
  type SearchableFood,
} from './food-search.js';

const NOW = Date.UTC(2026, 11, 1, 12);
const food = (id: string, name: string, extra: Partial<SearchableFood> = {}): SearchableFood => ({
  id,
  name,
  source: 'reference',
  ...extra,
});
const rank = (q: string, foods: SearchableFood[], usage = new Map<string, FoodUsage>(), limit = 10) =>
  rankFoods(q, foods.map(indexFood), usage, limit, NOW).map((f) => f.name);

describe('normalising words', () => {
  it('makes plurals singular and unifies spellings, on both sides alike', () => {
    expect(
      ['oats', 'eggs', 'potatoes', 'berries', 'peaches', 'glasses', 'lentils'].map(normaliseWord),
    ).toEqual(['oat', 'egg', 'potato', 'berry', 'peach', 'glass', 'lentil']);
    // Words that only look plural stay whole.
    expect(['hummus', 'swiss', 'gas', 'whey', 'pasta'].map(normaliseWord)).toEqual([
      'hummus',
      'swiss',
      'gas',
      'whey',
      'pasta',
    ]);
    expect(normaliseWord('Yoghurt')).toBe('yogurt');
    expect(normaliseWord('Crème')).toBe('creme');
    expect(searchWords('  Milk, COW ')).toEqual(['milk', 'cow']);
    expect(searchWords('')).toEqual([]);
  });
});

describe('matching', () => {
  it('matches the starts of words, never inside a word: "oat" finds oats, not goat', () => {
    const foods = [food('a', 'Goat, chops'), food('b', 'Oats, rolled'), food('c', 'Oatmeal cookie')];
    expect(rank('oat', foods)).toEqual(['Oats, rolled', 'Oatmeal cookie']);
    expect(rank('oats', foods)).toEqual(['Oats, rolled', 'Oatmeal cookie']);
  });

  it('finds a food by its other words, and counts raw/cooked as a word', () => {
    const oats = food('dm:oats', 'Oats, rolled, dry', {
      terms: ['oat flakes', 'porridge oats'],
      source: 'everyday',
    });
    const rice = food('dm:rice', 'Rice, white, long-grain', { preparation: 'cooked', source: 'everyday' });
    expect(rank('oat flakes', [oats])).toEqual(['Oats, rolled, dry']);
    expect(rank('porridge', [oats])).toEqual(['Oats, rolled, dry']);
    expect(rank('rice cooked', [rice])).toEqual(['Rice, white, long-grain']);
    expect(rank('rice raw', [rice])).toEqual([]);
  });

  it('puts a query that is exactly a name or term first, then names starting with the first word', () => {
    const foods = [
      food('1', 'Bread, rice'),
      food('2', 'Rice, raw, milled'),
      food('3', 'Rice'),
      food('4', 'Puffed rice cake'),
    ];
    expect(rank('rice', foods)).toEqual(['Rice', 'Rice, raw, milled', 'Bread, rice', 'Puffed rice cake']);
    expect(matchScore(['rice'], indexFood(food('3', 'Rice')))).toBeGreaterThan(
      matchScore(['rice'], indexFood(food('2', 'Rice, raw, milled')))!,
    );
  });
});

describe('ranking by use', () => {
  const foods = [food('a', 'Apple, big'), food('b', 'Apple, green'), food('c', 'Apple, small')];

  it('puts what this athlete logs before what the team logs, and both before the rest', () => {
    const usage = new Map<string, FoodUsage>([
      ['c', { mine: 4, team: 4, lastMineAt: NOW - 86_400_000 }],
      ['b', { mine: 0, team: 9, lastMineAt: null }],
    ]);
    expect(rank('apple', foods, usage)).toEqual(['Apple, small', 'Apple, green', 'Apple, big']);
  });

  it('lists recent and frequent foods when the box is empty, then everyday foods', () => {
    const usage = new Map<string, FoodUsage>([
      ['a', { mine: 1, team: 1, lastMineAt: NOW - 3600_000 }],
      ['b', { mine: 5, team: 12, lastMineAt: NOW - 20 * 86_400_000 }],
    ]);
    const everyday = food('dm:x', 'Banana, raw', { source: 'everyday' });
    expect(rank('', [...foods, everyday], usage)).toEqual(['Apple, green', 'Apple, big', 'Banana, raw']);
  });
});

describe('thirty everyday searches (everyday-searches.ts): the expected food in the top 3', () => {
  it('finds every one of them (before this search: 10 of 30)', async () => {
    const indexed: IndexedFood[] = [
      ...listEverydayFoods().map((f) => indexFood<SearchableFood>({ ...f, source: 'everyday' })),
      ...(await listReferenceFoods()).map((f) =>
        indexFood<SearchableFood>({
          id: f.id,
          name: f.name,
          preparation: preparationOf(f.name),
          source: 'reference',
        }),
      ),
    ];
    const misses: string[] = [];
    for (const c of EVERYDAY_SEARCHES) {
      const top = rankFoods(c.q, indexed, new Map(), 3, NOW);
      if (!top.some((f) => c.expect.includes(f.id)))
        misses.push(`${c.q} → ${top.map((f) => f.name).join(' | ')}`);
    }
    expect(EVERYDAY_SEARCHES).toHaveLength(30);
    expect(misses).toEqual([]);
  });
});
