import { StatsInputError } from "../errors.js";
import { normalTwoSided } from "../distributions/normal.js";
import { rankBiserialSorted, type RankBiserial } from "../effect-sizes/rank-biserial.js";
import type { GroupValues, Unavailable } from "../types/group-summary.js";
import { adjustPValues, type PAdjustMethod } from "./p-adjust.js";

export interface DunnPair {
  a: string;
  b: string;
  meanRankA: number;
  meanRankB: number;
  /** (meanRankA − meanRankB) / its standard error */
  z: number;
  /** two-sided, unadjusted */
  p: number;
  pAdj: number;
  rankBiserial: RankBiserial;
}

export type DunnResult =
  | {
      available: true;
      method: "Dunn";
      adjust: PAdjustMethod;
      alpha: number;
      tieCorrection: number;
      pairs: DunnPair[];
    }
  | Unavailable;

/**
 * Dunn's test: pairwise comparisons after a Kruskal–Wallis test, on mean ranks of the
 * pooled data.
 *
 * In words: rank all N values together (ties get the mean of their ranks); for groups a
 * and b, z = (R̄_a − R̄_b) / √(σ²·(1/n_a + 1/n_b)) with σ² = N(N + 1)/12 − Σ(t³ − t)/(12(N − 1)),
 * the sum running over groups of t tied values; p = 2·P(Z > |z|) (two-sided), then adjusted
 * over the k(k − 1)/2 pairs (Holm by default). When every value is tied σ² = 0 and the test
 * is unavailable. The rank-biserial correlation of each pair comes from that pair's own
 * Mann–Whitney U. Pairs come in input order: (1,2), (1,3), …, (2,3), …
 *
 * Reference: Dunn (1964), Technometrics 6, 241–252; Holm (1979), Scandinavian J.
 * Statistics 6, 65–70.
 * Example: A = [1, 2, 3], B = [4, 5, 6], C = [7, 8, 9] → mean ranks 2, 5, 8, σ² = 7.5,
 * z(A, C) = −6/√5 ≈ −2.683, p ≈ 0.0073.
 * Cost: O(N log N) for the per-group sorts, O(N·k) for the merge, O(n_a + n_b) per pair for U.
 */
export function dunn(
  groups: readonly GroupValues[],
  adjust: PAdjustMethod = "holm",
  alpha = 0.05,
): DunnResult {
  const method = "Dunn's test";
  if (groups.length < 2)
    throw new StatsInputError(`${method} needs at least two groups; got ${groups.length}`);
  if (!(alpha > 0 && alpha < 1))
    throw new StatsInputError(`${method} needs alpha between 0 and 1; got ${alpha}`);
  for (const g of groups) {
    if (g.values.length < 1)
      throw new StatsInputError(`${method} needs at least one value in every group; group '${g.name}' has 0`);
    for (const x of g.values) {
      if (!Number.isFinite(x))
        throw new StatsInputError(`${method} needs finite numbers; group '${g.name}' contains ${x}`);
    }
  }
  // Each group sorted once (native numeric sort of a typed array).
  return dunnSorted(
    groups.map((g) => ({ name: g.name, sorted: Float64Array.from(g.values).sort() })),
    adjust,
    alpha,
  );
}

export interface SortedGroup {
  name: string;
  /** the group's values in ascending order */
  sorted: Float64Array;
}

/**
 * Dunn's test from groups already sorted (as analyze() holds them): a k-way merge gives the
 * pooled midranks and tie counts without sorting the pooled data again. Cost: O(N·k) for the
 * merge and O(n_a + n_b) per pair for the rank-biserial r.
 */
export function dunnSorted(
  groups: readonly SortedGroup[],
  adjust: PAdjustMethod = "holm",
  alpha = 0.05,
  /** Pooled rank sums and tie term when the caller has them already (analyze() shares them with Kruskal–Wallis). */
  known?: { rankSums: readonly number[]; tieSum: number },
): DunnResult {
  const method = "Dunn's test";
  const { rankSums, tieSum, n } = known
    ? { ...known, n: groups.reduce((s, g) => s + g.sorted.length, 0) }
    : mergeRanks(groups.map((g) => g.sorted));
  const variance = n < 2 ? 0 : (n * (n + 1)) / 12 - tieSum / (12 * (n - 1));
  // All values tied gives exactly 0 in exact arithmetic; allow for rounding.
  if (!(variance > 1e-12 * ((n * (n + 1)) / 12))) {
    return {
      available: false,
      reason: `${method} cannot be computed: all ${n} values are equal, so there is nothing to rank`,
    };
  }
  const meanRanks = groups.map((g, gi) => (rankSums[gi] as number) / g.sorted.length);
  const raw: Omit<DunnPair, "pAdj">[] = [];
  for (let i = 0; i < groups.length; i++) {
    for (let j = i + 1; j < groups.length; j++) {
      const ga = groups[i] as SortedGroup;
      const gb = groups[j] as SortedGroup;
      const ra = meanRanks[i] as number;
      const rb = meanRanks[j] as number;
      const z = (ra - rb) / Math.sqrt(variance * (1 / ga.sorted.length + 1 / gb.sorted.length));
      raw.push({
        a: ga.name,
        b: gb.name,
        meanRankA: ra,
        meanRankB: rb,
        z,
        p: normalTwoSided(z),
        rankBiserial: rankBiserialSorted(ga.sorted, gb.sorted),
      });
    }
  }
  const adjusted = adjustPValues(
    raw.map((r) => r.p),
    adjust,
  );
  const pairs = raw.map((r, i) => ({ ...r, pAdj: adjusted[i] as number }));
  return { available: true, method: "Dunn", adjust, alpha, tieCorrection: tieSum, pairs };
}

/** Pooled midrank sums per group and the tie term, by a k-way merge of sorted groups. */
function mergeRanks(sorted: readonly Float64Array[]): { rankSums: number[]; tieSum: number; n: number } {
  const n = sorted.reduce((s, g) => s + g.length, 0);
  const rankSums = new Array<number>(sorted.length).fill(0);
  const heads = new Array<number>(sorted.length).fill(0);
  const tiedCount = new Array<number>(sorted.length).fill(0);
  let tieSum = 0;
  let position = 0;
  for (;;) {
    let x = Infinity;
    for (let gi = 0; gi < sorted.length; gi++) {
      const h = heads[gi] as number;
      const g = sorted[gi] as Float64Array;
      if (h < g.length && (g[h] as number) < x) x = g[h] as number;
    }
    if (x === Infinity) break;
    let t = 0;
    for (let gi = 0; gi < sorted.length; gi++) {
      const g = sorted[gi] as Float64Array;
      let h = heads[gi] as number;
      const start = h;
      while (h < g.length && g[h] === x) h++;
      tiedCount[gi] = h - start;
      heads[gi] = h;
      t += h - start;
    }
    // t³ − t in floating point is exact for t < 2e5; the terms are summed, not multiplied.
    tieSum += t * t * t - t;
    const midrank = position + (t + 1) / 2;
    for (let gi = 0; gi < sorted.length; gi++)
      rankSums[gi] = (rankSums[gi] as number) + midrank * (tiedCount[gi] as number);
    position += t;
  }
  return { rankSums, tieSum, n };
}
