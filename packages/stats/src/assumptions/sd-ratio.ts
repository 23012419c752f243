import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";

export interface SdRatio {
  available: true;
  ratio: number;
  largest: { group: string; sd: number };
  smallest: { group: string; sd: number };
}

/**
 * Ratio of the largest to the smallest group standard deviation, a quick heuristic for
 * unequal variances (a ratio above about 2 is the usual rule of thumb; common practice).
 * Example: SDs 1, 1.5 and 3.1 → 3.1.
 * Cost: O(N).
 * Unavailable when the smallest SD is zero or a group has fewer than 2 values.
 */
export function sdRatio(input: SampleInput): SdRatio | Unavailable {
  const sample = prepareSample(input);
  const sds = sample.groups.map((g) => {
    const m = groupMoments(g);
    return { group: g.name, n: m.n, sd: m.n > 1 ? Math.sqrt(m.ss / (m.n - 1)) : NaN };
  });
  const short = sds.find((s) => s.n < 2);
  if (short)
    return {
      available: false,
      reason: `The SD ratio needs at least 2 values in every group; group '${short.group}' has ${short.n}`,
    };
  let largest = sds[0];
  let smallest = sds[0];
  for (const s of sds) {
    if (largest === undefined || s.sd > largest.sd) largest = s;
    if (smallest === undefined || s.sd < smallest.sd) smallest = s;
  }
  if (!largest || !smallest) return { available: false, reason: "The SD ratio needs at least one group" };
  if (smallest.sd === 0) {
    return {
      available: false,
      reason: `Group '${smallest.group}' has zero standard deviation, so the ratio of SDs is undefined`,
    };
  }
  return {
    available: true,
    ratio: largest.sd / smallest.sd,
    largest: { group: largest.group, sd: largest.sd },
    smallest: { group: smallest.group, sd: smallest.sd },
  };
}
