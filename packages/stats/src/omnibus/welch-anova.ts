import { fSf } from "../distributions/f.js";
import { log10FSf } from "../distributions/log10-tails.js";
import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { requireGroupSizes } from "../numeric/require-group-sizes.js";

export interface WelchAnovaResult {
  available: true;
  method: "Welch's ANOVA";
  F: number;
  df1: number;
  df2: number;
  p: number;
  /** log₁₀ p, finite where p underflows to 0 (e.g. −716.3 for p ≈ 5e−717). */
  log10p: number;
}

/**
 * Welch's heteroscedastic one-way ANOVA: weights wᵢ = nᵢ/sᵢ², weighted mean
 * x̄_w = Σwᵢx̄ᵢ/W (W = Σwᵢ), Λ = Σ(1 − wᵢ/W)²/(nᵢ − 1),
 * F = [Σwᵢ(x̄ᵢ − x̄_w)²/(k − 1)] / [1 + 2(k − 2)Λ/(k² − 1)], df₁ = k − 1, df₂ = (k² − 1)/(3Λ).
 * Reference: Welch, B. L. (1951). On the comparison of several mean values: an alternative
 * approach. Biometrika 38, 330–336.
 * Example: welchAnova([{name:"A",values:[1,2,3]},{name:"B",values:[4,6,8]}]) → F = 9.6, df1 = 1, df2 = 2.94…
 * Cost: O(N) for the group moments, O(k) after.
 * Unavailable (reason names the group) when a group has zero variance, since its weight would
 * be infinite; throws StatsInputError for fewer than two groups or a group with one value.
 */
export function welchAnova(input: SampleInput): WelchAnovaResult | Unavailable {
  const sample = prepareSample(input);
  requireGroupSizes(sample, "Welch's ANOVA", 2);
  const k = sample.groups.length;
  const stats = sample.groups.map((g) => {
    const m = groupMoments(g);
    return { name: g.name, n: m.n, mean: m.mean, variance: m.ss / (m.n - 1) };
  });
  const constant = stats.filter((s) => s.variance === 0).map((s) => `'${s.name}'`);
  if (constant.length > 0) {
    return {
      available: false,
      reason: `Welch's ANOVA weights each group by n/variance; group${constant.length > 1 ? "s" : ""} ${constant.join(", ")} ${constant.length > 1 ? "have" : "has"} zero variance, so the weights cannot be formed`,
    };
  }
  let W = 0;
  let weightedMean = 0;
  for (const s of stats) {
    const w = s.n / s.variance;
    W += w;
    weightedMean += w * s.mean;
  }
  weightedMean /= W;
  let between = 0;
  let lambda = 0;
  for (const s of stats) {
    const w = s.n / s.variance;
    const d = s.mean - weightedMean;
    between += w * d * d;
    const r = 1 - w / W;
    lambda += (r * r) / (s.n - 1);
  }
  const df1 = k - 1;
  const F = between / df1 / (1 + (2 * (k - 2) * lambda) / (k * k - 1));
  // Λ = 0 only for a single group; with k ≥ 2 it is positive.
  const df2 = (k * k - 1) / (3 * lambda);
  return {
    available: true,
    method: "Welch's ANOVA",
    F,
    df1,
    df2,
    p: fSf(F, df1, df2),
    log10p: log10FSf(F, df1, df2),
  };
}
