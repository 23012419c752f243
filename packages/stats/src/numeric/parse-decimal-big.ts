/**
 * Reads decimal text that `parseDecimal` accepted as an exact BigInt mantissa and a decimal
 * exponent (value = mantissa·10^exponent), for mantissas with more than 15 significant digits.
 * Example: parseDecimalBig("0.30000000000000004") → { mantissa: 30000000000000004n, exponent: -17 }.
 * Cost: O(length of the text); BigInt construction, so used only off the hot path.
 */
export function parseDecimalBig(raw: string): { mantissa: bigint; exponent: number } {
  const text = raw.trim();
  const match = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text);
  if (!match) throw new Error(`parseDecimalBig: not decimal text: ${text}`);
  const [, sign = "", whole = "", fraction = "", exp = "0"] = match;
  const digits = `${whole}${fraction}`.replace(/^0+(?=\d)/, "") || "0";
  const mantissa = BigInt(digits);
  return { mantissa: sign === "-" ? -mantissa : mantissa, exponent: Number(exp) - fraction.length };
}
