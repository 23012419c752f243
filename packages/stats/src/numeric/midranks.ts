import type { CentredSample } from "./centred-sample.js";
import { sortedValues } from "./sorted-values.js";

export interface Midranks {
  /** Σ of the midranks in each group. */
  rankSums: number[];
  /** Σ(t³ − t) over tie blocks, in doubles (integer arithmetic overflows for large N). */
  tieSum: number;
  /** Midranks of every value, grouped: group 0's values first (ascending within a group). */
  ranks: Float64Array;
  N: number;
}

/**
 * Midranks of the pooled sample (tied values share the mean of the ranks they occupy),
 * computed by merging the groups' sorted values rather than sorting all N values again.
 * Tied values are exactly equal decimals, because centring was exact.
 * Reference: Kruskal, W. H. & Wallis, W. A. (1952). Use of ranks in one-criterion variance
 * analysis. JASA 47, 583–621 (midranks for ties).
 * Example: groups [1, 2] and [2, 3] → ranks [1, 2.5] and [2.5, 4], tieSum = 6.
 * Cost: O(N·k) for the merge after O(nᵢ log nᵢ) sorts that are shared with other methods.
 */
export function midranks(sample: CentredSample): Midranks {
  const sorted = sample.groups.map((g) => sortedValues(g));
  const k = sorted.length;
  const heads = new Int32Array(k);
  const starts: number[] = [];
  let N = 0;
  for (const s of sorted) {
    starts.push(N);
    N += s.length;
  }
  const ranks = new Float64Array(N);
  const rankSums = new Array<number>(k).fill(0);
  let tieSum = 0;
  let done = 0;
  while (done < N) {
    // Smallest head value, then every head equal to it forms one tie block.
    let min = Infinity;
    for (let g = 0; g < k; g++) {
      const s = sorted[g] as Float64Array;
      const h = heads[g] as number;
      if (h < s.length && (s[h] as number) < min) min = s[h] as number;
    }
    let t = 0;
    const counts: number[] = [];
    for (let g = 0; g < k; g++) {
      const s = sorted[g] as Float64Array;
      let h = heads[g] as number;
      const from = h;
      while (h < s.length && s[h] === min) h++;
      counts.push(h - from);
      t += h - from;
    }
    const rank = done + (t + 1) / 2;
    for (let g = 0; g < k; g++) {
      const c = counts[g] as number;
      if (c === 0) continue;
      const from = heads[g] as number;
      const base = (starts[g] as number) + from;
      for (let j = 0; j < c; j++) ranks[base + j] = rank;
      rankSums[g] = (rankSums[g] as number) + c * rank;
      heads[g] = from + c;
    }
    if (t > 1) tieSum += t * t * t - t;
    done += t;
  }
  return { rankSums, tieSum, ranks, N };
}
