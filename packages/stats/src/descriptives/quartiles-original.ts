import type { CentredSample } from "../numeric/centred-sample.js";
import { powerOfTen } from "../numeric/powers-of-ten.js";

export interface QuartilesOriginal {
  min: number;
  q1: number;
  median: number;
  q3: number;
  max: number;
  iqr: number;
  /** Q1 − c·IQR and Q3 + c·IQR in original units. */
  fences: (c: number) => { lower: number; upper: number };
}

/**
 * Min, quartiles (linear interpolation, type 7; common practice), max, IQR and Tukey fences
 * of one sorted group in the original units, computed on the exact scaled integers when the
 * sample has them, so that e.g. a median of 4.6 and 4.7 is reported as 4.65 rather than
 * 4.6499999999999995: the interpolation h-fractions (0, ¼, ½, ¾) are exact in binary, so one
 * correctly rounded division at the end is the only rounding.
 * Reference: Hyndman & Fan (1996), The American Statistician 50, 361–365 (type 7).
 * Example: sorted centred values of [4.3, 4.4, 4.6, 4.7, 4.9, 5.2] → median 4.65, q1 4.45, iqr 0.4.
 * Cost: O(1) on sorted input (non-empty).
 */
export function quartilesOriginal(sample: CentredSample, sorted: Float64Array): QuartilesOriginal {
  const n = sorted.length;
  const E = sample.scaleExponent;
  const exact = sample.centring === "scaled-integer";
  // Integer space: I = (M − C), so value = (C + I)·10^E.
  const toI = (d: number): number => (exact ? Math.round(E < 0 ? d * powerOfTen(-E) : d / powerOfTen(E)) : d);
  const out = (i: number, withOffset: boolean): number => {
    if (!exact) return withOffset ? sample.offset + i : i;
    const v = withOffset ? i + sample.offsetInteger : i;
    return E < 0 ? v / powerOfTen(-E) : v * powerOfTen(E);
  };
  const q = (p: number): number => {
    const h = (n - 1) * p;
    const lo = Math.floor(h);
    const a = toI(sorted[lo] as number);
    if (lo + 1 >= n) return a;
    const t = h - lo;
    return t === 0 ? a : a + t * (toI(sorted[lo + 1] as number) - a);
  };
  const q1 = q(0.25);
  const q3 = q(0.75);
  const iqr = q3 - q1;
  return {
    min: out(toI(sorted[0] as number), true),
    q1: out(q1, true),
    median: out(q(0.5), true),
    q3: out(q3, true),
    max: out(toI(sorted[n - 1] as number), true),
    iqr: out(iqr, false),
    fences: (c: number) => ({ lower: out(q1 - c * iqr, true), upper: out(q3 + c * iqr, true) }),
  };
}
