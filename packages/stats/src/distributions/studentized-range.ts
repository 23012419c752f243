import erfc from "@stdlib/math-base-special-erfc";
import { StatsInputError } from "../errors.js";
import { findRootBrent } from "../numeric/brent-root.js";
import { stirlingError } from "../numeric/stirling-error.js";
import { normalQuantile } from "./normal.js";
import { tQuantile } from "./t.js";

/**
 * Studentized range distribution: the law of Q = (max Zᵢ − min Zᵢ)/S for k independent
 * standard normals Zᵢ and an independent S with ν·S² ~ χ²_ν.
 *
 * In words: P(Q ≤ q) = ∫₀^∞ f_ν(s) · P∞(q·s) ds, where f_ν is the density of S (a scaled
 * chi distribution) and P∞(w) = k ∫ φ(z) [Φ(z + w) − Φ(z)]^{k−1} dz is the distribution of
 * the range of k standard normals. Both integrands are analytic and decay on both sides, so
 * both integrals use the trapezoidal rule on uniform grids (in z, and in ln s), which
 * converges geometrically for such integrands. The upper tail is integrated directly, not
 * as 1 − cdf:
 * 1 − P∞(w) = k ∫ φ(z) [Φ̄(z)^{k−1} − (Φ̄(z) − Φ̄(z + w))^{k−1}] dz (Φ̄ = 1 − Φ), whose
 * integrand is positive and evaluated without cancellation, so far-tail p-values keep
 * their relative accuracy.
 *
 * Reference: Copenhaver & Holland (1988), J. Statistical Computation and Simulation 30,
 * 1–15 (the double integral and its quadrature); Lund & Lund (1983), Algorithm AS 190,
 * Applied Statistics 32, 204–210 (the infinite-df form).
 *
 * Example: studentizedRangeSf(3.5, 3, 20) ≈ 0.05589; studentizedRangeQuantile(0.95, 3, 20) ≈ 3.5779.
 * Cost: 30–200 inner integrals of 40–200 normal tails each per call (under a millisecond);
 * inner values are cached per k, so a full Tukey table (45 p-values and a quantile) costs
 * about 10–25 ms cold and 2 ms warm (measured); the quantile takes about ten calls.
 * Accuracy: about 1e-13 relative against adaptive Gauss–Kronrod quadrature (measured).
 */
export function studentizedRangeCdf(q: number, k: number, df: number): number {
  check(q, k, df, "cdf");
  if (q <= 0) return 0;
  if (q === Infinity) return 1;
  return Math.min(1, outer(q, k, df, false));
}

/** Upper tail P(Q > q), integrated directly (see studentizedRangeCdf). */
export function studentizedRangeSf(q: number, k: number, df: number): number {
  check(q, k, df, "sf");
  if (q <= 0) return 1;
  if (q === Infinity) return 0;
  return Math.min(1, outer(q, k, df, true));
}

/**
 * Quantile: the q with P(Q ≤ q) = p. The root is bracketed by two bounds that hold for
 * every k: the two-group range (a lower bound) and Bonferroni over the k(k−1)/2 pairs
 * (an upper bound), both of which are √2 times a t quantile; Brent's method then works on
 * the log of whichever tail is smaller, so p near 0 or 1 keeps full precision.
 */
export function studentizedRangeQuantile(p: number, k: number, df: number): number {
  check(0, k, df, "quantile");
  if (!(p >= 0 && p <= 1)) {
    throw new StatsInputError(`The studentized range quantile needs a probability between 0 and 1; got ${p}`);
  }
  if (p === 0) return 0;
  if (p === 1) return Infinity;
  const pairs = (k * (k - 1)) / 2;
  const twoSided = (alpha: number) =>
    Math.SQRT2 * (df === Infinity ? -normalQuantile(alpha / 2) : tQuantile(1 - alpha / 2, df));
  const lo = twoSided(1 - p) * (1 - 1e-12);
  const hi = twoSided((1 - p) / pairs) * (1 + 1e-12);
  const upper = p > 0.5;
  const target = Math.log(upper ? 1 - p : p);
  const h = (x: number) => {
    const v = upper ? outer(x, k, df, true) : outer(x, k, df, false);
    // An underflowed tail is still "far below the target", not −Infinity.
    return Math.log(Math.max(v, 1e-300)) - target;
  };
  // The upper tail decreases in q; flip its sign so h increases in both cases.
  const g = upper ? (x: number) => -h(x) : h;
  return findRootBrent(g, lo, hi, { xTol: 1e-13 });
}

