import gammaln from "@stdlib/math-base-special-gammaln";

/**
 * Stirling-series remainder: ln Γ(x) − [(x − ½) ln x − x + ½ ln 2π], equal to
 * ln x! − ln(√(2πx)(x/e)^x). Computing it directly (the asymptotic series for x ≥ 15)
 * avoids the cancellation between terms of order x ln x that ruins densities such as
 * Poisson weights and chi densities at large arguments.
 * Reference: Loader (2000), "Fast and accurate computation of binomial probabilities";
 * the series 1/(12x) − 1/(360x³) + 1/(1260x⁵) − 1/(1680x⁷) is Abramowitz & Stegun 6.1.41.
 * Example: stirlingError(20) ≈ 0.0041663196919.
 * Cost: O(1).
 */
export function stirlingError(x: number): number {
  if (x < 15) return gammaln(x) - ((x - 0.5) * Math.log(x) - x + 0.5 * Math.log(2 * Math.PI));
  const x2 = x * x;
  return (1 / 12 - (1 / 360 - (1 / 1260 - 1 / (1680 * x2)) / x2) / x2) / x;
}
