import betainc from "@stdlib/math-base-special-betainc";
import betaincinv from "@stdlib/math-base-special-betaincinv";

/**
 * Student's t distribution through the regularized incomplete beta function:
 * P(|T| > t) = I_{ν/(ν+t²)}(ν/2, 1/2), which keeps tiny two-sided p-values exact.
 */
export function tTwoSided(t: number, df: number): number {
  if (!Number.isFinite(t)) return 0;
  const x = df / (df + t * t);
  return betainc(x, df / 2, 0.5);
}

/** Upper tail P(T > t). */
export function tSf(t: number, df: number): number {
  const half = tTwoSided(t, df) / 2;
  return t >= 0 ? half : 1 - half;
}

/** CDF P(T ≤ t). */
export function tCdf(t: number, df: number): number {
  return tSf(-t, df);
}

/** Quantile: the t with P(T ≤ t) = p, 0 < p < 1. */
export function tQuantile(p: number, df: number): number {
  if (p === 0.5) return 0;
  const tail = p < 0.5 ? p : 1 - p; // one-sided tail beyond |t|
  // P(|T| > t) = 2·tail = I_x(ν/2, 1/2) with x = ν/(ν+t²)
  const x = betaincinv(2 * tail, df / 2, 0.5);
  const t = Math.sqrt((df * (1 - x)) / x);
  return p < 0.5 ? -t : t;
}
