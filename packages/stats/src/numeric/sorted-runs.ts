/** An ascending array as runs of equal values: run r holds values[r], ending before ends[r]. */
export interface SortedRuns {
  readonly count: number;
  readonly values: Float64Array;
  readonly ends: Int32Array;
}

const cache = new WeakMap<object, SortedRuns>();

/** Records runs already known for a sorted array (the counting sort finds them as it goes). */
export function rememberRuns(sorted: Float64Array, runs: SortedRuns): void {
  cache.set(sorted, runs);
}

/**
 * The runs of equal values in an ascending array, found once per array and shared (by
 * identity: the per-group sorted arrays from sortedValues are made once). Measured data
 * repeat values often (100,000 values at 3 decimals hold about 10,000 distinct ones), so
 * methods that walk two groups side by side (the rank-biserial U of every pair) step per run.
 * Equality is ===, so −0 and 0 share a run, as they compare equal everywhere else.
 * Example: sortedRuns(Float64Array.of(1, 1, 2, 5, 5, 5)) → values [1, 2, 5], ends [2, 3, 6].
 * Cost: O(n) the first time, O(1) afterwards. Do not modify the array after the call.
 */
export function sortedRuns(sorted: ArrayLike<number>): SortedRuns {
  const cached = typeof sorted === "object" ? cache.get(sorted) : undefined;
  if (cached) return cached;
  const n = sorted.length;
  let count = 0;
  for (let i = 0; i < n; i++) if (i === 0 || sorted[i] !== sorted[i - 1]) count++;
  const values = new Float64Array(count);
  const ends = new Int32Array(count);
  let r = -1;
  for (let i = 0; i < n; i++) {
    const x = sorted[i] as number;
    if (i === 0 || x !== values[r]) values[++r] = x;
    ends[r] = i + 1;
  }
  const runs = { count, values, ends };
  cache.set(sorted, runs);
  return runs;
}
