import { normalQuantile } from "../distributions/normal.js";
import { MANN_WHITNEY_EXACT_BELOW, mannWhitneyLowerTail } from "./mann-whitney-null.js";
import { pairwiseDifferenceAfter, pairwiseDifferenceOrder } from "./pairwise-difference-order.js";

export type HodgesLehmannShift = {
  /** median of the n_a·n_b differences a_i − b_j */
  estimate: number;
} & (
  | {
      intervalAvailable: true;
      lower: number;
      upper: number;
      /** the confidence asked for this one interval, e.g. 1 − α/m */
      intervalLevel: number;
      /** the confidence the order statistics actually give (at least intervalLevel) */
      achievedLevel: number;
      intervalMethod: "exact" | "normal";
    }
  | { intervalAvailable: false; intervalReason: string }
);

/**
 * Hodges–Lehmann estimate of the shift between two groups with its distribution-free
 * confidence interval from the Mann–Whitney statistic.
 *
 * In words: the estimate is the median of all n_a·n_b differences a_i − b_j (for an even
 * count, the mean of the middle two). The interval is [D_(c), D_(nm + 1 − c)], D_(r) the
 * r-th smallest difference, with c the largest integer such that P(U ≤ c − 1) ≤ (1 − level)/2
 * under the null — the set of shifts a two-sided Mann–Whitney test would not reject. P is
 * the exact null distribution of U when both groups have fewer than 50 values and there are
 * no ties; otherwise the normal approximation with continuity and tie correction:
 * c = ⌊nm/2 + 1/2 − z_{1 − (1 − level)/2}·σ⌋, σ² = nm/12·[(N + 1) − Σ(t³ − t)/(N(N − 1))].
 * When even the widest interval (c = 1, smallest to largest difference) falls short of the
 * level asked for, the interval is unavailable and the reason says how far it falls short.
 *
 * Reference: Hodges & Lehmann (1963), Annals of Mathematical Statistics 34, 598–611;
 * Lehmann (1975), Nonparametrics, §2.6 (from memory); Hollander & Wolfe (1999),
 * Nonparametric Statistical Methods, §4.3 (from memory).
 * Example: a = [1, 2, 3, 4, 5, 6], b = [0, 0.5, 1.5, 2.5, 3.5, 5.5], level .95 → estimate 1,
 * c = 6 (exact P(U ≤ 5) = .0206), interval [D_(6), D_(31)].
 * Cost: O((n_a + n_b)·b) per order statistic (see pairwiseDifferenceOrder), plus the exact
 * distribution O(n_a·n_b·n_a·n_b/2) the first time a pair of sizes is seen.
 */
export function hodgesLehmannShift(
  a: Float64Array,
  b: Float64Array,
  level: number,
  /** the estimate and Σ(t³ − t) over tied runs of the two groups pooled, when the caller has them */
  known?: { estimate?: number; pooledTieSum?: number },
): HodgesLehmannShift {
  const n = a.length;
  const m = b.length;
  const nm = n * m;
  const estimate = known?.estimate ?? hodgesLehmannEstimate(a, b);
  const tieSum = known?.pooledTieSum ?? tieSumOf(a, b);
  const tail = (1 - level) / 2;
  let c: number;
  let achieved: number;
  let intervalMethod: "exact" | "normal";
  if (n < MANN_WHITNEY_EXACT_BELOW && m < MANN_WHITNEY_EXACT_BELOW && tieSum === 0) {
    intervalMethod = "exact";
    const cdf = mannWhitneyLowerTail(n, m);
    c = 0;
    while (c < cdf.length && (cdf[c] as number) <= tail) c++; // P(U ≤ c − 1) ≤ tail
    achieved = c >= 1 ? 1 - 2 * (cdf[c - 1] as number) : 1 - 2 * (cdf[0] as number);
    if (c < 1)
      return {
        estimate,
        intervalAvailable: false,
        intervalReason: `with ${n} and ${m} values the widest distribution-free interval (smallest to largest difference) has confidence ${(1 - 2 * (cdf[0] as number)).toFixed(4)}, below the ${level.toFixed(4)} needed`,
      };
  } else {
    intervalMethod = "normal";
    const N = n + m;
    const sigma = Math.sqrt((nm / 12) * (N + 1 - tieSum / (N * (N - 1))));
    c = Math.floor(nm / 2 + 0.5 - normalQuantile(1 - tail) * sigma);
    achieved = level;
    if (c < 1)
      return {
        estimate,
        intervalAvailable: false,
        intervalReason: `with ${n} and ${m} values (with ties) no distribution-free interval reaches the ${level.toFixed(4)} needed`,
      };
  }
  return {
    estimate,
    intervalAvailable: true,
    lower: pairwiseDifferenceOrder(a, b, c),
    upper: pairwiseDifferenceOrder(a, b, nm + 1 - c),
    intervalLevel: level,
    achievedLevel: achieved,
    intervalMethod,
  };
}

/** The Hodges–Lehmann shift alone: the median of the n·m differences a_i − b_j. */
export function hodgesLehmannEstimate(a: Float64Array, b: Float64Array): number {
  const nm = a.length * b.length;
  if (nm % 2 === 1) return pairwiseDifferenceOrder(a, b, (nm + 1) / 2);
  const lowMiddle = pairwiseDifferenceOrder(a, b, nm / 2);
  return (lowMiddle + pairwiseDifferenceAfter(a, b, nm / 2, lowMiddle)) / 2;
}

/** Σ(t³ − t) over runs of equal values in the two sorted samples pooled (merge, O(n + m)). */
function tieSumOf(a: Float64Array, b: Float64Array): number {
  let i = 0;
  let j = 0;
  let s = 0;
  while (i < a.length || j < b.length) {
    const x = Math.min(
      i < a.length ? (a[i] as number) : Infinity,
      j < b.length ? (b[j] as number) : Infinity,
    );
    const i0 = i;
    const j0 = j;
    while (i < a.length && a[i] === x) i++;
    while (j < b.length && b[j] === x) j++;
    const t = i - i0 + (j - j0);
    s += t * t * t - t;
  }
  return s;
}
