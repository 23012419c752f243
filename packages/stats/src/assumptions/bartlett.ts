import { chiSquareSf } from "../distributions/chi-square.js";
import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { requireGroupSizes } from "../numeric/require-group-sizes.js";

export interface BartlettResult {
  available: true;
  method: "Bartlett";
  statistic: number;
  df: number;
  p: number;
}

/**
 * Bartlett's test of equal variances (sensitive to non-normality):
 * T = [(N − k) ln s²_p − Σ(nᵢ − 1) ln sᵢ²] / [1 + (Σ 1/(nᵢ − 1) − 1/(N − k)) / (3(k − 1))],
 * with the pooled variance s²_p = Σ(nᵢ − 1)sᵢ²/(N − k); p from χ² with k − 1 df.
 * Reference: Bartlett, M. S. (1937). Properties of sufficiency and statistical tests.
 * Proc. R. Soc. A 160, 268–282.
 * Example: bartlett([{name:"A",values:[1,2,3]},{name:"B",values:[2,4,6]}]) → T = 0.7141, p = 0.3981
 * Cost: O(N). Integer input is fine: everything is computed in doubles.
 * Unavailable when a group has zero variance (its log variance is −∞); the reason names it.
 */
export function bartlett(input: SampleInput): BartlettResult | Unavailable {
  const sample = prepareSample(input);
  requireGroupSizes(sample, "Bartlett's test", 2);
  const k = sample.groups.length;
  const parts = sample.groups.map((g) => {
    const m = groupMoments(g);
    return { name: g.name, dof: m.n - 1, variance: m.ss / (m.n - 1) };
  });
  const constant = parts.filter((p) => p.variance === 0).map((p) => `'${p.name}'`);
  if (constant.length > 0) {
    return {
      available: false,
      reason: `Bartlett's test compares log variances; group${constant.length > 1 ? "s" : ""} ${constant.join(", ")} ${constant.length > 1 ? "have" : "has"} zero variance, so the statistic is undefined`,
    };
  }
  let dofTotal = 0;
  let pooledSum = 0;
  let logSum = 0;
  let invSum = 0;
  for (const p of parts) {
    dofTotal += p.dof;
    pooledSum += p.dof * p.variance;
    logSum += p.dof * Math.log(p.variance);
    invSum += 1 / p.dof;
  }
  const pooled = pooledSum / dofTotal;
  const numerator = dofTotal * Math.log(pooled) - logSum;
  const denominator = 1 + (invSum - 1 / dofTotal) / (3 * (k - 1));
  const statistic = Math.max(0, numerator / denominator); // ≥ 0 by Jensen; clamp rounding
  const df = k - 1;
  return { available: true, method: "Bartlett", statistic, df, p: chiSquareSf(statistic, df) };
}
