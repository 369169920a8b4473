/**
 * Deterministic pseudo-random numbers for demo data: the same seed gives the same sequence on
 * every machine. mulberry32 (Tommy Ettinger's 32-bit generator): small, fast, good enough for
 * invented numbers, not for anything secret.
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface Random {
  /** Uniform in [0, 1). */
  next(): number;
  /** Uniform in [min, max). */
  float(min: number, max: number): number;
  /** Whole number in [min, max], both ends included. */
  int(min: number, max: number): number;
  /** True with probability p. */
  chance(p: number): boolean;
  /** Normally distributed (Box–Muller). */
  normal(mean: number, sd: number): number;
  pick<T>(items: readonly T[]): T;
}

export function createRandom(seed: number): Random {
  const next = mulberry32(seed);
  return {
    next,
    float: (min, max) => min + (max - min) * next(),
    int: (min, max) => min + Math.floor((max - min + 1) * next()),
    chance: (p) => next() < p,
    normal(mean, sd) {
      // 1 - next() keeps the logarithm's argument in (0, 1].
      const u = 1 - next();
      const v = next();
      return mean + sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    },
    pick(items) {
      if (items.length === 0) throw new Error('pick from an empty list');
      return items[Math.floor(next() * items.length)] as (typeof items)[number];
    },
  };
}
