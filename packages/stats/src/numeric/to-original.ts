import type { CentredSample } from "./centred-sample.js";
import { powerOfTen } from "./powers-of-ten.js";

/**
 * Turns a centred value back into the original units. On the scaled-integer path a data
 * value is rebuilt from its exact integer (round(d·10^-E) + C)·10^E, so a reported minimum,
 * maximum or median equals the double the input text denotes, without an extra ulp of noise.
 * Other values (means, interpolated quantiles) are offset + d, one rounding.
 * Example: with offset 4.1, toOriginal(sample, 0.7) → 4.8 (not 4.799999999999999).
 * Cost: O(1).
 */
export function toOriginal(sample: CentredSample, centred: number): number {
  if (sample.centring === "scaled-integer") {
    const E = sample.scaleExponent;
    const scaled = E < 0 ? centred * powerOfTen(-E) : centred / powerOfTen(E);
    const integer = Math.round(scaled);
    // Only data values (integers at this scale) are rebuilt; others fall through.
    if (Math.abs(scaled - integer) < 1e-6 && Math.abs(integer) < 2 ** 52) {
      const whole = integer + sample.offsetInteger;
      if (Math.abs(whole) < 2 ** 53) return E < 0 ? whole / powerOfTen(-E) : whole * powerOfTen(E);
    }
  }
  return sample.offset + centred;
}
