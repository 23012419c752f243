import { POWERS_OF_TEN } from "./powers-of-ten.js";

/**
 * Above this mantissa the decimal grid 10^-s is no longer much coarser than the binary grid,
 * so the s-digit decimal found might not be the shortest round-trip text; such numbers take
 * the String(x) route instead. 0.01·2^52 ≈ 4.5e13 keeps a 100× margin.
 */
const MAX_FAST_MANTISSA = 0.01 * 2 ** 52;

/**
 * Finds, without building a string, the decimal m·10^-s (smallest s ≤ 22, integer m) that a
 * double x stands for: the same decimal as its shortest round-trip text String(x), whenever
 * m is small enough for that decimal to be the only s-digit one that rounds to x.
 * Writes the decimal into `out` and returns true; returns false when no such short decimal
 * exists (then use String(x), or treat x as binary). `out` is reused to avoid one
 * allocation per value on the hot path.
 *
 * Formula: for s = 0, 1, …: m = round(x·10^s); accept when m / 10^s === x (an exact power of
 * ten and |m| < 2^53 make that division correctly rounded, Clinger 1990).
 * Example: shortDecimalOfNumber(1000000000000.4, out) → true, out = { mantissa: 10000000000004, exponent: -1 }.
 * Cost: at most 23 multiply-round-divide steps; typically s + 1 of them.
 */
export function shortDecimalOfNumber(x: number, out: { mantissa: number; exponent: number }): boolean {
  if (x === 0) {
    out.mantissa = 0;
    out.exponent = 0;
    return true;
  }
  for (let s = 0; s <= 22; s++) {
    const p = POWERS_OF_TEN[s] as number;
    const m = Math.round(x * p);
    if (Math.abs(m) > MAX_FAST_MANTISSA) return false;
    if (m / p === x) {
      out.mantissa = m;
      out.exponent = -s;
      return true;
    }
  }
  return false;
}

/**
 * shortDecimalOfNumber with a guess s0 at the number of decimals (the previous value's, since
 * measured data mostly share one): when x = m·10^-s0 with m not a multiple of 10, no shorter
 * decimal can round to x (its scaled mantissa would be m/10^j, so m would end in a zero), so
 * the answer is the one the full scan finds; otherwise it falls back to the full scan.
 * Example: shortDecimalOfNumberFrom(50.123, out, 3) → true, out = { mantissa: 50123, exponent: -3 }.
 * Cost: one multiply-round-divide step on the usual path.
 */
export function shortDecimalOfNumberFrom(
  x: number,
  out: { mantissa: number; exponent: number },
  s0: number,
): boolean {
  if (s0 > 0 && s0 <= 22) {
    const p = POWERS_OF_TEN[s0] as number;
    const m = Math.round(x * p);
    // m not a multiple of 10, tested without the slow remainder of a double: m·0.1 rounds to
    // the whole number m/10 exactly when m is a multiple (|m| < 2^52 keeps the error far
    // below one half), and lies at least 0.1 away from one otherwise.
    if (Math.abs(m) <= MAX_FAST_MANTISSA && m / p === x && Math.round(m * 0.1) * 10 !== m) {
      out.mantissa = m;
      out.exponent = -s0;
      return true;
    }
  }
  return shortDecimalOfNumber(x, out);
}
