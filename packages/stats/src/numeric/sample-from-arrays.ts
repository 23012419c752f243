import type { CentredSample } from "./centred-sample.js";

/**
 * Wraps already-computed doubles (e.g. absolute deviations for Levene's test) as a sample
 * with zero offset, so the same methods can run on derived values without re-parsing.
 * Cost: O(k).
 */
export function sampleFromArrays(groups: readonly { name: string; values: Float64Array }[]): CentredSample {
  return {
    kind: "centred-sample",
    groups: groups.map((g) => ({ name: g.name, centred: g.values, rows: undefined, missing: 0 })),
    offset: 0,
    centring: "binary",
    scaleExponent: 0,
    offsetInteger: 0,
  };
}
