import { StatsInputError } from "../errors.js";
import type { CentredGroup, CentredSample, CentringMethod, SampleInput } from "./centred-sample.js";
import { parseDecimal, type DecimalParse } from "./parse-decimal.js";
import { parseDecimalBig } from "./parse-decimal-big.js";
import { POWERS_OF_TEN, powerOfTen } from "./powers-of-ten.js";
import { shortDecimalOfNumberFrom } from "./short-decimal-of-number.js";

/** Beyond this spread of decimal exponents exact centring gains nothing and BigInts get long. */
const MAX_EXPONENT_SPREAD = 40;
/** How many offending cells an error message names. */
const MAX_NAMED_PROBLEMS = 3;
/** Values sampled to pick an offset near the middle of the data. */
const OFFSET_PROBES = 101;

// Per-value classification while reading.
const SHORT = 0; // mantissa·10^exponent, mantissa exact in a double
const LONG = 1; // decimal text with more than 15 significant digits
const BINARY = 2; // a JS number with no short decimal: its binary value is the datum

interface Problem {
  group: string;
  position: number;
  row: number | undefined;
  text: string;
}

function describe(problems: Problem[], total: number): string {
  const named = problems
    .slice(0, MAX_NAMED_PROBLEMS)
    .map(
      (p) =>
        `'${p.text}' in group '${p.group}' (${p.row !== undefined ? `row ${p.row}` : `value ${p.position + 1}`})`,
    )
    .join(", ");
  return total > MAX_NAMED_PROBLEMS ? `${named} and ${total - MAX_NAMED_PROBLEMS} more` : named;
}

/**
 * Exact decimal centring: turns groups of numbers or decimal text into doubles measured from
 * one common offset C, with C subtracted exactly before any rounding.
 *
 * Why: a double cannot hold 1000000000000.4; converting first and subtracting afterwards
 * leaves errors of ~1e-4 in every value, which wrecks sums of squares for data with many
 * constant leading digits (NIST StRD SmLs07–09). Reading each value as an exact integer
 * mantissa M at a common decimal scale 10^E, computing M − C exactly and only then dividing
 * by 10^-E leaves one rounding per value, relative to the spread rather than the magnitude.
 * JS numbers stand for their shortest round-trip decimal text (String(x)); it is found
 * without building strings when it is short (see shortDecimalOfNumber). A number whose
 * shortest text needs 16–17 digits carries no decimal intent beyond its binary value, so
 * such samples are centred in binary (one correctly rounded subtraction per value).
 *
 * Missing cells (null, undefined, NaN, empty text, "NA", "N/A") are dropped and counted.
 * Throws StatsInputError naming the first cells that are not numbers or are infinite.
 * Reference: Simon & Lesage (1989), Computational Statistics & Data Analysis 8, 325–332,
 * for why offset handling decides accuracy; Clinger (1990) for exact decimal scaling.
 * Example: prepareSample([{ name: "A", values: ["1000000000000.4", "1000000000000.3"] }])
 *   → offset ≈ 1e12, centred values [0.1, 0] or similar, differences exact.
 * Cost: O(N) with a few flops per value on the usual path; BigInt only for long mantissas.
 */
