import { parseDecimal, type DecimalParse } from "../numeric/parse-decimal.js";

/**
 * The one reader of data values typed into a file, used by uploads and by the command line, so
 * both keep, drop and refuse the same cells for the same reasons.
 *
 * Rules (decided here, documented in DEVELOPERS.md):
 * - Surrounding spaces (incl. no-break space) are ignored.
 * - Missing-value tokens, compared without regard to case: "" (empty), "NA", "N/A", "NaN",
 *   "null", "." and "-" (common practice in data exchange). Missing cells are dropped and counted.
 * - A number is plain decimal text with a decimal point and ASCII digits: "12", "-4.5", ".5",
 *   "1.2e-3", "+7". Nothing else is guessed at: a decimal comma, thousands separators, other
 *   digits, a typographic minus, units and hex are refused with the cause, because reading them
 *   "helpfully" would sometimes read them wrong.
 * - A number must fit a double: beyond ±1.8e308 it is refused as too large, a non-zero value
 *   below 4.9e-324 as too small (it would read as 0); text longer than MAX_VALUE_CHARS is refused
 *   unread.
 * Every step is a single pass over at most MAX_VALUE_CHARS characters: no regular expression
 * that can backtrack is applied to user data.
 */
export type ValueProblem =
  | "too-long"
  | "decimal-comma"
  | "thousands-separator"
  | "other-digits"
  | "typographic-minus"
  | "unit"
  | "hex"
  | "too-large"
  | "too-small"
  | "infinite"
  | "not-a-number";

export type ValueReading =
  | { kind: "number"; text: string }
  | { kind: "missing"; text: string }
  | { kind: "refused"; text: string; problem: ValueProblem; message: string };

/** Missing-value tokens, lower-cased. */
export const MISSING_VALUE_TOKENS: readonly string[] = ["", "na", "n/a", "nan", "null", ".", "-"];
const MISSING = new Set(MISSING_VALUE_TOKENS);

/** Longer text is not a number anyone typed; it is refused without being scanned. */
export const MAX_VALUE_CHARS = 400;

/** How much of a refused cell a message quotes. */
const QUOTE_CHARS = 40;

function quote(text: string): string {
  return `"${text.length > QUOTE_CHARS ? `${text.slice(0, QUOTE_CHARS)}…` : text}"`;
}

function isAsciiDigit(c: number): boolean {
  return c >= 48 && c <= 57;
}

/** Decimal digits other than 0–9 that people paste: Arabic-Indic, Eastern Arabic-Indic, Devanagari, full-width. */
function isOtherDigit(c: number): boolean {
  return (
    (c >= 0x0660 && c <= 0x0669) ||
    (c >= 0x06f0 && c <= 0x06f9) ||
    (c >= 0x0966 && c <= 0x096f) ||
    (c >= 0xff10 && c <= 0xff19)
  );
}

/** Minus and dash characters that look like "-" but are not it. */
function isTypographicMinus(c: number): boolean {
  return c === 0x2212 || c === 0x2012 || c === 0x2013 || c === 0x2014 || c === 0xfe63 || c === 0xff0d;
}

function refused(text: string, problem: ValueProblem, message: string): ValueReading {
  return { kind: "refused", text, problem, message };
}

