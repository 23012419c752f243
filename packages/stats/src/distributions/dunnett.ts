import erfc from "@stdlib/math-base-special-erfc";
import { StatsInputError } from "../errors.js";
import { findRootBrent } from "../numeric/brent-root.js";
import { stirlingError } from "../numeric/stirling-error.js";
import { normalQuantile } from "./normal.js";
import { tQuantile } from "./t.js";

/**
 * Distribution of Dunnett's statistic max_i |T_i| for m comparisons with one control, where
 * T_i = (Z_i)/S with (Z_1…Z_m) standard normals of correlation ρ_ij = λ_i·λ_j and
 * ν·S² ~ χ²_ν independent. For group sizes n_i and control size n_0,
 * λ_i = √(n_i/(n_i + n_0)).
 *
 * In words: writing Z_i = λ_i·Z + √(1 − λ_i²)·Y_i with Z, Y_i independent standard normals,
 * P(max|T_i| ≤ c) = ∫₀^∞ f_ν(s) ∫ φ(z) Π_i [Φ((λ_i z + c s)/√(1 − λ_i²)) − Φ((λ_i z − c s)/√(1 − λ_i²))] dz ds.
 * The upper tail is integrated directly as ∫∫ φ(z)·[1 − Π_i(1 − e_i)], with
 * e_i = Φ̄((c s − λ_i z)/r_i) + Φ̄((c s + λ_i z)/r_i) and 1 − Π(1 − e_i) = −expm1(Σ log1p(−e_i)),
 * so small adjusted p-values keep their relative accuracy. Both integrals use the
 * trapezoidal rule (z on a uniform grid; s in ln s), which converges geometrically for these
 * analytic, decaying integrands.
 *
 * Reference: Dunnett (1955), JASA 50, 1096–1121; Dunnett (1964), Biometrics 20, 482–491
 * (unequal n); the one-factor reduction is Gupta (1963), Annals of Mathematical Statistics
 * 34, 792–828.
 * Example: dunnettQuantile(0.95, [√0.5, √0.5], Infinity) ≈ 2.212 (two treatments, equal n).
 * Cost: about 40–150 outer nodes × 60–120 inner nodes × m normal tails: a few ms per call.
 */
export function dunnettCdf(c: number, lambdas: readonly number[], df: number): number {
  check(lambdas, df);
  if (c <= 0) return 0;
  if (c === Infinity) return 1;
  return Math.min(1, Math.max(0, probability(c, lambdas, df, false)));
}

/** P(max|T_i| > c): the adjusted two-sided p-value for an observed |t| = c. */
export function dunnettSf(c: number, lambdas: readonly number[], df: number): number {
  check(lambdas, df);
  if (c <= 0) return 1;
  if (c === Infinity) return 0;
  return Math.min(1, Math.max(0, probability(c, lambdas, df, true)));
}

/** The two-sided critical value c with P(max|T_i| ≤ c) = p. */
export function dunnettQuantile(p: number, lambdas: readonly number[], df: number): number {
  check(lambdas, df);
  if (!(p > 0 && p < 1))
    throw new StatsInputError(
      `Dunnett's critical value needs a probability strictly between 0 and 1; got ${p}`,
    );
  const m = lambdas.length;
  const tq = (tail: number) => (df === Infinity ? -normalQuantile(tail) : tQuantile(1 - tail, df));
  // One comparison is a lower bound and Bonferroni over m an upper bound.
  const lo = tq((1 - p) / 2) * (1 - 1e-12);
  const hi = tq((1 - p) / (2 * m)) * (1 + 1e-12);
  if (m === 1) return tq((1 - p) / 2);
  const upper = p > 0.5;
  const target = Math.log(upper ? 1 - p : p);
  const g = (c: number) => {
    const v = Math.log(Math.max(probability(c, lambdas, df, upper), 1e-300)) - target;
    return upper ? -v : v;
  };
  return findRootBrent(g, lo, hi, { xTol: 1e-12 });
}

function check(lambdas: readonly number[], df: number): void {
  if (lambdas.length < 1) throw new StatsInputError("Dunnett's distribution needs at least one comparison");
  for (const l of lambdas) {
    if (!(l > 0 && l < 1))
      throw new StatsInputError(`Dunnett's distribution needs each λ strictly between 0 and 1; got ${l}`);
  }
  if (!(df >= 1))
    throw new StatsInputError(`Dunnett's distribution needs at least 1 degree of freedom; got ${df}`);
}

const upperNormal = (x: number) => 0.5 * erfc(x / Math.SQRT2);
const INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);
const Z_STEP = 0.2; // trapezoid step in z (λ ≤ 0.99 keeps every factor smooth on this scale)
const Z_LIMIT = 40;

/** ∫ φ(z)·(Π P_i or 1 − Π P_i) dz for a fixed bound b = c·s. */
function inner(b: number, lambdas: readonly number[], upper: boolean): number {
  const m = lambdas.length;
  // Narrow factors (λ near 1, r small) need a finer step.
  let rMin = 1;
  for (const l of lambdas) rMin = Math.min(rMin, Math.sqrt(1 - l * l));
  const h = Math.min(Z_STEP, 0.5 * rMin);
  const term = (z: number) => {
    let logProd = 0;
    for (let i = 0; i < m; i++) {
      const l = lambdas[i] as number;
      const r = Math.sqrt(1 - l * l);
      const e = upperNormal((b - l * z) / r) + upperNormal((b + l * z) / r);
      logProd += Math.log1p(-Math.min(e, 1));
    }
    const prod = upper ? -Math.expm1(logProd) : Math.exp(logProd);
    return Math.exp(-0.5 * z * z) * prod;
  };
  // The integrand is even in z only when all λ are equal; sum the whole line from 0 outward.
  let sum = term(0);
  for (const step of [1, -1]) {
    let negligible = 0;
    for (let j = step; Math.abs(j * h) <= Z_LIMIT; j += step) {
      const t = term(j * h);
      sum += t;
      if (sum > 0 && t <= 1e-18 * sum) {
        if (++negligible >= 2) break;
      } else negligible = 0;
    }
  }
  return INV_SQRT_2PI * h * sum;
}

function probability(c: number, lambdas: readonly number[], df: number, upper: boolean): number {
  if (df === Infinity) return inner(c, lambdas, upper);
  const nu = df;
  const logConst = Math.LN2 + 0.5 * Math.log(nu / 2) - 0.5 * Math.log(2 * Math.PI) - stirlingError(nu / 2);
  // ln[f_ν(eᵘ)·eᵘ] = logConst + ν(u − (e^{2u} − 1)/2), written without cancellation.
  const logWeight = (u: number) => {
    const t = Math.expm1(u);
    return logConst + nu * (u - t - 0.5 * t * t);
  };
  const h = Math.min(0.6 / Math.sqrt(2 * nu), 0.1);
  const term = (u: number) => {
    const lw = logWeight(u);
    return lw < -745 ? 0 : Math.exp(lw) * inner(c * Math.exp(u), lambdas, upper);
  };
  const peak = upper ? 0.5 * Math.log(nu / (nu + c * c)) : 0;
  const first = Math.round(peak / h);
  let sum = term(first * h);
  for (const step of [1, -1]) {
    let negligible = 0;
    for (let j = first + step; j * h >= -50 && j * h <= 3; j += step) {
      const t = term(j * h);
      sum += t;
      if (sum > 0 && t <= 1e-18 * sum) {
        if (++negligible >= 2) break;
      } else negligible = 0;
    }
  }
  return h * sum;
}
