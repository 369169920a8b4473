import { describe, expect, it } from 'vitest';
import { createRandom, mulberry32 } from './random.js';

describe('mulberry32', () => {
  it('is deterministic per seed and stays in [0, 1)', () => {
    const a = mulberry32(42);
    const b = mulberry32(42);
    const seqA = Array.from({ length: 1000 }, a);
    expect(Array.from({ length: 1000 }, b)).toEqual(seqA);
    expect(seqA.every((x) => x >= 0 && x < 1)).toBe(true);
    expect(Array.from({ length: 5 }, mulberry32(43))).not.toEqual(seqA.slice(0, 5));
  });

  it('produces the reference sequence for seed 1', () => {
    // The published first outputs of mulberry32(1); a change here changes every demo number.
    const r = mulberry32(1);
    expect([r(), r(), r()].map((x) => x.toFixed(10))).toEqual(PINNED_SEED_1);
  });
});

describe('createRandom', () => {
  it('draws whole numbers inside the inclusive range', () => {
    const r = createRandom(7);
    const draws = Array.from({ length: 2000 }, () => r.int(3, 5));
    expect(new Set(draws)).toEqual(new Set([3, 4, 5]));
  });

  it('draws normals with about the right mean and spread', () => {
    const r = createRandom(11);
    const xs = Array.from({ length: 20000 }, () => r.normal(80, 2));
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    const sd = Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / xs.length);
    expect(mean).toBeCloseTo(80, 1);
    expect(sd).toBeGreaterThan(1.9);
    expect(sd).toBeLessThan(2.1);
  });
});

const PINNED_SEED_1 = ['0.6270739406', '0.0027357212', '0.5274470400'];
