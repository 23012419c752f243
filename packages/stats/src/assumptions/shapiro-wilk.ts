import { normalQuantile, normalSf } from "../distributions/normal.js";
import type { Unavailable } from "../types/group-summary.js";

export interface ShapiroWilkResult {
  available: true;
  method: "Shapiro–Wilk";
  n: number;
  W: number;
  p: number;
}

/** Royston's approximation holds for 3 ≤ n ≤ 5000 (Royston 1995). */
export const SHAPIRO_WILK_MAX_N = 5000;

// Polynomial coefficients published in Royston (1992, 1995), ascending powers.
const C1 = [0, 0.221157, -0.147981, -2.07119, 4.434685, -2.706056];
const C2 = [0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633];
const C3 = [0.544, -0.39978, 0.025054, -6.714e-4];
const C4 = [1.3822, -0.77857, 0.062767, -0.0020322];
const C5 = [-1.5861, -0.31082, -0.083751, 0.0038915];
const C6 = [-0.4803, -0.082676, 0.0030302];
const G = [-2.273, 0.459];

function poly(c: readonly number[], x: number): number {
  let r = 0;
  for (let i = c.length - 1; i >= 0; i--) r = r * x + (c[i] as number);
  return r;
}

/** Coefficients by n: groups of equal size, and the per-group normality check, reuse them. */
const coefficientCache = new Map<number, Float64Array>();
const COEFFICIENT_CACHE_SIZE = 32;

/**
 * The Shapiro–Wilk coefficients for n values (Royston 1992): a[i] weighs the (i+1)-th
 * largest value, for i < ⌊n/2⌋. They depend on n alone, so they are computed once per n
 * (⌊n/2⌋ normal quantiles) and kept for the most recent sizes. Do not modify the result.
 */
function coefficients(n: number): Float64Array {
  const cached = coefficientCache.get(n);
  if (cached) return cached;
  const half = Math.floor(n / 2);
  // a[i] for i = 0..half-1 is the coefficient of the (i+1)-th largest value (positive).
  const a = new Float64Array(half);
  if (n === 3) {
    a[0] = Math.SQRT1_2;
  } else {
    const m = new Float64Array(half);
    let summ2 = 0;
    for (let i = 0; i < half; i++) {
      const q = normalQuantile((i + 1 - 0.375) / (n + 0.25)); // negative: lower tail scores
      m[i] = q;
      summ2 += q * q;
    }
    summ2 *= 2;
    const ssumm2 = Math.sqrt(summ2);
    const rsn = 1 / Math.sqrt(n);
    const m0 = m[0] as number;
    const a1 = poly(C1, rsn) - m0 / ssumm2;
    let first: number;
    let fac: number;
    if (n > 5) {
      const m1 = m[1] as number;
      const a2 = -m1 / ssumm2 + poly(C2, rsn);
      fac = Math.sqrt((summ2 - 2 * m0 * m0 - 2 * m1 * m1) / (1 - 2 * a1 * a1 - 2 * a2 * a2));
      a[1] = a2;
      first = 2;
    } else {
      fac = Math.sqrt((summ2 - 2 * m0 * m0) / (1 - 2 * a1 * a1));
      first = 1;
    }
    a[0] = a1;
    for (let i = first; i < half; i++) a[i] = -(m[i] as number) / fac;
  }
  if (coefficientCache.size >= COEFFICIENT_CACHE_SIZE) coefficientCache.clear();
  coefficientCache.set(n, a);
  return a;
}

