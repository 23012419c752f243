/**
 * Number formatting shared by the web app, the API's report and the command line, following
 * common reporting style (APA 7th ed., §6.36 and Table 6.5 — common practice in the trade):
 * p without a leading zero and exact to three decimals, "< .001" below; statistics to two
 * decimals; a true minus sign (U+2212) for negative numbers.
 */

const MINUS = "\u2212";

/** Replaces the hyphen-minus of a formatted negative number with a true minus sign. */
function withMinus(s: string): string {
  return s.startsWith("-") ? MINUS + s.slice(1) : s;
}

/** A statistic to `digits` decimals (default 2), e.g. 4.2104 → "4.21", −0.5 → "−0.50". */
export function formatStat(x: number, digits = 2): string {
  if (!Number.isFinite(x)) return "not available";
  const s = x.toFixed(digits);
  // "-0.00" reads as a negative value that is not there.
  return withMinus(/^-0\.?0*$/.test(s) ? s.slice(1) : s);
}

/** A proportion-like value that cannot exceed 1 (p, η², ω², r) without its leading zero: 0.172 → ".17". */
export function formatUnit(x: number, digits = 2): string {
  const s = formatStat(x, digits);
  return s.replace(/^(\u2212?)0\./, "$1.");
}

/** The p-value with its relation: "= .025", "< .001"; 1 prints as "> .999". */
export function formatP(p: number): string {
  if (!Number.isFinite(p)) return "not available";
  if (p < 0.001) return "< .001";
  if (p > 0.999) return "> .999";
  return "= " + formatUnit(p, 3);
}

/** Degrees of freedom: integers as they are, fractional (Welch) to one decimal. */
export function formatDf(df: number): string {
  if (!Number.isFinite(df)) return "not available";
  return Number.isInteger(df) ? String(df) : df.toFixed(1);
}

/** A percentage of a proportion, e.g. 0.6594 → "65.9%". */
export function formatPercent(x: number, digits = 1): string {
  return `${formatStat(x * 100, digits)}%`;
}

/** Smallest p written as a number; below it the exponent comes from log₁₀ p. */
export const SMALLEST_WRITTEN_P = 1e-300;

/**
 * The p-value with its relation in scientific form, for places that show how small p is
 * (never "= 0"): "= .025" from .001 up; "= 3.2 × 10^−8" below; under 1e-300, where doubles
 * run out, the power of ten from log₁₀ p — "≈ 5 × 10^−717" — or "< 1e-300" when log₁₀ p is not
 * known. Common practice (scientific notation for very small p, e.g. in genome-wide studies).
 * Example: formatPWithExponent(0, −716.3) → "≈ 5 × 10^−717".
 */
export function formatPWithExponent(p: number, log10p?: number): string {
  const logKnown = log10p !== undefined && Number.isFinite(log10p);
  if (Number.isFinite(p) && p >= 0.001) return formatP(p);
  if (Number.isFinite(p) && p >= SMALLEST_WRITTEN_P) {
    const [mantissa, exponent] = p.toExponential(1).split("e") as [string, string];
    return `= ${mantissa} × 10^${withMinus(String(Number(exponent)))}`;
  }
  if (logKnown) {
    let exponent = Math.floor(log10p);
    let mantissa = Math.round(10 ** (log10p - exponent));
    if (mantissa >= 10) {
      mantissa = 1;
      exponent += 1;
    }
    return `≈ ${mantissa === 1 ? "" : `${mantissa} × `}10^${withMinus(String(exponent))}`;
  }
  if (p === 0) return "< 1e-300";
  return "not available";
}
