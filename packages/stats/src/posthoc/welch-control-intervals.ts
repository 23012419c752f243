import { StatsInputError } from "../errors.js";
import { tQuantile } from "../distributions/t.js";
import type { GroupSummary } from "../types/group-summary.js";
import { validateAlpha, validateSummaries } from "./validate-summaries.js";

export type WelchControlInterval =
  | {
      available: true;
      /** the group compared with the control; diff = mean_a − mean_control */
      a: string;
      b: string;
      diff: number;
      lower: number;
      upper: number;
      /** confidence of each single interval, 1 − α/(k − 1) */
      intervalLevel: number;
      /** the family of k − 1 intervals holds 1 − α together by Bonferroni's inequality */
      simultaneousLevel: number;
      intervalAdjustment: "bonferroni";
    }
  | { available: false; a: string; b: string; reason: string };

/**
 * Simultaneous Welch confidence intervals for each group's mean difference from a control.
 *
 * In words: for each of the k − 1 groups, diff = mean_i − mean_0, se = √(s_i²/n_i + s_0²/n_0),
 * Welch–Satterthwaite df = se⁴ / [(s_i²/n_i)²/(n_i − 1) + (s_0²/n_0)²/(n_0 − 1)], and the
 * interval diff ± t_{1 − α′/2, df}·se with α′ = α/(k − 1) (Bonferroni). Boole's inequality
 * makes all k − 1 intervals cover together with probability at least 1 − α under any
 * dependence between the comparisons (they share the control); Šidák's sharper level is
 * not used because its inequality is proved for a common error variance, and the Welch
 * statistics have one df each. A pair whose two groups both have zero variance is
 * unavailable (0/0).
 *
 * Reference: Welch (1947), Biometrika 34, 28–35; Dunn (1961), JASA 56, 52–64
 * (Bonferroni intervals).
 * Example: control {n: 10, mean: 5, variance: 1}, B {n: 12, mean: 6, variance: 4}, k = 2,
 * α = .05 → diff = 1, se ≈ 0.6583, df ≈ 16.7, interval 1 ± 2.1046·0.6583 ≈ [−0.386, 2.386].
 * Cost: O(k) plus one t quantile per pair.
 */
export function welchControlIntervals(
  groups: readonly GroupSummary[],
  control: string,
  alpha = 0.05,
): WelchControlInterval[] {
  const method = "Welch intervals against a control";
  validateSummaries(method, groups, 2);
  validateAlpha(method, alpha);
  const c = groups.find((g) => g.name === control);
  if (!c)
    throw new StatsInputError(
      `${method} need the control to be one of the groups; '${control}' is not among them`,
    );
  const m = groups.length - 1;
  const perComparison = alpha / m;
  return groups
    .filter((g) => g.name !== control)
    .map((g): WelchControlInterval => {
      const va = g.variance / g.n;
      const vc = c.variance / c.n;
      if (va + vc === 0)
        return {
          available: false,
          a: g.name,
          b: control,
          reason: `The Welch interval of '${g.name}' against '${control}' cannot be computed: both groups have all their values equal (0/0)`,
        };
      const diff = g.mean - c.mean;
      const se = Math.sqrt(va + vc);
      const df = (va + vc) ** 2 / (va ** 2 / (g.n - 1) + vc ** 2 / (c.n - 1));
      const half = tQuantile(1 - perComparison / 2, df) * se;
      return {
        available: true,
        a: g.name,
        b: control,
        diff,
        lower: diff - half,
        upper: diff + half,
        intervalLevel: 1 - perComparison,
        simultaneousLevel: 1 - alpha,
        intervalAdjustment: "bonferroni",
      };
    });
}
