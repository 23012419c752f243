import type { CentredSample } from "./centred-sample.js";
import { sortedRuns } from "./sorted-runs.js";
import { sortedValues } from "./sorted-values.js";

export interface Midranks {
  /** Σ of the midranks in each group. */
  rankSums: number[];
  /** Σ(t³ − t) over tie blocks, in doubles (integer arithmetic overflows for large N). */
  tieSum: number;
  N: number;
  /**
   * Midranks of every value, grouped (group 0's values first, ascending within a group).
   * Built only on request (permutation tests), since it costs N doubles.
   */
  ranks: Float64Array | undefined;
}

/** The integer histogram path is used when the pooled integer range is at most this many times N (plus a floor). */
const HISTOGRAM_RANGE_FACTOR = 4;
const HISTOGRAM_RANGE_FLOOR = 1 << 16;

const cache = new WeakMap<CentredSample, Midranks>();

/**
 * Midranks of the pooled sample (tied values share the mean of the ranks they occupy), their
 * sums per group and the tie term Σ(t³ − t). Tied values are exactly equal decimals, because
 * centring was exact. Two routes to the same numbers:
 * - decimal data with a modest range: a histogram of the exact scaled integers gives every
 *   value's midrank as (values below) + (ties + 1)/2, in O(N + range);
 * - otherwise a merge of the groups' cached sorts, scanning the k group heads, O(N·k).
 * Results are cached per sample so Kruskal–Wallis and Dunn share them.
 * Reference: Kruskal, W. H. & Wallis, W. A. (1952). Use of ranks in one-criterion variance
 * analysis. JASA 47, 583–621 (midranks for ties).
 * Example: groups [1, 2] and [2, 3] → rank sums [3.5, 6.5], tieSum = 6, ranks [1, 2.5, 2.5, 4].
 * Cost: as above, after the per-group sorts (shared with other methods).
 */
export function midranks(sample: CentredSample, withRanks = false): Midranks {
  const cached = cache.get(sample);
  if (cached && (cached.ranks || !withRanks)) return cached;
  const result = byHistogram(sample, withRanks) ?? byMerge(sample, withRanks);
  cache.set(sample, result);
  return result;
}

function byHistogram(sample: CentredSample, withRanks: boolean): Midranks | undefined {
  const groups = sample.groups;
  const divisor = groups[0]?.integerDivisor;
  if (divisor === undefined || groups.some((g) => g.integerDivisor !== divisor)) return undefined;
  const sorted = groups.map((g) => sortedValues(g));
  let N = 0;
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of sorted) {
    N += s.length;
    if (s.length === 0) continue;
    lo = Math.min(lo, Math.round((s[0] as number) * divisor));
    hi = Math.max(hi, Math.round((s[s.length - 1] as number) * divisor));
  }
  if (N === 0) return undefined;
  const range = hi - lo + 1;
  if (!(range <= HISTOGRAM_RANGE_FACTOR * N + HISTOGRAM_RANGE_FLOOR)) return undefined;
  // Per run of equal values (shared with the rank-biserial U): one rounding per distinct value.
  const runs = sorted.map((s) => sortedRuns(s));
  const counts = new Float64Array(range);
  for (const r of runs) {
    let from = 0;
    for (let j = 0; j < r.count; j++) {
      const end = r.ends[j] as number;
      counts[Math.round((r.values[j] as number) * divisor) - lo]! += end - from;
      from = end;
    }
  }
  // counts → midrank per integer value, and the tie term.
  let below = 0;
  let tieSum = 0;
  for (let d = 0; d < range; d++) {
    const c = counts[d] as number;
    if (c === 0) continue;
    if (c > 1) tieSum += c * c * c - c;
    counts[d] = below + (c + 1) / 2;
    below += c;
  }
  const rankSums: number[] = [];
  const ranks = withRanks ? new Float64Array(N) : undefined;
  let k = 0;
  // Midranks are halves of whole numbers; while N(N + 1)/2 < 2^51 every partial sum is exact,
  // so adding a run's ranks at once gives the same number as adding them one at a time.
  const exactSums = N * (N + 1) < 2 ** 52;
  for (const r of runs) {
    let sum = 0;
    let from = 0;
    for (let j = 0; j < r.count; j++) {
      const end = r.ends[j] as number;
      const rank = counts[Math.round((r.values[j] as number) * divisor) - lo] as number;
      if (exactSums) sum += rank * (end - from);
      else for (let t = from; t < end; t++) sum += rank;
      if (ranks) ranks.fill(rank, k + from, k + end);
      from = end;
    }
    k += from;
    rankSums.push(sum);
  }
  return { rankSums, tieSum, N, ranks };
}

function byMerge(sample: CentredSample, withRanks: boolean): Midranks {
  const sorted = sample.groups.map((g) => sortedValues(g));
  const k = sorted.length;
  const heads = new Int32Array(k);
  const counts = new Int32Array(k);
  const starts: number[] = [];
  let N = 0;
  for (const s of sorted) {
    starts.push(N);
    N += s.length;
  }
  const ranks = withRanks ? new Float64Array(N) : undefined;
  const rankSums = new Array<number>(k).fill(0);
  let tieSum = 0;
  let done = 0;
  while (done < N) {
    // Smallest head value; every head equal to it belongs to one tie block.
    let min = Infinity;
    for (let g = 0; g < k; g++) {
      const s = sorted[g] as Float64Array;
      const h = heads[g] as number;
      if (h < s.length && (s[h] as number) < min) min = s[h] as number;
    }
    let t = 0;
    for (let g = 0; g < k; g++) {
      const s = sorted[g] as Float64Array;
      let h = heads[g] as number;
      const from = h;
      while (h < s.length && s[h] === min) h++;
      counts[g] = h - from;
      t += h - from;
    }
    const rank = done + (t + 1) / 2;
    for (let g = 0; g < k; g++) {
      const c = counts[g] as number;
      if (c === 0) continue;
      const from = heads[g] as number;
      if (ranks) ranks.fill(rank, (starts[g] as number) + from, (starts[g] as number) + from + c);
      rankSums[g] = (rankSums[g] as number) + c * rank;
      heads[g] = from + c;
    }
    if (t > 1) tieSum += t * t * t - t;
    done += t;
  }
  return { rankSums, tieSum, N, ranks };
}
