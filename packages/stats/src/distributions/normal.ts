import erfc from "@stdlib/math-base-special-erfc";
import erfcinv from "@stdlib/math-base-special-erfcinv";

/**
 * Standard normal distribution.
 * Tails go through the complementary error function so that small p-values keep
 * their relative accuracy (1 − cdf would floor at about 1e-16).
 */
export function normalCdf(z: number): number {
  return 0.5 * erfc(-z / Math.SQRT2);
}

/** Upper tail P(Z > z). */
export function normalSf(z: number): number {
  return 0.5 * erfc(z / Math.SQRT2);
}

/** Two-sided p-value P(|Z| ≥ |z|). */
export function normalTwoSided(z: number): number {
  return erfc(Math.abs(z) / Math.SQRT2);
}

/** Standard normal density. */
export function normalPdf(z: number): number {
  return Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
}

/** Quantile Φ⁻¹(p), for 0 < p < 1. */
export function normalQuantile(p: number): number {
  return -Math.SQRT2 * erfcinv(2 * p);
}