/**
 * Shapiro–Wilk test of normality, W = (Σ aᵢ x₍ᵢ₎)² / Σ(xᵢ − x̄)², with Royston's
 * approximations: coefficients aᵢ from Blom-type normal scores mᵢ = Φ⁻¹((i − 3/8)/(n + 1/4))
 * corrected at the two (n > 5) or one extreme positions by polynomials in 1/√n; p from a
 * normalising transform of log(1 − W) (n ≥ 12: lognormal; 4 ≤ n ≤ 11: −log(γ − log(1 − W)));
 * exact p at n = 3: (6/π)(asin √W − asin √(3/4)), clamped at 0.
 * Numerics: values are centred on the median and divided by the range, and 1 − W is formed
 * directly as (√(SaSx) − Sax)(√(SaSx) + Sax)/(SaSx) (the correlation form), so W close to 1
 * keeps its digits and the n = 3 p cannot go negative.
 * References: Shapiro, S. S. & Wilk, M. B. (1965). Biometrika 52, 591–611; Royston, P. (1992).
 * Statistics and Computing 2, 117–119; Royston, P. (1995). Algorithm AS R94, Applied
 * Statistics 44, 547–551.
 * Example: shapiroWilk(Float64Array.of(1, 2, 4)) → W = 0.9643, p = 0.6369.
 * Cost: O(n) on sorted input plus n/2 normal quantiles.
 * `sorted` must be ascending. Unavailable for n < 3, n > 5000, or zero range.
 */
export function shapiroWilk(sorted: ArrayLike<number>): ShapiroWilkResult | Unavailable {
  const n = sorted.length;
  if (n < 3) return { available: false, reason: `The Shapiro–Wilk test needs at least 3 values; found ${n}` };
  if (n > SHAPIRO_WILK_MAX_N) {
    return {
      available: false,
      reason: `The Shapiro–Wilk approximation is valid up to ${SHAPIRO_WILK_MAX_N} values; found ${n}, so skewness and kurtosis describe the shape instead`,
    };
  }
  const lo = sorted[0] as number;
  const hi = sorted[n - 1] as number;
  const range = hi - lo;
  if (!(range > 0))
    return {
      available: false,
      reason: "All values are identical, so the Shapiro–Wilk statistic is undefined",
    };

  const half = Math.floor(n / 2);
  const a = coefficients(n);

  // Correlation form on median-centred, range-scaled values.
  const med =
    n % 2 === 1 ? (sorted[half] as number) : ((sorted[half - 1] as number) + (sorted[half] as number)) / 2;
  let sx = 0;
  for (let i = 0; i < n; i++) sx += ((sorted[i] as number) - med) / range;
  sx /= n;
  // Σa = 0 by antisymmetry, so the coefficient mean is exactly 0.
  let ssa = 0;
  let ssx = 0;
  let sax = 0;
  for (let i = 0; i < n; i++) {
    const j = n - 1 - i;
    let ai = 0;
    if (i < j && i < half) ai = -(a[i] as number);
    else if (j < i && j < half) ai = a[j] as number;
    const xi = ((sorted[i] as number) - med) / range - sx;
    ssa += ai * ai;
    ssx += xi * xi;
    sax += ai * xi;
  }
  const root = Math.sqrt(ssa * ssx);
  const oneMinusW = Math.max(0, ((root - sax) * (root + sax)) / (ssa * ssx));
  const W = 1 - oneMinusW;

  let p: number;
  if (n === 3) {
    p = Math.max(0, (6 / Math.PI) * (Math.asin(Math.sqrt(W)) - Math.PI / 3));
    p = Math.min(1, p);
  } else if (oneMinusW === 0) {
    p = 1;
  } else {
    const y = Math.log(oneMinusW);
    if (n <= 11) {
      const gamma = poly(G, n);
      if (y >= gamma) {
        p = 0; // beyond the transform's support: W is as small as it can be for this n
      } else {
        const yt = -Math.log(gamma - y);
        const mu = poly(C3, n);
        const sigma = Math.exp(poly(C4, n));
        p = normalSf((yt - mu) / sigma);
      }
    } else {
      const ln = Math.log(n);
      const mu = poly(C5, ln);
      const sigma = Math.exp(poly(C6, ln));
      p = normalSf((y - mu) / sigma);
    }
  }
  return { available: true, method: "Shapiro–Wilk", n, W, p };
}
