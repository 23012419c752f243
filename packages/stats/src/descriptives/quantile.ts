/**
 * Sample quantile by linear interpolation between order statistics (the usual default,
 * "type 7" in Hyndman & Fan's list; common practice): with sorted x₁ ≤ … ≤ xₙ and
 * h = (n − 1)p, Q(p) = x_{⌊h⌋+1} + (h − ⌊h⌋)(x_{⌊h⌋+2} − x_{⌊h⌋+1}).
 * Reference: Hyndman, R. J. & Fan, Y. (1996). Sample quantiles in statistical packages.
 * The American Statistician 50, 361–365.
 * Example: quantileSorted([1, 2, 3, 4], 0.25) → 1.75.
 * Cost: O(1) on sorted input. `sorted` must be ascending and non-empty; 0 ≤ p ≤ 1.
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const a = sorted[lo] as number;
  if (lo + 1 >= n) return a;
  const b = sorted[lo + 1] as number;
  const frac = h - lo;
  return frac === 0 ? a : a + frac * (b - a);
}
