import type { CentredGroup } from "./centred-sample.js";
import { rememberRuns } from "./sorted-runs.js";

const cache = new WeakMap<CentredGroup, Float64Array>();

/** Counting sort is used when the integer range is at most this many times the group size (plus a floor). */
const COUNTING_RANGE_FACTOR = 4;
const COUNTING_RANGE_FLOOR = 1 << 16;

/**
 * A group's centred values in ascending order, sorted once and shared by every method that
 * needs order statistics (median, quartiles, ranks, Shapiro–Wilk, fences).
 * Measured data usually have a fixed number of decimals and a limited range, so their exact
 * scaled integers (see CentredGroup.integerDivisor) are sorted by counting in O(n + range),
 * several times faster than a comparison sort; other data use the built-in typed-array sort.
 * The counting path yields the identical doubles: each is rebuilt as integer/divisor, the
 * same operation that produced it.
 * Reference: Knuth, D. E. (1998). The Art of Computer Programming, vol. 3, §5.2 (counting sort).
 * Example: sortedValues(group) → Float64Array ascending. Do not modify the result.
 * Cost: O(n + range) or O(n log n) the first time, O(1) afterwards.
 */
export function sortedValues(group: CentredGroup): Float64Array {
  let sorted = cache.get(group);
  if (!sorted) {
    sorted =
      (group.integerDivisor !== undefined ? countingSort(group.centred, group.integerDivisor) : undefined) ??
      Float64Array.from(group.centred).sort();
    cache.set(group, sorted);
  }
  return sorted;
}

function countingSort(values: Float64Array, divisor: number): Float64Array | undefined {
  const n = values.length;
  if (n < 64) return undefined;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < n; i++) {
    const v = values[i] as number;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  const lo = Math.round(min * divisor);
  const range = Math.round(max * divisor) - lo + 1;
  if (!(range <= COUNTING_RANGE_FACTOR * n + COUNTING_RANGE_FLOOR)) return undefined;
  const counts = new Uint32Array(range);
  for (let i = 0; i < n; i++) {
    const d = Math.round((values[i] as number) * divisor) - lo;
    counts[d] = (counts[d] as number) + 1;
  }
  const out = new Float64Array(n);
  let distinct = 0;
  for (let d = 0; d < range; d++) if (counts[d] !== 0) distinct++;
  // The runs of equal values come for free here (sortedRuns would find the same ones).
  const runValues = new Float64Array(distinct);
  const runEnds = new Int32Array(distinct);
  let j = 0;
  let r = 0;
  let distinctDoubles = true;
  for (let d = 0; d < range; d++) {
    let c = counts[d] as number;
    if (c === 0) continue;
    const v = (d + lo) / divisor;
    while (c-- > 0) out[j++] = v;
    if (r > 0 && v === runValues[r - 1]) distinctDoubles = false;
    runValues[r] = v;
    runEnds[r++] = j;
  }
  // Two integers could only share a double far beyond this range; checked all the same.
  if (distinctDoubles) rememberRuns(out, { count: distinct, values: runValues, ends: runEnds });
  return out;
}
