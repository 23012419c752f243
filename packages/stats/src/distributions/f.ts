import betainc from "@stdlib/math-base-special-betainc";
import betaincinv from "@stdlib/math-base-special-betaincinv";

/**
 * Central F distribution. The upper tail is written as a lower incomplete beta of the
 * complementary argument, P(F > f) = I_{d2/(d2+d1 f)}(d2/2, d1/2), so p-values far in
 * the tail are computed directly rather than as 1 − cdf.
 */
export function fSf(f: number, d1: number, d2: number): number {
  if (f <= 0) return 1;
  if (!Number.isFinite(f)) return 0;
  return betainc(d2 / (d2 + d1 * f), d2 / 2, d1 / 2);
}

/** CDF P(F ≤ f). */
export function fCdf(f: number, d1: number, d2: number): number {
  if (f <= 0) return 0;
  if (!Number.isFinite(f)) return 1;
  return betainc((d1 * f) / (d1 * f + d2), d1 / 2, d2 / 2);
}

/** Quantile: the f with P(F ≤ f) = p. */
export function fQuantile(p: number, d1: number, d2: number): number {
  if (p <= 0) return 0;
  if (p >= 1) return Infinity;
  const x = betaincinv(p, d1 / 2, d2 / 2);
  return (d2 * x) / (d1 * (1 - x));
}
