import { StatsInputError } from "../errors.js";
import { fSf } from "../distributions/f.js";
import { log10FSf } from "../distributions/log10-tails.js";
import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { requireGroupSizes } from "../numeric/require-group-sizes.js";
import { sortedValues } from "../numeric/sorted-values.js";
import { toOriginal } from "../numeric/to-original.js";

/** The usual trimming: 20% from each end (Wilcox's recommended default). */
export const DEFAULT_TRIM = 0.2;

export interface TrimmedGroupSummary {
  group: string;
  n: number;
  /** Values kept after trimming g = ⌊trim·n⌋ from each end: h = n − 2g. */
  h: number;
  /** Trimmed mean in the data's units. */
  trimmedMean: number;
  /** Winsorized variance (n − 1 denominator). */
  winsorizedVariance: number;
}

export interface TrimmedMeansAnovaResult {
  available: true;
  method: "heteroscedastic ANOVA on trimmed means";
  /** Proportion trimmed from each end of every group. */
  trim: number;
  F: number;
  df1: number;
  df2: number;
  p: number;
  /** log₁₀ p, finite where p underflows to 0 (e.g. −716.3 for p ≈ 5e−717). */
  log10p: number;
  trimmedMeans: TrimmedGroupSummary[];
}

/**
 * Trimmed mean and winsorized variance of ascending values. Shared with the error-rate
 * kernels' test so both compute the same thing. Cost: O(n).
 */
export function trimmedMoments(
  sorted: ArrayLike<number>,
  trim: number,
): { g: number; h: number; trimmedMean: number; winsorizedVariance: number } {
  const n = sorted.length;
  const g = Math.floor(trim * n);
  const h = n - 2 * g;
  let sum = 0;
  for (let i = g; i < n - g; i++) sum += sorted[i] as number;
  const trimmedMean = sum / h;
  const lo = sorted[g] as number;
  const hi = sorted[n - g - 1] as number;
  // The winsorized sample is constant exactly when these two agree; summing equal values
  // could leave a rounding residue that would pass for a tiny positive variance.
  if (lo === hi) return { g, h, trimmedMean: lo, winsorizedVariance: 0 };
  // Winsorized mean first, then squared deviations from it (two passes, no cancellation).
  const wMean = (sum + g * lo + g * hi) / n;
  let ss = g * (lo - wMean) ** 2 + g * (hi - wMean) ** 2;
  for (let i = g; i < n - g; i++) {
    const d = (sorted[i] as number) - wMean;
    ss += d * d;
  }
  return { g, h, trimmedMean, winsorizedVariance: ss / (n - 1) };
}

/**
 * Heteroscedastic one-way ANOVA on trimmed means (Welch's test applied to trimmed means with
 * winsorized variances). For group j with nⱼ values, gⱼ = ⌊γnⱼ⌋ values are trimmed from each
 * end (γ = trim, default 0.2), hⱼ = nⱼ − 2gⱼ are kept; X̄ₜⱼ is the mean of the kept values and
 * s²_wj the winsorized variance (the gⱼ smallest set to the (gⱼ+1)-th smallest, the gⱼ largest
 * to the (gⱼ+1)-th largest, variance with nⱼ − 1 denominator). Then
 *   dⱼ = (nⱼ − 1)s²_wj / (hⱼ(hⱼ − 1)),  wⱼ = 1/dⱼ,  U = Σwⱼ,  X̃ = ΣwⱼX̄ₜⱼ/U,
 *   A = Σwⱼ(X̄ₜⱼ − X̃)²/(k − 1),  Λ = Σ(1 − wⱼ/U)²/(hⱼ − 1),  B = 2(k − 2)Λ/(k² − 1),
 *   F = A/(1 + B),  df₁ = k − 1,  df₂ = (k² − 1)/(3Λ),  p = P(F_{df₁,df₂} > F).
 * With no trimming this is Welch's ANOVA; with k = 2 it is Yuen's test (F = t²).
 * References: Yuen, K. K. (1974). The two-sample trimmed t for unequal population variances.
 * Biometrika 61, 165–170 (k = 2); Wilcox, R. R. Introduction to Robust Estimation and
 * Hypothesis Testing, the chapter on comparing groups (k groups; from memory); checked against
 * scipy 1.10.1 `ttest_ind(trim=0.2)` for k = 2 and an independent Python implementation for
 * k ≥ 3 (test/fixtures/trimmed-means-anova).
 * Example: trimmedMeansAnova([{name:"A",values:[1,2,3,4,5]},{name:"B",values:[3,5,6,7,30]}])
 *   → trimmed means 3 and 6, winsorized variances 1 and 1, F = 6.75, df1 = 1, df2 = 4.
 * Cost: O(N) after the shared per-group sorts.
 * Throws StatsInputError for fewer than two groups, a trim outside [0, 0.5), or a group that
 * keeps fewer than two values after trimming; unavailable (reason names the group) when a
 * group's winsorized variance is zero, since its weight would be infinite.
 */
