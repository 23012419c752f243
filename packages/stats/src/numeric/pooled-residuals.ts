import type { CentredSample } from "./centred-sample.js";
import { groupMoments } from "./group-moments.js";

/**
 * Within-group residuals xᵢⱼ − x̄ᵢ of every group, pooled and sorted ascending.
 * They are computed from the exactly centred values, so large offsets cost no accuracy.
 * Example: groups [1, 3] and [10, 14] → [−2, −1, 1, 2].
 * Cost: O(N log N) (used for N ≤ 5000, the Shapiro–Wilk limit; larger samples use
 * residualOrderStatistics for the few order statistics a Q–Q plot needs).
 */
export function pooledResiduals(sample: CentredSample): Float64Array {
  let N = 0;
  for (const g of sample.groups) N += g.centred.length;
  const out = new Float64Array(N);
  let k = 0;
  for (const g of sample.groups) {
    const mean = groupMoments(g).mean;
    for (let i = 0; i < g.centred.length; i++) out[k++] = (g.centred[i] as number) - mean;
  }
  return out.sort();
}
