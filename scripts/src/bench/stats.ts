/** Small statistics for the bench: nearest-rank percentiles and the median of repetitions. */

/** Nearest-rank percentile (Hyndman & Fan 1996, definition 1; value from memory); NaN for no samples. */
export function percentile(samples: readonly number[], p: number): number {
  if (samples.length === 0) return NaN;
  const sorted = [...samples].sort((a, b) => a - b);
  const rank = Math.min(sorted.length, Math.max(1, Math.ceil((p / 100) * sorted.length)));
  return sorted[rank - 1]!;
}

/** The median (mean of the middle two for an even count); NaN for no samples. */
export function median(samples: readonly number[]): number {
  if (samples.length === 0) return NaN;
  const sorted = [...samples].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** Runs `measure` `times` times in a row and returns every result. */
export async function repeat<T>(times: number, measure: (rep: number) => Promise<T>): Promise<T[]> {
  const results: T[] = [];
  for (let rep = 0; rep < times; rep += 1) results.push(await measure(rep));
  return results;
}

/** The median of one field over repetitions. */
export function medianOf<T>(results: readonly T[], pick: (r: T) => number): number {
  return median(results.map(pick));
}
