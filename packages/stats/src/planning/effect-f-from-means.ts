import { StatsInputError } from "../errors.js";

/**
 * Cohen's f from hypothesised group means and a common within-group SD (equal group sizes).
 *
 * In words: f = σ_m/σ, where σ_m = √(Σ(μᵢ − μ̄)²/k) is the population SD of the k means
 * (denominator k, not k − 1) and σ the within-group SD.
 *
 * Reference: Cohen (1988), Statistical Power Analysis for the Behavioral Sciences, 2nd ed.,
 * eq. 8.2.1–8.2.2.
 * Example: effectFFromMeans([10, 12, 14], 4) → σ_m = √(8/3) ≈ 1.633, f ≈ 0.408.
 * Cost: O(k).
 */
export function effectFFromMeans(means: readonly number[], sd: number): number {
  if (means.length < 2)
    throw new StatsInputError(`Cohen's f needs at least two group means; got ${means.length}`);
  for (const m of means)
    if (!Number.isFinite(m)) throw new StatsInputError(`Cohen's f needs finite means; got ${m}`);
  if (!(sd > 0) || !Number.isFinite(sd))
    throw new StatsInputError(`Cohen's f needs a within-group SD above 0; got ${sd}`);
  const k = means.length;
  const grand = means.reduce((s, m) => s + m, 0) / k;
  const sigmaM = Math.sqrt(means.reduce((s, m) => s + (m - grand) ** 2, 0) / k);
  return sigmaM / sd;
}
