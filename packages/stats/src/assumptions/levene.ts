import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { requireGroupSizes } from "../numeric/require-group-sizes.js";
import { sampleFromArrays } from "../numeric/sample-from-arrays.js";
import { sortedValues } from "../numeric/sorted-values.js";
import { quantileSorted } from "../descriptives/quantile.js";
import { oneWayAnova } from "../omnibus/one-way-anova.js";

export interface LeveneResult {
  available: true;
  method: "Levene (mean-centred)" | "Brown–Forsythe (median-centred)";
  center: "mean" | "median";
  F: number;
  df1: number;
  df2: number;
  p: number;
}

/**
 * Test of equal variances: a one-way ANOVA on the absolute deviations |x − cᵢ| from each
 * group's centre cᵢ. center = "mean" is Levene's original test; center = "median" is the
 * Brown–Forsythe variant, robust to skewed data.
 * References: Levene, H. (1960). In Contributions to Probability and Statistics (Olkin, ed.),
 * 278–292; Brown, M. B. & Forsythe, A. B. (1974). JASA 69, 364–367.
 * Example: levene([{name:"A",values:[1,2,3]},{name:"B",values:[2,4,6]}], "mean") → F = 0.8, p = 0.4216
 *   (deviations 1,0,1 vs 2,0,2).
 * Cost: O(N) plus the shared per-group sort for the median.
 * Unavailable when the deviations show no spread within groups: all groups constant, or every
 * group's deviations equal — always so with two values per group (both lie |x₁ − x₂|/2 from the
 * mean or median), where the within-group sum of squares is exactly 0 in exact arithmetic but
 * rounding leaves ~1e-30 and F ≈ 1e30. Treated as zero: SS_W ≤ 1e-12·SS_T, or SS_W at or below
 * the rounding noise N·(16·ε·max|x|)² of deviations computed from values of size max|x|.
 */
export function levene(input: SampleInput, center: "mean" | "median"): LeveneResult | Unavailable {
  const sample = prepareSample(input);
  const name = center === "mean" ? "Levene's test" : "The Brown–Forsythe test";
  requireGroupSizes(sample, name, 2);
  // The largest |x| and |x − c| are gathered in the same pass (for the rounding-noise test).
  let maxAbs = 0;
  const deviations = sample.groups.map((g) => {
    const c = center === "mean" ? groupMoments(g).mean : quantileSorted(sortedValues(g), 0.5);
    const x = g.centred;
    const d = new Float64Array(x.length);
    let top = maxAbs;
    for (let i = 0; i < d.length; i++) {
      const v = x[i] as number;
      const dev = Math.abs(v - c);
      d[i] = dev;
      top = Math.max(top, Math.abs(v), dev);
    }
    maxAbs = top;
    return { name: g.name, values: d };
  });
  const result = oneWayAnova(sampleFromArrays(deviations));
  if (result.available && withinIsRoundingNoise(result.ssWithin, result.ssTotal, maxAbs, sample)) {
    return {
      available: false,
      reason: `${name} is undefined: within every group the absolute deviations from the group ${center} are equal (as they always are with two values in a group), so they show no spread within groups and F would be rounding noise`,
    };
  }
  if (!result.available) {
    return {
      available: false,
      reason: `${name} is undefined: the absolute deviations from the group ${center}s show no spread within groups (${result.reason.charAt(0).toLowerCase()}${result.reason.slice(1)})`,
    };
  }
  return {
    available: true,
    method: center === "mean" ? "Levene (mean-centred)" : "Brown–Forsythe (median-centred)",
    center,
    F: result.F,
    df1: result.df1,
    df2: result.df2,
    p: result.p,
  };
}

/** Relative share of SS_T below which SS_W counts as zero. Common practice (a scaled tolerance). */
export const LEVENE_RELATIVE_TOLERANCE = 1e-12;

/**
 * Whether the within-group sum of squares of the deviations is zero up to rounding: relative to
 * the total, or to the error of deviations formed from centred values as large as max|x|
 * (each carries at most a few ulps of max|x|); maxAbs is the largest |x| and |x − c|. Cost: O(k).
 */
function withinIsRoundingNoise(
  ssWithin: number,
  ssTotal: number,
  maxAbs: number,
  sample: { groups: readonly { centred: Float64Array }[] },
): boolean {
  if (ssWithin <= LEVENE_RELATIVE_TOLERANCE * ssTotal) return true;
  let N = 0;
  for (const g of sample.groups) N += g.centred.length;
  const noise = 16 * Number.EPSILON * maxAbs;
  return ssWithin <= N * noise * noise;
}
