import type { Unavailable } from "../types/group-summary.js";
import type { CentralMoments } from "../numeric/central-moments.js";

/**
 * Sample skewness and excess kurtosis with the small-sample adjustments:
 * G1 = g1·√(n(n−1))/(n−2) with g1 = m3/m2^{3/2}, and
 * G2 = (n−1)/((n−2)(n−3))·((n+1)g2 + 6) with g2 = m4/m2² − 3, where m_r = Σ(x−x̄)^r / n.
 * Reference: Joanes, D. N. & Gill, C. A. (1998). Comparing measures of sample skewness and
 * kurtosis. The Statistician 47, 183–189 (G1, G2).
 * Example: for 1, 2, 3, 10: G1 ≈ 1.76, G2 ≈ 3.2.
 * Cost: O(1) from the central moments.
 */
export function skewnessKurtosis(m: CentralMoments): {
  skewness: number | Unavailable;
  kurtosis: number | Unavailable;
} {
  const { n, ss } = m;
  if (ss <= 0) {
    const reason = "all values in the group are equal, so the shape of the distribution is undefined";
    return { skewness: { available: false, reason }, kurtosis: { available: false, reason } };
  }
  const m2 = ss / n;
  const g1 = m.m3 / n / Math.pow(m2, 1.5);
  const g2 = m.m4 / n / (m2 * m2) - 3;
  const skewness: number | Unavailable =
    n >= 3
      ? (g1 * Math.sqrt(n * (n - 1))) / (n - 2)
      : { available: false, reason: `skewness needs at least 3 values; the group has ${n}` };
  const kurtosis: number | Unavailable =
    n >= 4
      ? ((n - 1) / ((n - 2) * (n - 3))) * ((n + 1) * g2 + 6)
      : { available: false, reason: `kurtosis needs at least 4 values; the group has ${n}` };
  return { skewness, kurtosis };
}