/** Why text that is not a plain decimal number is refused, found in one pass. */
function diagnose(text: string): ValueReading {
  const q = quote(text);
  let i = 0;
  const n = text.length;
  if (isTypographicMinus(text.charCodeAt(0)))
    return refused(
      text,
      "typographic-minus",
      `${q} starts with the character U+${text.charCodeAt(0).toString(16).toUpperCase().padStart(4, "0")}, which looks like a minus sign but is not one; type the ASCII "-" instead`,
    );
  for (let k = 0; k < n; k++) {
    if (isOtherDigit(text.charCodeAt(k)))
      return refused(
        text,
        "other-digits",
        `${q} is written with digits other than 0–9 (such as Arabic-Indic or full-width digits); write it with the digits 0–9 and a decimal point`,
      );
  }
  if (text.charCodeAt(0) === 43 || text.charCodeAt(0) === 45) i++;
  if (text.charCodeAt(i) === 48 && (text.charCodeAt(i + 1) | 32) === 120 /* 0x */) {
    let k = i + 2;
    while (k < n && /[0-9a-fA-F]/.test(text[k]!)) k++;
    if (k === n && k > i + 2)
      return refused(text, "hex", `${q} is a hexadecimal number; write it in decimal`);
  }
  // The leading number: digits, commas, at most one point.
  let digits = 0;
  let commas = 0;
  let points = 0;
  let groupsOfThree = true;
  let pointFirst = false;
  let sinceComma = -1;
  let k = i;
  for (; k < n; k++) {
    const c = text.charCodeAt(k);
    if (isAsciiDigit(c)) {
      digits++;
      if (sinceComma >= 0 && points === 0) sinceComma++;
    } else if (c === 44 /* , */) {
      if (points > 0) pointFirst = true;
      if (sinceComma >= 0 && sinceComma !== 3) groupsOfThree = false;
      commas++;
      sinceComma = 0;
    } else if (c === 46 /* . */ && points === 0) {
      points++;
      if (sinceComma >= 0 && sinceComma !== 3) groupsOfThree = false;
    } else break;
  }
  const rest = text.slice(k).trim();
  if (digits > 0 && commas > 0 && rest === "") {
    if (pointFirst)
      return refused(
        text,
        "decimal-comma",
        `${q} uses a point between thousands and a decimal comma; Waymark reads a decimal point and no separators (write ${text.replace(/\./g, "").replace(",", ".")})`,
      );
    if (points === 0 && commas === 1 && sinceComma !== 3)
      return refused(
        text,
        "decimal-comma",
        `${q} uses a decimal comma; Waymark reads a decimal point (write ${text.replace(",", ".")})`,
      );
    if (groupsOfThree && (points === 1 || sinceComma === 3))
      return refused(
        text,
        "thousands-separator",
        `${q} uses a comma as a thousands separator, or a decimal comma; remove the separators (write ${points === 1 ? text.replace(/,/g, "") : `${text.replace(/,/g, "")} or ${text.replace(",", ".")}`})`,
      );
    return refused(
      text,
      "decimal-comma",
      `${q} mixes commas and points; write the number with a decimal point only`,
    );
  }
  if (digits > 0 && rest !== "")
    return refused(
      text,
      "unit",
      `${q} has text after the number (${quote(rest)}); put units in the column name and only the number in the cells`,
    );
  if (digits === 0 && n > 1 && /^[$€£¥%]$/.test(text[0]!) && isAsciiDigit(text.charCodeAt(1)))
    return refused(
      text,
      "unit",
      `${q} has a symbol before the number; put units in the column name and only the number in the cells`,
    );
  return refused(text, "not-a-number", `${q} is not a number`);
}

const scratch: DecimalParse = { kind: "missing", mantissa: 0, exponent: 0, long: false };

/**
 * Reads one cell. Example: readValue(" 4.50 ") → { kind: "number", text: "4.50" };
 * readValue("NA") → { kind: "missing" }; readValue("1,234.5") → refused, "thousands-separator".
 * For a number, `parsed` (when given) is left holding its decimal (parseDecimal's reading),
 * so a caller that needs the mantissa and exponent does not parse the text twice.
 * Cost: O(length of the cell), and O(1) beyond MAX_VALUE_CHARS after trimming.
 */
export function readValue(cell: string, parsed: DecimalParse = scratch): ValueReading {
  const text = cell.trim();
  if (MISSING.has(text.length <= 4 ? text.toLowerCase() : text)) return { kind: "missing", text };
  if (text.length > MAX_VALUE_CHARS)
    return refused(
      text,
      "too-long",
      `${quote(text)} is ${text.length.toLocaleString("en")} characters long; a value is at most ${MAX_VALUE_CHARS}`,
    );
  const d = parseDecimal(text, parsed);
  if (d.kind === "number") {
    // Below the smallest double a non-zero value would silently read as 0.
    const magnitude = d.exponent + (d.mantissa === 0 ? 0 : Math.floor(Math.log10(Math.abs(d.mantissa))));
    if (d.mantissa !== 0 && magnitude < -324)
      return refused(text, "too-small", `${quote(text)} is too close to 0 to hold (below 4.9e-324)`);
    return { kind: "number", text };
  }
  if (d.kind === "infinite") {
    const lower = text.toLowerCase().replace(/^[+-]/, "");
    return lower === "inf" || lower === "infinity"
      ? refused(text, "infinite", `${quote(text)} is infinite; only finite numbers can be analysed`)
      : refused(
          text,
          "too-large",
          `${quote(text)} is too large to hold (beyond ±1.8e308); check the value or rescale the column`,
        );
  }
  if (d.kind === "missing") return { kind: "missing", text };
  return diagnose(text);
}
