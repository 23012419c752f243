/** Sums about the mean of one group, from a corrected two-pass algorithm. */
export interface CentralMoments {
  n: number;
  /** Mean (in whatever units the values are in; centred values give a centred mean). */
  mean: number;
  /** Σ(x − x̄)², with the Chan–Golub–LeVeque correction. */
  ss: number;
  /** Σ(x − x̄)³ and Σ(x − x̄)⁴, for skewness and kurtosis. */
  m3: number;
  m4: number;
}

/**
 * Corrected two-pass central moments: the mean from a compensated sum (Neumaier), then
 * Σ(x − x̄)² − (Σ(x − x̄))²/n, whose second term removes the error left in x̄ (it is exactly
 * zero in exact arithmetic).
 * Reference: Chan, T. F., Golub, G. H. & LeVeque, R. J. (1983). Algorithms for computing
 * the sample variance: analysis and recommendations. The American Statistician 37, 242–247.
 * Example: centralMoments([1, 2, 3, 4]) → { n: 4, mean: 2.5, ss: 5, m3: 0, m4: 10.25 }.
 * Cost: two passes, O(n); no allocation.
 */
export function centralMoments(values: ArrayLike<number>): CentralMoments {
  const n = values.length;
  if (n === 0) return { n: 0, mean: 0, ss: 0, m3: 0, m4: 0 };
  let sum = 0;
  let comp = 0;
  for (let i = 0; i < n; i++) {
    const v = values[i] as number;
    const t = sum + v;
    comp += Math.abs(sum) >= Math.abs(v) ? sum - t + v : v - t + sum;
    sum = t;
  }
  const mean = (sum + comp) / n;
  let s1 = 0;
  let s2 = 0;
  let c2 = 0;
  let s3 = 0;
  let s4 = 0;
  for (let i = 0; i < n; i++) {
    const d = (values[i] as number) - mean;
    const d2 = d * d;
    s1 += d;
    // Squares are non-negative, so a Kahan step is enough to compensate them.
    const y = d2 - c2;
    const t = s2 + y;
    c2 = t - s2 - y;
    s2 = t;
    s3 += d2 * d;
    s4 += d2 * d2;
  }
  const ss = Math.max(0, s2 - (s1 * s1) / n);
  return { n, mean: mean + s1 / n, ss, m3: s3, m4: s4 };
}
