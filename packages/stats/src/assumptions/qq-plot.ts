import { normalQuantile } from "../distributions/normal.js";
import type { Unavailable } from "../types/group-summary.js";

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
 * Example: qqPlot(Float64Array.of(-1, 0, 1)).theoretical → [−0.8694, 0, 0.8694].
 * Cost: O(min(n, 1000)) normal quantiles; `sorted` must be ascending.
 */
export function qqPlot(sorted: ArrayLike<number>): QqPlot | Unavailable {
  const n = sorted.length;
  if (n < 2) return { available: false, reason: `A Q–Q plot needs at least 2 residuals; found ${n}` };
  const thinned = n > QQ_MAX_POINTS;
  const count = thinned ? QQ_MAX_POINTS : n;
  const ranks: number[] = [];
  const theoretical: number[] = [];
  const residuals: number[] = [];
  for (let j = 0; j < count; j++) {
    const i = thinned ? Math.round(1 + (j * (n - 1)) / (count - 1)) : j + 1;
    ranks.push(i);
    theoretical.push(normalQuantile((i - 0.375) / (n + 0.25)));
    residuals.push(sorted[i - 1] as number);
  }
  return { available: true, plottingPositions: "Blom (i − 3/8)/(n + 1/4)", n, thinned, ranks, theoretical, residuals };
}