function check(q: number, k: number, df: number, what: string): void {
  if (!Number.isInteger(k) || k < 2) {
    throw new StatsInputError(
      `The studentized range ${what} needs k, the number of groups, to be a whole number of at least 2; got ${k}`,
    );
  }
  if (!(df >= 1)) {
    throw new StatsInputError(`The studentized range ${what} needs at least 1 degree of freedom; got ${df}`);
  }
  if (Number.isNaN(q))
    throw new StatsInputError(`The studentized range ${what} needs a number for q; got NaN`);
}

const LOG_2PI = Math.log(2 * Math.PI);
const INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);
const upperNormal = (z: number) => 0.5 * erfc(z / Math.SQRT2);

/** x^m for a whole m ≥ 0 by repeated squaring (much cheaper than Math.pow in the inner loop). */
function powInt(x: number, m: number): number {
  let result = 1;
  let base = x;
  for (let e = m; e > 0; e >>= 1) {
    if (e & 1) result *= base;
    base *= base;
  }
  return result;
}

/**
 * The inner integrand is analytic and decays like a Gaussian, so the plain trapezoidal rule
 * on a uniform grid converges geometrically (Trefethen & Weideman 2014, SIAM Review 56,
 * 385–458). A grid step of 0.75/√k gave relative errors below 1e-12 against adaptive
 * quadrature for k = 2…100 (measured). The grid z_j = j·h is fixed per k, so φ(z_j), Φ̄(z_j)
 * and Φ(z_j) are computed once and reused by every call.
 */
interface Grid {
  h: number;
  offset: number;
  density: Float64Array; // exp(−z²/2)
  upper: Float64Array; // Φ̄(z)
  lower: Float64Array; // Φ(z) = Φ̄(−z)
}
const GRID_LIMIT = 60; // |z| beyond which nothing contributes in double precision
const grids = new Map<number, Grid>();

function gridFor(k: number): Grid {
  let grid = grids.get(k);
  if (grid) return grid;
  const h = 0.75 / Math.sqrt(k);
  const offset = Math.ceil(GRID_LIMIT / h);
  const size = 2 * offset + 1;
  const density = new Float64Array(size);
  const upper = new Float64Array(size);
  const lower = new Float64Array(size);
  for (let i = 0; i < size; i++) {
    const z = (i - offset) * h;
    density[i] = Math.exp(-0.5 * z * z);
    upper[i] = upperNormal(z);
    lower[i] = upperNormal(-z);
  }
  grid = { h, offset, density, upper, lower };
  grids.set(k, grid);
  return grid;
}

/**
 * Roughly the median range of k standard normals: twice Blom's (1958) approximation to the
 * expected maximum. Below it the lower tail is the smaller one, above it the upper tail.
 */
function medianRange(k: number): number {
  return 2 * normalQuantile((k - 0.375) / (k + 0.25));
}

/**
 * P(range of k standard normals ≤ w), or its complement when `upper`. The smaller of the
 * two tails is summed directly and the other is taken as one minus it, so both keep their
 * relative accuracy.
 */
function rangeNormal(w: number, k: number, upper: boolean): number {
  if (w <= 0) return upper ? 1 : 0;
  const sumUpper = w > medianRange(k);
  const tail = rangeTail(w, k, sumUpper);
  return sumUpper === upper ? tail : 1 - tail;
}

function rangeTail(w: number, k: number, upper: boolean): number {
  const m = k - 1;
  const { h, offset, density, upper: up, lower: low } = gridFor(k);
  const term = upper
    ? (i: number, z: number) => {
        const a = up[i] as number;
        if (a === 0) return 0;
        const c = upperNormal(z + w);
        // a^m − (a − c)^m = a^m · (1 − (1 − c/a)^m), the bracket via expm1/log1p.
        const bracket = c >= a ? 1 : -Math.expm1(m * Math.log1p(-c / a));
        return (density[i] as number) * powInt(a, m) * bracket;
      }
    : (i: number, z: number) => {
        // Φ(z + w) − Φ(z) in the form that avoids subtracting numbers near 1.
        let b: number;
        if (z >= 0) b = (up[i] as number) - upperNormal(z + w);
        else if (z + w <= 0) b = upperNormal(-z - w) - (low[i] as number);
        else b = 1 - (low[i] as number) - upperNormal(z + w);
        return b <= 0 ? 0 : (density[i] as number) * powInt(b, m);
      };
  // March outward from near the peak (z ≈ −w/2; the integrand is unimodal) until two
  // successive terms no longer matter.
  const first = Math.max(-offset, Math.min(offset, Math.round(-w / 2 / h)));
  let sum = term(first + offset, first * h);
  for (const step of [1, -1]) {
    let negligible = 0;
    for (let j = first + step; j >= -offset && j <= offset; j += step) {
      const t = term(j + offset, j * h);
      sum += t;
      if (sum > 0 && t <= 1e-18 * sum) {
        if (++negligible >= 2) break;
      } else negligible = 0;
    }
  }
  return k * INV_SQRT_2PI * h * sum;
}

