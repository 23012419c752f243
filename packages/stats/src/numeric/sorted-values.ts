import type { CentredGroup } from "./centred-sample.js";

const cache = new WeakMap<CentredGroup, Float64Array>();

/**
 * A group's centred values in ascending order, sorted once and shared by every method that
 * needs order statistics (median, quartiles, ranks, Shapiro–Wilk, fences).
 * Cost: O(n log n) the first time (typed-array sort), O(1) afterwards. Do not modify the result.
 */
export function sortedValues(group: CentredGroup): Float64Array {
  let sorted = cache.get(group);
  if (!sorted) {
    sorted = Float64Array.from(group.centred).sort();
    cache.set(group, sorted);
  }
  return sorted;
}
