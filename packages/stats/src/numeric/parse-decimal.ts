export type DecimalKind = "number" | "missing" | "not-numeric" | "infinite";

/** Result of reading one cell of decimal text; mantissa and exponent are set for kind "number". */
export interface DecimalParse {
  kind: DecimalKind;
  mantissa: number;
  exponent: number;
  /** More than 15 significant digits: the mantissa is truncated; re-read with parseDecimalBig. */
  long: boolean;
}

/** Text that means "no value" (compared after trimming). Common practice in data files. */
export const MISSING_TEXT: ReadonlySet<string> = new Set(["", "NA", "N/A", "NaN", "na", "n/a", "nan"]);

const INFINITE_TEXT: ReadonlySet<string> = new Set([
  "inf",
  "+inf",
  "-inf",
  "infinity",
  "+infinity",
  "-infinity",
]);

/** Up to 15 significant decimal digits always fit a double exactly (10^15 < 2^53). */
const MAX_EXACT_DIGITS = 15;

function isSpace(c: number): boolean {
  return c === 32 || c === 9 || c === 10 || c === 13 || c === 160 || c === 0xfeff;
}

/**
 * Reads plain decimal text ("-12.50", "1.2e-3", "+4", " 7 ") as mantissa·10^exponent with an
 * integer mantissa, without any rounding: the mantissa is exact when it has at most 15
 * significant digits (`long: false`); longer mantissas are flagged `long: true` and must be
 * re-read with `parseDecimalBig`. Trailing zeros are folded into the exponent so that
 * "4.10" and "4.1" get the same, smallest scale. Only a decimal point is accepted ("3,5" is
 * not a number). Missing-value text (MISSING_TEXT) gives kind "missing"; "inf"/"Infinity"
 * give "infinite".
 * Reference: the decimal-to-binary "fast path" of Clinger (1990), How to read floating point
 * numbers accurately, PLDI '90, 92–101: m / 10^s is correctly rounded when m < 2^53, s ≤ 22.
 * Example: parseDecimal("107.8681568") → { kind: "number", mantissa: 1078681568, exponent: -7, long: false }.
 * Cost: one pass over the characters. Pass `out` to reuse one result object on hot paths.
 */
export function parseDecimal(
  raw: string,
  out: DecimalParse = { kind: "missing", mantissa: 0, exponent: 0, long: false },
): DecimalParse {
  let start = 0;
  let end = raw.length;
  while (start < end && isSpace(raw.charCodeAt(start))) start++;
  while (end > start && isSpace(raw.charCodeAt(end - 1))) end--;
  out.mantissa = 0;
  out.exponent = 0;
  out.long = false;
  if (start === end) {
    out.kind = "missing";
    return out;
  }
  let i = start;
  let negative = false;
  const first = raw.charCodeAt(i);
  if (first === 45 /* - */ || first === 43 /* + */) {
    negative = first === 45;
    i++;
  }
  let mantissa = 0;
  let digits = 0; // significant digits seen (after leading zeros)
  let exponent = 0;
  let sawDigit = false;
  let sawPoint = false;
  let long = false;
  for (; i < end; i++) {
    const c = raw.charCodeAt(i);
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
      const expText = raw.slice(i + 1, end);
      if (!/^[+-]?\d{1,6}$/.test(expText)) {
        out.kind = "not-numeric";
        return out;
      }
      exponent += Number(expText);
      break;
    } else {
      const text = raw.slice(start, end);
      out.kind = MISSING_TEXT.has(text)
        ? "missing"
        : INFINITE_TEXT.has(text.toLowerCase())
          ? "infinite"
          : "not-numeric";
      return out;
    }
  }
  if (!sawDigit) {
    out.kind = "not-numeric";
    return out;
  }
  out.kind = "number";
  if (mantissa === 0) return out;
  if (!long) {
    while (mantissa % 10 === 0) {
      mantissa /= 10;
      exponent += 1;
    }
  }
  if (exponent + digits > 309) {
    out.kind = "infinite";
    return out;
  }
  out.mantissa = negative ? -mantissa : mantissa;
  out.exponent = exponent;
  out.long = long;
  return out;
}
