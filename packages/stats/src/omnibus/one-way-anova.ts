import { fSf } from "../distributions/f.js";
import { log10FSf } from "../distributions/log10-tails.js";
import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { requireGroupSizes } from "../numeric/require-group-sizes.js";

export interface OneWayAnovaResult {
  available: true;
  method: "one-way ANOVA";
  F: number;
  df1: number;
  df2: number;
  p: number;
  /** log₁₀ p, finite where p underflows to 0 (e.g. −716.3 for p ≈ 5e−717). */
  log10p: number;
  ssBetween: number;
  ssWithin: number;
  ssTotal: number;
  msBetween: number;
  msWithin: number;
  /** η² = SS_B / SS_T; equal to R² of the one-factor model. */
  etaSquared: number;
  rSquared: number;
  /** ω² = (SS_B − (k−1)·MS_W) / (SS_T + MS_W), Hays (1963); may be negative for tiny effects. */
  omegaSquared: number;
  /** Cohen's f = √(η² / (1 − η²)). */
  cohensF: number;
}

/**
 * Classic one-way analysis of variance (Fisher): splits the total sum of squares around the
 * grand mean into between-group SS_B = Σ nᵢ(x̄ᵢ − x̄)² and within-group SS_W = Σ Σ(x − x̄ᵢ)²,
 * F = (SS_B/(k−1)) / (SS_W/(N−k)), p = P(F_{k−1, N−k} > F) from the incomplete beta upper tail.
 * Effect sizes: η² = SS_B/SS_T, ω² (Hays 1963, Statistics for Psychologists), Cohen's f
 * (Cohen 1988, Statistical Power Analysis for the Behavioral Sciences, 2nd ed.).
 * Accuracy: values are centred exactly on their decimal text first and each group's SS is a
 * corrected two-pass sum (Chan, Golub & LeVeque 1983), which is what the NIST StRD
 * higher-difficulty datasets need.
 * Reference: Fisher, R. A. (1925). Statistical Methods for Research Workers, ch. VII.
 * Example: oneWayAnova([{name:"A",values:[1,2,3]},{name:"B",values:[4,5,6]}])
 *   → { F: 13.5, df1: 1, df2: 4, p: 0.0213…, ssBetween: 13.5, ssWithin: 4, … }.
 * Cost: O(N), two passes per group.
 * Unavailable (with the reason) when there is no variation within groups (MS_W = 0) or no
 * within-group degrees of freedom; throws StatsInputError for fewer than two groups or an
 * empty group.
 */
export function oneWayAnova(input: SampleInput): OneWayAnovaResult | Unavailable {
  const sample = prepareSample(input);
  requireGroupSizes(sample, "One-way ANOVA", 1);
  const k = sample.groups.length;
  const moments = sample.groups.map((g) => groupMoments(g));
  let N = 0;
  let weighted = 0;
  let comp = 0;
  for (const m of moments) {
    N += m.n;
    const v = m.n * m.mean;
    const t = weighted + v;
    comp += Math.abs(weighted) >= Math.abs(v) ? weighted - t + v : v - t + weighted;
    weighted = t;
  }
  const grand = (weighted + comp) / N;
  let ssBetween = 0;
  let ssWithin = 0;
  for (const m of moments) {
    const d = m.mean - grand;
    ssBetween += m.n * d * d;
    ssWithin += m.ss;
  }
  const df1 = k - 1;
  const df2 = N - k;
  if (df2 <= 0) {
    return {
      available: false,
      reason: `One-way ANOVA needs more values than groups to estimate the error variance; found ${N} values in ${k} groups`,
    };
  }
  if (ssWithin === 0) {
    return {
      available: false,
      reason:
        ssBetween === 0
          ? "All values are identical, so there is no variation to analyse; the F test is undefined"
          : "Every group is constant (no variation within groups), so the error variance is zero and F is undefined",
    };
  }
  const ssTotal = ssBetween + ssWithin;
  const msBetween = ssBetween / df1;
  const msWithin = ssWithin / df2;
  const F = msBetween / msWithin;
  const etaSquared = ssBetween / ssTotal;
  return {
    available: true,
    method: "one-way ANOVA",
    F,
    df1,
    df2,
    p: fSf(F, df1, df2),
    log10p: log10FSf(F, df1, df2),
    ssBetween,
    ssWithin,
    ssTotal,
    msBetween,
    msWithin,
    etaSquared,
    rSquared: etaSquared,
    omegaSquared: (ssBetween - df1 * msWithin) / (ssTotal + msWithin),
    cohensF: Math.sqrt(ssBetween / ssWithin),
  };
}
