import { StatsInputError } from "../errors.js";
import { studentizedRangeQuantile, studentizedRangeSf } from "../distributions/studentized-range.js";
import { hedgesG, type HedgesG } from "../effect-sizes/hedges-g.js";
import type { GroupSummary, Unavailable } from "../types/group-summary.js";
import { validateAlpha, validateSummaries } from "./validate-summaries.js";

export interface TukeyKramerPair {
  a: string;
  b: string;
  /** mean_a − mean_b */
  diff: number;
  /** √(MS_W/2 · (1/n_a + 1/n_b)), the scale of the studentized range statistic */
  se: number;
  q: number;
  /** simultaneous 1 − α confidence limits for mean_a − mean_b */
  lower: number;
  upper: number;
  pAdj: number;
  hedgesG: HedgesG;
}

export type TukeyKramerResult =
  | {
      available: true;
      method: "Tukey–Kramer HSD";
      alpha: number;
      k: number;
      dfWithin: number;
      msWithin: number;
      criticalQ: number;
      pairs: TukeyKramerPair[];
    }
  | Unavailable;

/**
 * Tukey–Kramer honestly significant difference: all pairwise comparisons of k group means
 * with the family-wise error rate held at α, for equal or unequal group sizes.
 *
 * In words: for each pair, q = |mean_a − mean_b| / √(MS_W/2 · (1/n_a + 1/n_b)) is referred
 * to the studentized range distribution with k groups and df = N − k (the ANOVA's
 * within-group df): p_adj = P(Q_{k,df} > q); the simultaneous interval is
 * (mean_a − mean_b) ± q_{1−α; k, df} · √(MS_W/2 · (1/n_a + 1/n_b)). Hedges' g per pair uses
 * the two groups' own pooled SD (not MS_W), so it describes that pair alone.
 * Pairs come in input order: (1,2), (1,3), …, (2,3), …
 *
 * Reference: Tukey (1953), The Problem of Multiple Comparisons (unpublished; in Braun ed.,
 * Collected Works VIII, 1994); Kramer (1956), Biometrics 12, 307–310; Hayter (1984),
 * Annals of Statistics 12, 61–75 (the unequal-n version is conservative).
 * Example: three groups {n: 5, mean: 10}, {5, 12}, {5, 15}, MS_W = 4, df = 12 → pair (1,3):
 * diff = −5, se = √(4/2 · 0.4) ≈ 0.894, q ≈ 5.59, p_adj ≈ 0.0050, interval ≈ [−8.37, −1.63].
 * Cost: k(k−1)/2 studentized range tails and one quantile (about 10–25 ms for k = 10).
 */
export function tukeyKramer(
  groups: readonly GroupSummary[],
  msWithin: number,
  dfWithin: number,
  alpha = 0.05,
): TukeyKramerResult {
  const method = "Tukey–Kramer";
  validateSummaries(method, groups, 2);
  validateAlpha(method, alpha);
  if (!(dfWithin >= 1))
    throw new StatsInputError(`${method} needs at least 1 within-group degree of freedom; got ${dfWithin}`);
  if (!Number.isFinite(msWithin) || msWithin < 0) {
    throw new StatsInputError(
      `${method} needs a finite within-group mean square of 0 or more; got ${msWithin}`,
    );
  }
  if (msWithin === 0) {
    return {
      available: false,
      reason: `${method} cannot be computed: the within-group mean square is 0 (every group has all its values equal)`,
    };
  }
  const k = groups.length;
  const criticalQ = studentizedRangeQuantile(1 - alpha, k, dfWithin);
  const pairs: TukeyKramerPair[] = [];
  for (let i = 0; i < k; i++) {
    for (let j = i + 1; j < k; j++) {
      const ga = groups[i] as GroupSummary;
      const gb = groups[j] as GroupSummary;
      const diff = ga.mean - gb.mean;
      const se = Math.sqrt((msWithin / 2) * (1 / ga.n + 1 / gb.n));
      const q = Math.abs(diff) / se;
      pairs.push({
        a: ga.name,
        b: gb.name,
        diff,
        se,
        q,
        lower: diff - criticalQ * se,
        upper: diff + criticalQ * se,
        pAdj: studentizedRangeSf(q, k, dfWithin),
        hedgesG: hedgesG(ga, gb),
      });
    }
  }
  return { available: true, method: "Tukey–Kramer HSD", alpha, k, dfWithin, msWithin, criticalQ, pairs };
}
