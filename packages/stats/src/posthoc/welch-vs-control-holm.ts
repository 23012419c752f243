import { StatsInputError } from "../errors.js";
import { tTwoSided } from "../distributions/t.js";
import { hedgesG } from "../effect-sizes/hedges-g.js";
import type { GroupSummary } from "../types/group-summary.js";
import type { ControlComparisonPair } from "./control-comparison-types.js";
import { adjustPValues } from "./p-adjust.js";
import { validateAlpha, validateSummaries } from "./validate-summaries.js";

export type WelchVsControlPair =
  | (ControlComparisonPair & { available: true; p: number })
  | { available: false; a: string; b: string; reason: string };

export interface WelchVsControlResult {
  method: "Welch t-tests vs control, Holm-adjusted";
  control: string;
  alpha: number;
  pairs: WelchVsControlPair[];
}

/**
 * Welch t-tests of each group against a control, with Holm's adjustment over the family.
 *
 * In words: t_i = (mean_i − mean_0) / √(s_i²/n_i + s_0²/n_0) with Welch–Satterthwaite df
 * (s_i²/n_i + s_0²/n_0)² / [(s_i²/n_i)²/(n_i − 1) + (s_0²/n_0)²/(n_0 − 1)]; two-sided p from
 * Student's t; Holm's step-down adjustment over the comparisons that could be computed.
 * No equal-variance assumption; no simultaneous intervals (Holm is a stepwise procedure),
 * so lower/upper are left out. A pair whose two groups both have zero variance is
 * unavailable (0/0).
 *
 * Reference: Welch (1947), Biometrika 34, 28–35; Holm (1979), Scandinavian J. Statistics
 * 6, 65–70.
 * Example: control {n: 10, mean: 5, variance: 1}, B {n: 12, mean: 6, variance: 4} →
 * t = 1/√(0.1 + 0.3333) ≈ 1.519, df ≈ 16.7, p ≈ 0.147.
 * Cost: O(k).
 */
export function welchVsControlHolm(
  groups: readonly GroupSummary[],
  control: string,
  alpha = 0.05,
): WelchVsControlResult {
  const method = "Welch t-tests against a control";
  validateSummaries(method, groups, 2);
  validateAlpha(method, alpha);
  const c = groups.find((g) => g.name === control);
  if (!c)
    throw new StatsInputError(
      `${method} need the control to be one of the groups; '${control}' is not among them`,
    );
  const raw = groups
    .filter((g) => g.name !== control)
    .map((g) => {
      const va = g.variance / g.n;
      const vc = c.variance / c.n;
      if (va + vc === 0) {
        return {
          available: false as const,
          a: g.name,
          b: control,
          reason: `The Welch t-test of '${g.name}' against '${control}' cannot be computed: both groups have all their values equal (0/0)`,
        };
      }
      const diff = g.mean - c.mean;
      const se = Math.sqrt(va + vc);
      const t = diff / se;
      const df = (va + vc) ** 2 / (va ** 2 / (g.n - 1) + vc ** 2 / (c.n - 1));
      return {
        available: true as const,
        a: g.name,
        b: control,
        diff,
        se,
        t,
        df,
        p: tTwoSided(t, df),
        hedgesG: hedgesG(g, c),
      };
    });
  const computed = raw.filter((r) => r.available);
  const adjusted = adjustPValues(
    computed.map((r) => r.p),
    "holm",
  );
  const pAdjOf = new Map(computed.map((r, i) => [r.a, adjusted[i] as number]));
  const pairs: WelchVsControlPair[] = raw.map((r) =>
    r.available ? { ...r, pAdj: pAdjOf.get(r.a) as number } : r,
  );
  return { method: "Welch t-tests vs control, Holm-adjusted", control, alpha, pairs };
}
