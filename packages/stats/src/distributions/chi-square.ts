import gammainc from "@stdlib/math-base-special-gammainc";
import gammaincinv from "@stdlib/math-base-special-gammaincinv";

/** Upper tail of the χ² distribution, P(X > x) = Q(df/2, x/2), computed directly. */
export function chiSquareSf(x: number, df: number): number {
  if (x <= 0) return 1;
  if (!Number.isFinite(x)) return 0;
  return gammainc(x / 2, df / 2, true, true);
}

/** CDF P(X ≤ x). */
export function chiSquareCdf(x: number, df: number): number {
  if (x <= 0) return 0;
  return gammainc(x / 2, df / 2, true, false);
}

/** Quantile: the x with P(X ≤ x) = p. */
export function chiSquareQuantile(p: number, df: number): number {
  return 2 * gammaincinv(p, df / 2);
}