export function trimmedMeansAnova(
  input: SampleInput,
  trim = DEFAULT_TRIM,
): TrimmedMeansAnovaResult | Unavailable {
  if (!(trim >= 0 && trim < 0.5))
    throw new StatsInputError(`The trimmed-means test needs a trim between 0 and 0.5; got ${trim}`);
  const sample = prepareSample(input);
  requireGroupSizes(sample, "The trimmed-means test", 2);
  const stats = sample.groups.map((grp) => {
    const sorted = sortedValues(grp);
    const m = trimmedMoments(sorted, trim);
    if (m.h < 2)
      throw new StatsInputError(
        `The trimmed-means test needs at least two values left after trimming ${Math.round(trim * 100)}% from each end; group '${grp.name}' keeps ${m.h} of ${sorted.length}`,
      );
    return { name: grp.name, n: sorted.length, ...m };
  });
  const constant = stats.filter((s) => !(s.winsorizedVariance > 0)).map((s) => `'${s.name}'`);
  if (constant.length > 0) {
    return {
      available: false,
      reason: `The trimmed-means test weights each group by its winsorized variance; group${constant.length > 1 ? "s" : ""} ${constant.join(", ")} ${constant.length > 1 ? "have" : "has"} zero winsorized variance, so the weights cannot be formed`,
    };
  }
  const { F, df1, df2 } = trimmedWelchF(
    stats.map((s) => s.n),
    stats.map((s) => s.h),
    stats.map((s) => s.trimmedMean),
    stats.map((s) => s.winsorizedVariance),
  );
  return {
    available: true,
    method: "heteroscedastic ANOVA on trimmed means",
    trim,
    F,
    df1,
    df2,
    p: fSf(F, df1, df2),
    log10p: log10FSf(F, df1, df2),
    trimmedMeans: stats.map((s) => ({
      group: s.name,
      n: s.n,
      h: s.h,
      trimmedMean: toOriginal(sample, s.trimmedMean),
      winsorizedVariance: s.winsorizedVariance,
    })),
  };
}

/**
 * The Welch-type combination step on per-group trimmed means and winsorized variances
 * (formula above). Every winsorized variance must be positive and every h ≥ 2. Cost: O(k).
 */
export function trimmedWelchF(
  n: ArrayLike<number>,
  h: ArrayLike<number>,
  trimmedMean: ArrayLike<number>,
  winsorizedVariance: ArrayLike<number>,
): { F: number; df1: number; df2: number } {
  const k = n.length;
  let U = 0;
  let centre = 0;
  for (let j = 0; j < k; j++) {
    const hj = h[j] as number;
    const w = (hj * (hj - 1)) / (((n[j] as number) - 1) * (winsorizedVariance[j] as number));
    U += w;
    centre += w * (trimmedMean[j] as number);
  }
  centre /= U;
  let between = 0;
  let lambda = 0;
  for (let j = 0; j < k; j++) {
    const hj = h[j] as number;
    const w = (hj * (hj - 1)) / (((n[j] as number) - 1) * (winsorizedVariance[j] as number));
    const d = (trimmedMean[j] as number) - centre;
    between += w * d * d;
    const r = 1 - w / U;
    lambda += (r * r) / (hj - 1);
  }
  const df1 = k - 1;
  const F = between / df1 / (1 + (2 * (k - 2) * lambda) / (k * k - 1));
  return { F, df1, df2: (k * k - 1) / (3 * lambda) };
}
