import type { CentredSample } from "./centred-sample.js";
import { powerOfTen } from "./powers-of-ten.js";

/**
 * A group's mean in the original units. On the scaled-integer path the sum of the exact
 * integers Σ(M − C) is itself exact while it stays below 2^53, so
 * mean = (n·C + Σ(M − C)) / (n·10^−E) needs a single correctly rounded division: the reported
 * mean of 4.1, 4.5, 3.9, 4.8, 4.2, 4.4 is 4.316666666666667, the double nearest 25.9/6.
 * Otherwise offset + (mean of centred values), one extra rounding.
 * Example: meanOriginal(sample, group.centred, centredMean).
 * Cost: O(n).
 */
export function meanOriginal(sample: CentredSample, centred: Float64Array, centredMean: number): number {
  const n = centred.length;
  const E = sample.scaleExponent;
  if (sample.centring === "scaled-integer" && E <= 0 && -E <= 22 && n > 0) {
    const p = powerOfTen(-E);
    let sum = 0;
    for (let i = 0; i < n; i++) sum += Math.round((centred[i] as number) * p);
    const numerator = n * sample.offsetInteger + sum;
    const denominator = n * p;
    if (
      Math.abs(sum) < 2 ** 53 &&
      Math.abs(n * sample.offsetInteger) < 2 ** 53 &&
      Math.abs(numerator) < 2 ** 53 &&
      denominator < 2 ** 53
    ) {
      return numerator / denominator;
    }
  }
  return sample.offset + centredMean;
}