export function prepareSample(input: SampleInput): CentredSample {
  if (!Array.isArray(input)) return input as CentredSample;
  const groups = input as Exclude<SampleInput, CentredSample>;

  let total = 0;
  for (const g of groups) total += g.values.length;
  const mantissas = new Float64Array(total);
  const exponents = new Int32Array(total);
  // Kinds other than SHORT are rare: the array is made when the first one appears.
  let kinds: Uint8Array | undefined;
  const sizes: number[] = [];
  const missingCounts: number[] = [];
  const keptRows: (number[] | undefined)[] = [];
  const notNumeric: Problem[] = [];
  const infinite: Problem[] = [];
  let notNumericCount = 0;
  let infiniteCount = 0;
  let anyLong = false;
  let anyBinary = false;
  let minExp = Infinity;
  let maxExp = -Infinity;
  let maxMantissa = 0; // largest |mantissa| of the decimal values
  let k = 0;
  const scratch = { mantissa: 0, exponent: 0 };
  let lastDecimals = 0; // the previous number's decimals: the first guess for the next one
  const textScratch: DecimalParse = { kind: "missing", mantissa: 0, exponent: 0, long: false };

  for (const g of groups) {
    let kept = 0;
    let missing = 0;
    const rows = g.rows ? ([] as number[]) : undefined;
    const values = g.values;
    for (let position = 0; position < values.length; position++) {
      const v = values[position];
      let mantissa = 0;
      let exponent = 0;
      let kind = SHORT;
      if (v === null || v === undefined || (typeof v === "number" && Number.isNaN(v))) {
        missing += 1;
        continue;
      }
      if (typeof v === "number") {
        if (!Number.isFinite(v)) {
          infiniteCount += 1;
          if (infinite.length < MAX_NAMED_PROBLEMS)
            infinite.push({ group: g.name, position, row: g.rows?.[position], text: String(v) });
          continue;
        }
        if (shortDecimalOfNumberFrom(v, scratch, lastDecimals)) {
          mantissa = scratch.mantissa;
          exponent = scratch.exponent;
          lastDecimals = -exponent;
        } else if (!mayHaveShortDecimal(v)) {
          // No decimal of 15 digits or fewer rounds to v: String(v) would have 16–17 digits.
          mantissa = v;
          kind = BINARY;
        } else {
          // Try the shortest text: fewer than 16 digits still means a decimal was intended.
          const parsed = parseDecimal(String(v), textScratch);
          if (parsed.kind === "number" && !parsed.long) {
            mantissa = parsed.mantissa;
            exponent = parsed.exponent;
          } else {
            mantissa = v;
            kind = BINARY;
          }
        }
      } else if (typeof v === "string") {
        const parsed = parseDecimal(v, textScratch);
        if (parsed.kind === "missing") {
          missing += 1;
          continue;
        }
        if (parsed.kind === "not-numeric" || parsed.kind === "infinite") {
          const list = parsed.kind === "infinite" ? infinite : notNumeric;
          if (parsed.kind === "infinite") infiniteCount += 1;
          else notNumericCount += 1;
          if (list.length < MAX_NAMED_PROBLEMS)
            list.push({ group: g.name, position, row: g.rows?.[position], text: v.trim() });
          continue;
        }
        mantissa = parsed.mantissa;
        exponent = parsed.exponent;
        kind = parsed.long ? LONG : SHORT;
      } else {
        notNumericCount += 1;
        if (notNumeric.length < MAX_NAMED_PROBLEMS)
          notNumeric.push({ group: g.name, position, row: g.rows?.[position], text: String(v) });
        continue;
      }
      mantissas[k] = mantissa;
      exponents[k] = exponent;
      if (kind !== SHORT) (kinds ??= new Uint8Array(total))[k] = kind;
      if (kind === LONG) anyLong = true;
      if (kind === BINARY) anyBinary = true;
      else if (mantissa !== 0) {
        const a = Math.abs(mantissa);
        if (a > maxMantissa) maxMantissa = a;
        if (exponent < minExp) minExp = exponent;
        if (exponent > maxExp) maxExp = exponent;
      }
      if (rows) rows.push(g.rows?.[position] ?? position + 1);
      k += 1;
      kept += 1;
    }
    sizes.push(kept);
    missingCounts.push(missing);
    keptRows.push(rows);
  }

  if (notNumericCount > 0) {
    throw new StatsInputError(`The outcome must be numeric; found ${describe(notNumeric, notNumericCount)}`);
  }
  if (infiniteCount > 0) {
    throw new StatsInputError(`The outcome must be finite; found ${describe(infinite, infiniteCount)}`);
  }
  if (!Number.isFinite(minExp)) {
    minExp = 0; // every value is zero (or binary)
    maxExp = 0;
  }

  // Pick the tier for the whole sample: one common offset needs one representation.
  let method: CentringMethod = "scaled-integer";
  if (anyBinary || maxExp - minExp > MAX_EXPONENT_SPREAD || minExp < -300) method = "binary";
  else if (anyLong) method = "big-integer";
  else if (!(maxExp - minExp <= 22 && maxMantissa * (POWERS_OF_TEN[maxExp - minExp] as number) < 2 ** 53)) {
    // Only when the largest mantissa at the largest shift might not fit is each value checked
    // (rounding is monotone, so that bound covers every value).
    const P = POWERS_OF_TEN;
    for (let i = 0; i < k; i++) {
      const m = mantissas[i] as number;
      if (m === 0) continue;
      const shift = (exponents[i] as number) - minExp;
      if (shift > 22 || Math.abs(m) * (P[shift] as number) >= 2 ** 53) {
        method = "big-integer";
        break;
      }
    }
  }

  const pick = pickOffsetIndex(mantissas, exponents, k);
  // The centred values overwrite the mantissas in place (each is read before it is written,
  // and the offset is taken first), which saves a second array of N doubles.
  const centredAll = mantissas.subarray(0, k);
  let offset = 0;
  let offsetInteger = 0;
  const E = minExp;

  if (method === "scaled-integer") {
    const C = (mantissas[pick] ?? 0) * powerOfTen((exponents[pick] ?? 0) - E);
    offsetInteger = C;
    // Shifts are ≤ 22 here (checked above), so the table lookups are exact powers of ten.
    const P = POWERS_OF_TEN;
    if (E <= 0 && -E <= 22) {
      const p = powerOfTen(-E);
      for (let i = 0; i < k; i++) {
        const m = mantissas[i] as number;
        centredAll[i] = (m === 0 ? -C : m * (P[(exponents[i] as number) - E] as number) - C) / p;
      }
      offset = C / p;
    } else {
      const p = powerOfTen(E);
      for (let i = 0; i < k; i++) {
        const m = mantissas[i] as number;
        centredAll[i] = (m === 0 ? -C : m * (P[(exponents[i] as number) - E] as number) - C) * p;
      }
      offset = C * p;
    }
  } else if (method === "big-integer") {
    // Exact mantissas first: a long mantissa's exponent differs from its truncated reading.
    const texts = flattenTexts(groups);
    const exact: { mantissa: bigint; exponent: number }[] = [];
    let e = Infinity;
    for (let i = 0; i < k; i++) {
      const t = texts[i];
      const b =
        kinds?.[i] === LONG && t !== undefined
          ? parseDecimalBig(t)
          : { mantissa: BigInt(mantissas[i] as number), exponent: exponents[i] as number };
      exact.push(b);
      if (b.mantissa !== 0n && b.exponent < e) e = b.exponent;
    }
    if (!Number.isFinite(e)) e = 0;
    const scaled = exact.map((b) => (b.mantissa === 0n ? 0n : b.mantissa * 10n ** BigInt(b.exponent - e)));
    const C = scaled[pick] ?? 0n;
    for (let i = 0; i < k; i++) centredAll[i] = Number(`${(scaled[i] as bigint) - C}e${e}`);
    offset = Number(`${C}e${e}`);
  } else {
    const value = (i: number): number => {
      if (kinds?.[i] === BINARY) return mantissas[i] as number;
      return Number(`${mantissas[i]}e${exponents[i]}`);
    };
    offset = k > 0 ? value(pick) : 0;
    for (let i = 0; i < k; i++) centredAll[i] = value(i) - offset;
  }

  const integerDivisor = method === "scaled-integer" && E <= 0 && -E <= 22 ? powerOfTen(-E) : undefined;
  const out: CentredGroup[] = [];
  let start = 0;
  groups.forEach((g, gi) => {
    const n = sizes[gi] ?? 0;
    const group: CentredGroup = {
      name: g.name,
      centred: centredAll.subarray(start, start + n),
      rows: keptRows[gi],
      missing: missingCounts[gi] ?? 0,
    };
    out.push(integerDivisor !== undefined ? { ...group, integerDivisor } : group);
    start += n;
  });
  return { kind: "centred-sample", groups: out, offset, centring: method, scaleExponent: E, offsetInteger };
}

