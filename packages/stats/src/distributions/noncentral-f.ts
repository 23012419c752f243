import betainc from "@stdlib/math-base-special-betainc";
import betaln from "@stdlib/math-base-special-betaln";
import { StatsInputError } from "../errors.js";
import { fCdf, fSf } from "./f.js";
import { stirlingError } from "../numeric/stirling-error.js";

/**
 * Noncentral F distribution F′(d1, d2, λ), the law of (χ′²_{d1}(λ)/d1)/(χ²_{d2}/d2).
 *
 * In words: a Poisson(λ/2) mixture of central beta laws,
 * P(F′ ≤ x) = Σ_j e^{−λ/2}(λ/2)^j/j! · I_y(d1/2 + j, d2/2), with y = d1·x/(d1·x + d2).
 * The sum starts at the Poisson mode and runs outward in both directions, with the
 * incomplete beta values moved from term to term by the recurrence
 * I_y(a + 1, b) = I_y(a, b) − y^a(1 − y)^b / (a·B(a, b)); it stops once a bound on what is
 * left falls below 1e-16 of the sum. The upper tail uses the complementary betas
 * 1 − I_y(a, b) = I_{1−y}(b, a) in the same way, so small upper tails are summed, not
 * obtained as 1 − cdf.
 *
 * Reference: Lenth (1987), Algorithm AS 226, Applied Statistics 36, 241–244; Frick (1990),
 * Algorithm AS R84, Applied Statistics 39, 311–312 (starting at the Poisson mode).
 * Example: noncentralFSf(3.0, 3, 36, 10) ≈ 0.68599.
 * Cost: O(√λ) terms (about 600 for λ = 2000), two incomplete betas and O(1) work per term.
 */
export function noncentralFCdf(x: number, d1: number, d2: number, lambda: number): number {
  check(x, d1, d2, lambda, "cdf");
  if (x <= 0) return 0;
  if (x === Infinity) return 1;
  if (lambda === 0) return fCdf(x, d1, d2);
  return Math.min(1, mixture(x, d1, d2, lambda, false));
}

/** Upper tail P(F′ > x), summed directly (see noncentralFCdf). */
export function noncentralFSf(x: number, d1: number, d2: number, lambda: number): number {
  check(x, d1, d2, lambda, "sf");
  if (x <= 0) return 1;
  if (x === Infinity) return 0;
  if (lambda === 0) return fSf(x, d1, d2);
  return Math.min(1, mixture(x, d1, d2, lambda, true));
}

function check(x: number, d1: number, d2: number, lambda: number, what: string): void {
  if (!(d1 > 0) || !(d2 > 0) || !Number.isFinite(d1) || !Number.isFinite(d2)) {
    throw new StatsInputError(
      `The noncentral F ${what} needs positive, finite degrees of freedom; got ${d1} and ${d2}`,
    );
  }
  if (!(lambda >= 0) || !Number.isFinite(lambda)) {
    throw new StatsInputError(`The noncentral F ${what} needs a noncentrality of 0 or more; got ${lambda}`);
  }
  if (Number.isNaN(x)) throw new StatsInputError(`The noncentral F ${what} needs a number for x; got NaN`);
}

const REFRESH = 64;

function mixture(x: number, d1: number, d2: number, lambda: number, upper: boolean): number {
  const mu = lambda / 2;
  const b = d2 / 2;
  // y and 1 − y each computed directly, never as 1 minus the other.
  const y = (d1 * x) / (d1 * x + d2);
  const yc = d2 / (d1 * x + d2);
  const logY = Math.log(y);
  const logYc = Math.log(yc);
  const mode = Math.floor(mu);
  const a0 = d1 / 2 + mode;
  // Poisson weight at the mode in Loader's saddle-point form, which keeps full relative
  // accuracy for large λ (e^{−μ}μ^m/m! in logs would lose ~m·1e-16 to cancellation):
  // ln w = −stirlingError(m) − [m ln(m/μ) − (m − μ)] − ½ ln(2πm).
  const d = mode - mu;
  const w0 =
    mode === 0
      ? Math.exp(-mu)
      : Math.exp(-stirlingError(mode) - (mode * Math.log1p(d / mu) - d) - 0.5 * Math.log(2 * Math.PI * mode));
  // T(a) = y^a (1−y)^b / (a·B(a, b)), the step between I_y(a, b) and I_y(a + 1, b).
  const step = (a: number) => Math.exp(a * logY + b * logYc - Math.log(a) - betaln(a, b));
  const direct = (a: number) => (upper ? betainc(yc, b, a) : betainc(y, a, b));
  // The beta at the mode, lower or upper as requested.
  const beta0 = direct(a0);
  const t0 = step(a0);

  let sum = w0 * beta0;

  // Upward: j = mode + 1, mode + 2, …; I_y(a+1) = I_y(a) − T(a) (upper: adds T(a)).
  {
    let w = w0;
    let beta = beta0;
    let t = t0;
    let a = a0;
    for (let j = mode + 1; j < mode + 100_000; j++) {
      beta = upper ? beta + t : beta - t;
      t *= (y * (a + b)) / (a + 1);
      a += 1;
      // Every so often restart the recurrences from direct values: this bounds the
      // rounding carried along and recovers steps that underflowed at the start.
      if ((j - mode) % REFRESH === 0) {
        beta = direct(a);
        t = step(a);
      }
      if (beta < 0) beta = 0;
      if (upper && beta > 1) beta = 1;
      w *= mu / j;
      const term = w * beta;
      sum += term;
      // Left over: for the cdf each beta is ≤ the current one, for the upper tail ≤ 1;
      // the Poisson weights beyond j fall at least geometrically with ratio μ/(j + 1).
      const ratio = mu / (j + 1);
      if (ratio < 1) {
        const restWeights = (w * ratio) / (1 - ratio);
        const bound = restWeights * (upper ? 1 : beta);
        if (bound <= 1e-16 * sum || (bound === 0 && j > mode + 10)) break;
      }
    }
  }

  // Downward: j = mode − 1, …, 0; I_y(a−1) = I_y(a) + T(a−1) (upper: subtracts it).
  {
    let w = w0;
    let beta = beta0;
    let t = t0;
    let a = a0;
    for (let j = mode - 1; j >= 0; j--) {
      // T(a − 1) = T(a)·a / (y·(a − 1 + b)).
      t *= a / (y * (a - 1 + b));
      a -= 1;
      beta = upper ? beta - t : beta + t;
      if ((mode - j) % REFRESH === 0) {
        beta = direct(a);
        t = step(a);
      }
      if (beta < 0) beta = 0;
      if (!upper && beta > 1) beta = 1;
      w *= (j + 1) / mu;
      const term = w * beta;
      sum += term;
      // Left over: weights below j fall geometrically with ratio ≤ j/μ; for the cdf each
      // beta is ≤ 1, for the upper tail ≤ the current one.
      const ratio = j / mu;
      const restWeights = ratio < 1 ? (w * ratio) / (1 - ratio) : Infinity;
      const bound = restWeights * (upper ? beta : 1);
      if (bound <= 1e-16 * sum) break;
    }
  }
  return sum;
}
