/** Result of reading one cell of decimal text. */
export type DecimalParse =
  | { kind: "number"; mantissa: number; exponent: number; long: false }
  | { kind: "number"; mantissa: number; exponent: number; long: true }
  | { kind: "missing" }
  | { kind: "not-numeric" }
  | { kind: "infinite" };

/** Text that means "no value" (compared after trimming). Common practice in data files. */
export const MISSING_TEXT: ReadonlySet<string> = new Set(["", "NA", "N/A", "NaN", "na", "n/a", "nan"]);

const INFINITE_TEXT: ReadonlySet<string> = new Set(["inf", "+inf", "-inf", "infinity", "+infinity", "-infinity"]);

/** Up to 15 significant decimal digits always fit a double exactly (10^15 < 2^53). */
const MAX_EXACT_DIGITS = 15;

/**
 * Reads plain decimal text ("-12.50", "1.2e-3", "+4") as mantissa·10^exponent with an
 * integer mantissa, without any rounding: the mantissa is exact when it has at most 15
 * significant digits (`long: false`); longer mantissas are flagged `long: true` and must be
 * re-read with `parseDecimalBig`. Trailing zeros are folded into the exponent so that
 * "4.10" and "4.1" get the same, smallest scale.
 *
 * Reference: the decimal-to-binary "fast path" of Clinger (1990), How to read floating point
 * numbers accurately, PLDI '90, 92–101: m / 10^s is correctly rounded when m < 2^53, s ≤ 22.
 * Example: parseDecimal("107.8681568") → { mantissa: 1078681568, exponent: -7 }.
 * Cost: one pass over the characters, no allocation beyond the result.
 */
export function parseDecimal(raw: string): DecimalParse {
  const text = raw.trim();
  if (MISSING_TEXT.has(text)) return { kind: "missing" };
  const len = text.length;
  let i = 0;
  let negative = false;
  const first = text.charCodeAt(0);
  if (first === 45 /* - */ || first === 43 /* + */) {
    negative = first === 45;
    i = 1;
  }
  let mantissa = 0;
  let digits = 0; // significant digits seen (after leading zeros)
  let exponent = 0;
  let sawDigit = false;
  let sawPoint = false;
  let long = false;
  for (; i < len; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      sawDigit = true;
      const d = c - 48;
      if (digits === 0 && d === 0) {
        if (sawPoint) exponent -= 1;
        continue;
      }
      if (digits < MAX_EXACT_DIGITS) {
        mantissa = mantissa * 10 + d;
        if (sawPoint) exponent -= 1;
      } else {
        // Beyond 15 digits: keep the magnitude right; the exact digits come from parseDecimalBig.
        long = long || d !== 0;
        if (!sawPoint) exponent += 1;
      }
      digits += 1;
    } else if (c === 46 /* . */ && !sawPoint) {
      sawPoint = true;
    } else if ((c === 101 || c === 69) /* e E */ && sawDigit) {
      const expText = text.slice(i + 1);
      if (!/^[+-]?\d{1,6}$/.test(expText)) return { kind: "not-numeric" };
      exponent += Number(expText);
      i = len;
      break;
    } else {
      return INFINITE_TEXT.has(text.toLowerCase()) ? { kind: "infinite" } : { kind: "not-numeric" };
    }
  }
  if (!sawDigit) return { kind: "not-numeric" };
  if (mantissa === 0) return { kind: "number", mantissa: 0, exponent: 0, long: false };
  if (!long) {
    while (mantissa % 10 === 0) {
      mantissa /= 10;
      exponent += 1;
    }
  }
  if (exponent + digits > 309) return { kind: "infinite" };
  return { kind: "number", mantissa: negative ? -mantissa : mantissa, exponent, long };
}