const BASE_STEP = 0.1;
const U_MIN = -50; // s = e^−50: nothing below contributes for ν ≥ 1
const U_MAX = 3; // s = e³ ≈ 20: beyond the chi tail for ν ≥ 1
const CACHE_LIMIT = 50_000;
const innerCaches = new Map<string, Map<number, number>>();

function innerCache(k: number, level: number, upper: boolean): Map<number, number> {
  const key = `${k}|${level}|${upper ? "u" : "l"}`;
  let cache = innerCaches.get(key);
  if (!cache || cache.size > CACHE_LIMIT) {
    cache = new Map();
    innerCaches.set(key, cache);
  }
  return cache;
}

function outer(q: number, k: number, df: number, upper: boolean): number {
  if (df === Infinity) return rangeNormal(q, k, upper);
  const nu = df;
  const half = nu / 2;
  // ln f_ν(s) for S = √(χ²_ν/ν), arranged so that nothing of order ν cancels:
  // ln 2 + ½ ln(ν/2) − ½ ln 2π − stirlingError(ν/2) + ν(ln s − (s² − 1)/2) − ln s.
  const logConst = Math.LN2 + 0.5 * Math.log(half) - 0.5 * LOG_2PI - stirlingError(half);
  // ln[f_ν(eᵘ)·eᵘ], the integrand's weight in u = ln s.
  const logWeight = (u: number) => {
    const t = Math.expm1(u);
    return logConst + nu * (u - t - 0.5 * t * t); // ν(ln s − (s² − 1)/2)
  };
  // Trapezoidal rule in u = ln s: the integrand f_ν(eᵘ)·eᵘ·P(q eᵘ) is analytic in the strip
  // |Im u| < π/4 and decays on both sides, so the rule converges geometrically (its width
  // near the peak is about 1/√(2ν); the strip bounds the step too). The nodes sit on a grid
  // fixed in v = u + ln q = ln(range argument), so the inner values P(e^v) are shared by
  // every q with the same k and step: the 45 p-values and the quantile of one Tukey table
  // reuse most of them.
  const wanted = 0.6 / Math.sqrt(2 * (upper ? nu : nu + k - 1));
  const level = Math.max(0, Math.ceil(Math.log2(BASE_STEP / wanted)));
  const h = BASE_STEP / 2 ** level;
  const cache = innerCache(k, level, upper);
  const logQ = Math.log(q);
  const term = (j: number) => {
    const v = j * h;
    const lw = logWeight(v - logQ);
    if (lw < -745) return 0;
    let inner = cache.get(j);
    if (inner === undefined) {
      inner = rangeNormal(Math.exp(v), k, upper);
      cache.set(j, inner);
    }
    return Math.exp(lw) * inner;
  };
  // Start near the peak: for the upper tail it moves to s² ≈ ν/(ν + q²/2) as q grows.
  const peak = upper ? 0.5 * Math.log(nu / (nu + (q * q) / 2)) : 0;
  const first = Math.round((peak + logQ) / h);
  const jMin = Math.floor((U_MIN + logQ) / h);
  const jMax = Math.ceil((U_MAX + logQ) / h);
  let sum = term(first);
  for (const step of [1, -1]) {
    let negligible = 0;
    for (let j = first + step; j >= jMin && j <= jMax; j += step) {
      // The weight is unimodal in u with its mode at u = 0 and the inner value is at most 1,
      // so once past the mode with the weight underflowed every further term is exactly 0.
      // Without this stop a tail that underflows (a huge q) scanned the whole grid.
      const u = j * h - logQ;
      if (step * u > 0 && logWeight(u) < -745) break;
      const t = term(j);
      sum += t;
      if (sum > 0 && t <= 1e-18 * sum) {
        if (++negligible >= 2) break;
      } else negligible = 0;
    }
  }
  return h * sum;
}
