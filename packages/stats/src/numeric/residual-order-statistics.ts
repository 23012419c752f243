import type { CentredSample } from "./centred-sample.js";
import { groupMoments } from "./group-moments.js";
import { sortedValues } from "./sorted-values.js";

/** Once a bracket holds at most this many residuals they are sorted directly. */
const SMALL_BRACKET = 64;

/**
 * Selected order statistics of the pooled within-group residuals, without building and
 * sorting all N of them: each group's residuals are its cached sorted values minus its mean
 * (still sorted), so "how many residuals are ≤ v" is k binary searches. For each rank r the
 * value axis is bisected until the bracket (lo, hi] holds the r-th residual among at most 64
 * others, which are then sorted, or holds a single repeated value (a tie block), which is
 * the answer. Exact: the same doubles a full sort would give.
 * Reference: selection by counting in sorted arrays, cf. Frederickson & Johnson (1982),
 * J. Computer and System Sciences 24, 197–208, in its simplest form.
 * Example: groups [1, 3] and [10, 14], ranks [1, 4] → [−2, 2].
 * Cost: about m·log₂(N/64)·k·log₂(n) steps for m ascending 1-based ranks — ~2·10^6 for a
 * 1000-point Q–Q plot of 10^6 values in 10 groups, against ~2·10^7 for sorting them.
 */
export function residualOrderStatistics(sample: CentredSample, ranks: readonly number[]): number[] {
  const sorted = sample.groups.map((g) => sortedValues(g));
  const means = sample.groups.map((g) => groupMoments(g).mean);
  const k = sorted.length;
  const posLo = new Int32Array(k);
  const posHi = new Int32Array(k);
  const posMid = new Int32Array(k);
  // Number of residuals ≤ v in each group (into pos), and their total. `from` and `to` hold
  // each group's count at a value known to be ≤ v and ≥ v: the search stays between them
  // (the count is monotone in v, so the answer is the same, found in fewer steps).
  const countAtMost = (v: number, pos: Int32Array, from: Int32Array, to?: Int32Array): number => {
    let c = 0;
    for (let g = 0; g < k; g++) {
      const s = sorted[g] as Float64Array;
      const m = means[g] as number;
      let lo = from[g] as number;
      let hi = to ? (to[g] as number) : s.length;
      while (lo < hi) {
        const mid = (lo + hi) >>> 1;
        if ((s[mid] as number) - m <= v) lo = mid + 1;
        else hi = mid;
      }
      pos[g] = lo;
      c += lo;
    }
    return c;
  };
  let min = Infinity;
  let max = -Infinity;
  sorted.forEach((s, g) => {
    if (s.length === 0) return;
    min = Math.min(min, (s[0] as number) - (means[g] as number));
    max = Math.max(max, (s[s.length - 1] as number) - (means[g] as number));
  });
  // True when every residual in (lo, hi] is the same value (a tie block): no need to bisect on.
  const singleValue = (): boolean => {
    let above = Infinity;
    let below = -Infinity;
    for (let g = 0; g < k; g++) {
      const s = sorted[g] as Float64Array;
      const m = means[g] as number;
      const a = posLo[g] as number;
      const b = posHi[g] as number;
      if (a < b) {
        above = Math.min(above, (s[a] as number) - m);
        below = Math.max(below, (s[b - 1] as number) - m);
      }
    }
    return above === below;
  };
  const out: number[] = [];
  let floor = min; // ranks ascend, so each answer bounds the next from below
  let step = 0;
  for (const r of ranks) {
    let cLo = countAtMost(floor, posLo, posLo); // posLo: counts at an earlier value ≤ floor
    if (cLo >= r) {
      out.push(floor); // floor is a residual (min or the previous answer) and holds rank r
      continue;
    }
    let lo = floor;
    // Ranks are usually evenly spaced, so twice the previous step is a tight first bracket.
    let hi = max;
    let cHi = -1;
    if (step > 0 && floor + 2 * step < max) {
      cHi = countAtMost(floor + 2 * step, posHi, posLo);
      if (cHi >= r) hi = floor + 2 * step;
    }
    if (hi === max) cHi = countAtMost(hi, posHi, posLo);
    while (cHi - cLo > SMALL_BRACKET && !singleValue()) {
      const mid = lo + (hi - lo) / 2;
      if (mid <= lo || mid >= hi) break; // collapsed onto one value: a tie block at hi
      const c = countAtMost(mid, posMid, posLo, posHi);
      if (c >= r) {
        hi = mid;
        cHi = c;
        posHi.set(posMid);
      } else {
        lo = mid;
        cLo = c;
        posLo.set(posMid);
      }
    }
    let answer: number;
    if (cHi - cLo > SMALL_BRACKET) {
      answer = -Infinity;
      for (let g = 0; g < k; g++) {
        const p = posHi[g] as number;
        if (p > 0)
          answer = Math.max(answer, ((sorted[g] as Float64Array)[p - 1] as number) - (means[g] as number));
      }
    } else {
      const between: number[] = [];
      for (let g = 0; g < k; g++) {
        const s = sorted[g] as Float64Array;
        const m = means[g] as number;
        for (let i = posLo[g] as number; i < (posHi[g] as number); i++) between.push((s[i] as number) - m);
      }
      between.sort((a, b) => a - b);
      answer = between[r - cLo - 1] as number;
    }
    out.push(answer);
    step = answer - floor;
    floor = answer;
  }
  return out;
}
