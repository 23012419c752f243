import { studentizedRangeQuantile, studentizedRangeSf } from "../distributions/studentized-range.js";
import { hedgesG, type HedgesG } from "../effect-sizes/hedges-g.js";
import type { GroupSummary } from "../types/group-summary.js";
import { validateAlpha, validateSummaries } from "./validate-summaries.js";

export type GamesHowellPair =
  | {
      available: true;
      a: string;
      b: string;
      /** mean_a − mean_b */
      diff: number;
      /** √((s_a²/n_a + s_b²/n_b)/2), the scale of the studentized range statistic */
      se: number;
      /** Welch–Satterthwaite degrees of freedom of this pair */
      df: number;
      q: number;
      lower: number;
      upper: number;
      pAdj: number;
      hedgesG: HedgesG;
    }
  | { available: false; a: string; b: string; reason: string };

export interface GamesHowellResult {
  method: "Games–Howell";
  alpha: number;
  k: number;
  pairs: GamesHowellPair[];
}

/**
 * Games–Howell test: all pairwise comparisons of k means without assuming equal variances.
 *
 * In words: for each pair, q = |mean_a − mean_b| / √((s_a²/n_a + s_b²/n_b)/2) is referred to
 * the studentized range distribution with k groups and the pair's Welch–Satterthwaite
 * df = (s_a²/n_a + s_b²/n_b)² / [(s_a²/n_a)²/(n_a − 1) + (s_b²/n_b)²/(n_b − 1)];
 * p_adj = P(Q_{k,df} > q) and the interval is diff ± q_{1−α; k, df} · √((s_a²/n_a + s_b²/n_b)/2).
 * When both groups of a pair have zero variance the df is 0/0: that pair is reported as
 * unavailable with the reason. Pairs come in input order: (1,2), (1,3), …, (2,3), …
 *
 * Reference: Games & Howell (1976), J. Educational Statistics 1, 113–125; Welch (1947),
 * Biometrika 34, 28–35 (the df approximation).
 * Example: {n: 8, mean: 50, variance: 1}, {n: 20, mean: 53, variance: 36}, with k = 3:
 * se = √((1/8 + 36/20)/2) ≈ 0.981, q ≈ 3.06, df ≈ 21.4, p_adj ≈ 0.101.
 * Cost: per pair one studentized range tail and one quantile (its own df): ~1–3 ms a pair.
 */
export function gamesHowell(groups: readonly GroupSummary[], alpha = 0.05): GamesHowellResult {
  const method = "Games–Howell";
  validateSummaries(method, groups, 2);
  validateAlpha(method, alpha);
  const k = groups.length;
  const pairs: GamesHowellPair[] = [];
  for (let i = 0; i < k; i++) {
    for (let j = i + 1; j < k; j++) {
      const ga = groups[i] as GroupSummary;
      const gb = groups[j] as GroupSummary;
      const va = ga.variance / ga.n;
      const vb = gb.variance / gb.n;
      if (va + vb === 0) {
        pairs.push({
          available: false,
          a: ga.name,
          b: gb.name,
          reason: `${method} cannot compare '${ga.name}' and '${gb.name}': both groups have all their values equal, so the standard error and degrees of freedom are 0/0`,
        });
        continue;
      }
      const diff = ga.mean - gb.mean;
      const se = Math.sqrt((va + vb) / 2);
      const df = (va + vb) ** 2 / (va ** 2 / (ga.n - 1) + vb ** 2 / (gb.n - 1));
      const q = Math.abs(diff) / se;
      const crit = studentizedRangeQuantile(1 - alpha, k, df);
      pairs.push({
        available: true,
        a: ga.name,
        b: gb.name,
        diff,
        se,
        df,
        q,
        lower: diff - crit * se,
        upper: diff + crit * se,
        pAdj: studentizedRangeSf(q, k, df),
        hedgesG: hedgesG(ga, gb),
      });
    }
  }
  return { method: "Games–Howell", alpha, k, pairs };
}
