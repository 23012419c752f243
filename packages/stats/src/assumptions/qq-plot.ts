import { normalQuantile } from "../distributions/normal.js";
import type { Unavailable } from "../types/group-summary.js";
import type { CentredSample } from "../numeric/centred-sample.js";
import { pooledResiduals } from "../numeric/pooled-residuals.js";
import { residualOrderStatistics } from "../numeric/residual-order-statistics.js";

/** Above this many residuals the plot keeps evenly spaced order statistics (a plot cannot show more). */
export const QQ_MAX_POINTS = 1000;

export interface QqPlot {
  available: true;
  plottingPositions: "Blom (i − 3/8)/(n + 1/4)";
  n: number;
  /** True when only QQ_MAX_POINTS evenly spaced order statistics (including both ends) are kept. */
  thinned: boolean;
  /** Rank i (1-based) of each kept point among the n sorted residuals. */
  ranks: number[];
  theoretical: number[];
  residuals: number[];
}

/**
 * Normal Q–Q plot data: the i-th smallest residual against the standard normal quantile
 * Φ⁻¹((i − 3/8)/(n + 1/4)), Blom's plotting positions, which make the expected normal order
 * statistics nearly unbiased.
 * Reference: Blom, G. (1958). Statistical Estimates and Transformed Beta-Variables, Wiley.
 * Input: the sorted residuals, or a prepared sample (its pooled within-group residuals; for
 * large samples only the kept order statistics are selected, without a full sort).
 * Example: qqPlot(Float64Array.of(-1, 0, 1)).theoretical → [−0.8694, 0, 0.8694].
 * Cost: O(min(n, 1000)) normal quantiles, plus the residual selection for a sample.
 */
export function qqPlot(input: ArrayLike<number> | CentredSample): QqPlot | Unavailable {
  const sample = "kind" in input && input.kind === "centred-sample" ? (input as CentredSample) : undefined;
  const n = sample
    ? sample.groups.reduce((s, g) => s + g.centred.length, 0)
    : (input as ArrayLike<number>).length;
  if (n < 2) return { available: false, reason: `A Q–Q plot needs at least 2 residuals; found ${n}` };
  const thinned = n > QQ_MAX_POINTS;
  const count = thinned ? QQ_MAX_POINTS : n;
  const ranks: number[] = [];
  const theoretical: number[] = [];
  const residuals: number[] = [];
  for (let j = 0; j < count; j++) {
    const i = thinned ? Math.round(1 + (j * (n - 1)) / (count - 1)) : j + 1;
    ranks.push(i);
    theoretical.push(normalQuantile((i - 0.375) / (n + 0.25)) + 0); // + 0 turns −0 into 0
  }
  if (sample && thinned) residuals.push(...residualOrderStatistics(sample, ranks));
  else {
    const sorted = sample ? pooledResiduals(sample) : (input as ArrayLike<number>);
    for (const i of ranks) residuals.push(sorted[i - 1] as number);
  }
  return {
    available: true,
    plottingPositions: "Blom (i − 3/8)/(n + 1/4)",
    n,
    thinned,
    ranks,
    theoretical,
    residuals,
  };
}
