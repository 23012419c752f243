import type { CentredGroup } from "./centred-sample.js";
import { centralMoments, type CentralMoments } from "./central-moments.js";

const cache = new WeakMap<CentredGroup, CentralMoments>();

/**
 * The central moments of a group's centred values, computed once per prepared sample and
 * shared by every method (ANOVA, Welch, Bartlett, Levene, descriptives, residuals).
 * Example: groupMoments(sample.groups[0]).ss. Cost: O(n) the first time, O(1) afterwards.
 */
export function groupMoments(group: CentredGroup): CentralMoments {
  let m = cache.get(group);
  if (!m) {
    m = centralMoments(group.centred);
    cache.set(group, m);
  }
  return m;
}
