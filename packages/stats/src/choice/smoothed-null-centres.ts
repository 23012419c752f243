import { normalCdf, normalPdf } from "../distributions/normal.js";
import { findRootBrent } from "../numeric/brent-root.js";

/**
 * Median and γ-trimmed mean of an equal-weight normal mixture (1/n)Σ N(eᵢ, h²) — the
 * distribution a smoothed bootstrap draws from — so that each test in the error-rate check
 * can be given data whose own centre (mean, median or trimmed mean) is equal across groups.
 * In words: the quantiles q_γ, q_½, q_{1−γ} solve (1/n)ΣΦ((q − eᵢ)/h) = level (Brent's
 * method); the trimmed mean is the mean between q_γ and q_{1−γ}, in closed form per
 * component: ∫ₐᵇ x·φ((x − e)/h)/h dx = e[Φ(b′) − Φ(a′)] − h[φ(b′) − φ(a′)], with
 * a′ = (a − e)/h, b′ = (b − e)/h, divided by 1 − 2γ. γ = 0 gives the mixture mean, Σeᵢ/n.
 * Reference: Silverman, B. W. (1986). Density Estimation for Statistics and Data Analysis,
 * §3.4 (normal-kernel mixtures); the trimmed mean as a functional: Huber, P. J. (1981).
 * Robust Statistics, §3.3.
 * Example: mixtureCentres(Float64Array.of(-1, 0, 4), 0.5, 0.2) → median 0.02527…, trimmed mean 0.67071…
 * Cost: O(n) per evaluation, about 3 × 40 evaluations.
 */
export function mixtureCentres(
  atoms: ArrayLike<number>,
  h: number,
  trim: number,
): { median: number; trimmedMean: number } {
  const n = atoms.length;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    const e = atoms[i] as number;
    if (e < lo) lo = e;
    if (e > hi) hi = e;
  }
  if (!(h > 0) || lo === hi) {
    // A point mass per atom: the sample median and trimmed mean of the atoms.
    const s = Float64Array.from(atoms).sort();
    const cut = Math.floor(trim * n);
    let sum = 0;
    for (let i = cut; i < n - cut; i++) sum += s[i] as number;
    const m = n >> 1;
    return {
      median: n % 2 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2,
      trimmedMean: sum / (n - 2 * cut),
    };
  }
  const cdf = (x: number) => {
    let c = 0;
    for (let i = 0; i < n; i++) c += normalCdf((x - (atoms[i] as number)) / h);
    return c / n;
  };
  const a = lo - 40 * h;
  const b = hi + 40 * h;
  const quantile = (level: number) => findRootBrent((x) => cdf(x) - level, a, b, { xTol: 1e-13 });
  const median = quantile(0.5);
  if (trim === 0) {
    let s = 0;
    for (let i = 0; i < n; i++) s += atoms[i] as number;
    return { median, trimmedMean: s / n };
  }
  const qL = quantile(trim);
  const qU = quantile(1 - trim);
  let part = 0;
  for (let i = 0; i < n; i++) {
    const e = atoms[i] as number;
    const aL = (qL - e) / h;
    const bU = (qU - e) / h;
    part += e * (normalCdf(bU) - normalCdf(aL)) - h * (normalPdf(bU) - normalPdf(aL));
  }
  return { median, trimmedMean: part / n / (1 - 2 * trim) };
}