/**
 * False only when no decimal of at most 15 significant digits rounds to x, found without
 * building String(x) (full-precision doubles would otherwise each be printed and re-read).
 * If x = fl(M·10^-s) with M < 10^15, then x·10^s lies within 0.25 of M, so M = round(x·10^s)
 * and M/10^s (correctly rounded: M < 2^53, 10^s exact) gives back x. The scale s that gives
 * M 15 digits comes from log10, which may be off by one near powers of ten, so s ± 1 are
 * tried too. Outside 10^-7 ≤ |x| < 10^14 (scales beyond the exact powers) it answers true.
 */
function mayHaveShortDecimal(x: number): boolean {
  const ax = Math.abs(x);
  if (!(ax >= 1e-7 && ax < 1e14)) return true;
  const s0 = 14 - Math.floor(Math.log10(ax));
  for (let s = s0 - 1; s <= s0 + 1; s++) {
    const p = POWERS_OF_TEN[s] as number;
    const m = Math.round(ax * p);
    if (m < 2 ** 53 && m / p === ax) return true;
  }
  return false;
}

/** Index of a value near the middle of the data (median of evenly spaced probes). */
function pickOffsetIndex(mantissas: Float64Array, exponents: Int32Array, k: number): number {
  if (k === 0) return 0;
  const step = Math.max(1, Math.floor(k / OFFSET_PROBES));
  const probes: { i: number; v: number }[] = [];
  for (let i = 0; i < k; i += step)
    probes.push({ i, v: (mantissas[i] as number) * 10 ** (exponents[i] as number) });
  probes.sort((a, b) => a.v - b.v);
  return probes[Math.floor(probes.length / 2)]?.i ?? 0;
}

/** The kept values' original text, in the same flattened order (only for the BigInt tier). */
function flattenTexts(groups: Exclude<SampleInput, CentredSample>): (string | undefined)[] {
  const texts: (string | undefined)[] = [];
  for (const g of groups) {
    for (const v of g.values) {
      if (v === null || v === undefined) continue;
      if (typeof v === "number") {
        if (Number.isNaN(v)) continue;
        texts.push(String(v));
      } else {
        if (parseDecimal(v).kind === "missing") continue;
        texts.push(v);
      }
    }
  }
  return texts;
}
