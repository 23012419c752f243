import Papa from "papaparse";
import type { GroupInput } from "../numeric/centred-sample.js";
import type { DecimalParse } from "../numeric/parse-decimal.js";
import { POWERS_OF_TEN } from "../numeric/powers-of-ten.js";
import { readValue, type ValueReading } from "../input/read-value.js";
import { CliError } from "./cli-error.js";

export interface GroupedCsv {
  groups: GroupInput[];
  /** Data rows read (excluding the header and blank lines). */
  rows: number;
  /** Rows skipped because the group cell was empty, with their line numbers. */
  skippedNoGroup: number[];
  delimiter: string;
  /** Outcome cells refused by readValue (shared with uploads), with their line numbers. */
  refused: { line: number; reading: Extract<ValueReading, { kind: "refused" }> }[];
}

/** Rows handed over per parsing step: the parsed rows of one piece are dropped after it. */
const CHUNK_CHARS = 1 << 20;
/** papaparse guesses line endings from the first megabyte and the delimiter from the first 10 rows. */
const GUESS_PREFIX_CHARS = 1 << 20;

/**
 * One group's values as they stream in: numbers in a growing Float64Array (missing = NaN),
 * and, by position, the cells whose text may have to reach the engine as written.
 */
class GroupValues {
  numbers = new Float64Array(1024);
  /** Cells the engine must read as text (long mantissas, values near the subnormal range). */
  texts: Map<number, string> | undefined;
  /** Whole numbers ending in zeros (1200): text only if their exponent would change the scale. */
  wholeTexts: Map<number, string> | undefined;
  rows: number[] = [];
  length = 0;
  constructor(readonly name: string) {}
  push(value: number, row: number): void {
    if (this.length === this.numbers.length) {
      const grown = new Float64Array(this.numbers.length * 2);
      grown.set(this.numbers);
      this.numbers = grown;
    }
    this.numbers[this.length++] = value;
    this.rows.push(row);
  }
  toInput(wholeAsText: boolean): GroupInput {
    const numbers = this.numbers.subarray(0, this.length);
    const texts = [...(this.texts ?? []), ...(wholeAsText ? (this.wholeTexts ?? []) : [])];
    if (texts.length === 0) return { name: this.name, values: numbers, rows: this.rows };
    const values: (number | string)[] = Array.from(numbers);
    for (const [i, t] of texts) values[i] = t;
    return { name: this.name, values, rows: this.rows };
  }
}

/** 15 digits at 10^-290 are still normal doubles (subnormals hold fewer digits). */
const MIN_PLAIN_EXPONENT = -290;
/** prepareSample centres in binary beyond this spread of decimal exponents (its MAX_EXPONENT_SPREAD). */
const EXPONENT_SPREAD = 40;

/**
 * Which form a number cell reaches the engine in. The engine reads a number x as the
 * shortest decimal that rounds to it, and text as its digits with trailing zeros dropped;
 * for at most 15 significant digits these are the same decimal m·10^e (Clinger 1990; two
 * such decimals never share a double), with one difference: a whole number is read with
 * e = 0 (1200 → 1200·10⁰) and its text with e > 0 (12·10²). The two decimals have the same
 * value, so only the sample's smallest and largest exponents can differ (its scale and its
 * spread test); this tracks both views, and whole numbers go as text only when they differ.
 */
class ExponentRange {
  minText = Infinity;
  maxText = -Infinity;
  minNumber = Infinity;
  maxNumber = -Infinity;
  add(exponent: number, whole: boolean): void {
    this.minText = Math.min(this.minText, exponent);
    this.maxText = Math.max(this.maxText, exponent);
    const e = whole ? 0 : exponent;
    this.minNumber = Math.min(this.minNumber, e);
    this.maxNumber = Math.max(this.maxNumber, e);
  }
  /** True when whole numbers sent as numbers would change the engine's scale or spread test. */
  wholeNeedText(): boolean {
    if (!Number.isFinite(this.minText)) return false;
    return (
      this.minText !== this.minNumber ||
      this.maxText - this.minText > EXPONENT_SPREAD !== this.maxNumber - this.minNumber > EXPONENT_SPREAD
    );
  }
}

const scratch: DecimalParse = { kind: "missing", mantissa: 0, exponent: 0, long: false };

/**
 * The delimiter and line break papaparse would guess for the whole text, found on its first
 * megabyte when that holds no quote (then rows are lines and the guess, which reads the
 * first megabyte and the first 10 rows, sees the same input); otherwise on the whole text.
 */
function guessFormat(body: string): { delimiter: string; newline: string } {
  if (body.length > GUESS_PREFIX_CHARS && body.indexOf('"') < 0) {
    const newline = guessLineEndings(body.slice(0, GUESS_PREFIX_CHARS));
    const rows = firstRows(body, newline, 11);
    if (rows !== undefined) return guessWith(rows, newline);
  }
  return guessWith(body, undefined);
}

function guessWith(text: string, newline: string | undefined): { delimiter: string; newline: string } {
  const meta = Papa.parse<string[]>(text, {
    header: false,
    skipEmptyLines: false,
    delimitersToGuess: [",", ";", "\t"],
    preview: 1,
    ...(newline !== undefined ? { newline: newline as "\n" } : {}),
  }).meta;
  return { delimiter: meta.delimiter, newline: meta.linebreak };
}

/** The text through its n-th line break, or undefined when it has fewer: enough for papaparse's 10-row guess. */
function firstRows(text: string, newline: string, n: number): string | undefined {
  let end = -newline.length;
  for (let i = 0; i < n; i++) {
    end = text.indexOf(newline, end + newline.length);
    if (end < 0) return undefined;
  }
  return text.slice(0, end + newline.length);
}

/**
 * papaparse's own line-ending guess (papaparse 5.7.1, ParserHandle.guessLineEndings) for text
 * without quotes, so only the first megabyte is read: "\n" unless "\r" comes first, then
 * "\r\n" when at least half the "\r" are followed by "\n", else "\r".
 */
function guessLineEndings(input: string): string {
  const r = input.split("\r");
  const n = input.split("\n");
  const nAppearsFirst = n.length > 1 && (n[0] as string).length < (r[0] as string).length;
  if (r.length === 1 || nAppearsFirst) return "\n";
  let numWithN = 0;
  for (const piece of r) if (piece[0] === "\n") numWithN++;
  return numWithN >= r.length / 2 ? "\r\n" : "\r";
}

/**
 * Reads CSV text into groups of outcome values. Rows are parsed a megabyte at a time and
 * each outcome cell goes straight into its group's Float64Array as a number whenever that
 * number carries exactly the decimal written (see ExponentRange; other cells stay text), so the
 * engine's exact-decimal path sees what was written without a million strings kept alive.
 * The header row names the columns (any text: quoted, with spaces, non-ASCII); the delimiter
 * (comma, semicolon or tab) is detected; a byte-order mark is dropped; the decimal separator
 * is the point. Each kept value carries its CSV line number (1 = header), counted through
 * quoted line breaks. Missing cells are NaN (the engine counts them). Groups keep the order
 * of their first appearance.
 * Example: readGroupedCsv('g,y\nA,1\nA,2\nB,3\n', "g", "y").groups
 *   → [{ name: "A", values: Float64Array [1, 2], rows: [2, 3] }, { name: "B", values: Float64Array [3], rows: [4] }].
 * Cost: O(size of the text); memory: the text plus 8 bytes and one row number per value.
 */
export function readGroupedCsv(text: string, groupColumn: string, outcomeColumn: string): GroupedCsv {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const format = guessFormat(body);
  const byName = new Map<string, GroupValues>();
  const skippedNoGroup: number[] = [];
  const refused: GroupedCsv["refused"] = [];
  let header: string[] | undefined;
  let gi = -1;
  let oi = -1;
  let line = 0;
  let count = 0;
  let problem: CliError | undefined;
  const exponents = new ExponentRange();

  const readHeader = (row: string[]): void => {
    header = row;
    line = 1 + lineBreaks(row);
    if (row.every((h) => h.trim() === "")) throw new CliError("the CSV file is empty (no header row)");
    const names = row.map((h) => h.trim());
    gi = names.indexOf(groupColumn.trim());
    oi = names.indexOf(outcomeColumn.trim());
    const listed = names.map((n) => `'${n}'`).join(", ");
    if (gi < 0) throw new CliError(`no column named '${groupColumn}' for --group; the columns are ${listed}`);
    if (oi < 0)
      throw new CliError(`no column named '${outcomeColumn}' for --outcome; the columns are ${listed}`);
    if (gi === oi) throw new CliError("--group and --outcome name the same column");
  };

  const readRow = (row: string[]): void => {
    const blank = row.length === 1 && (row[0] ?? "").trim() === "";
    readCells(blank, lineBreaks(row), row[gi] ?? "", row[oi] ?? "");
  };

  const readCells = (blank: boolean, breaks: number, groupCell: string, outcomeCell: string): void => {
    line += 1;
    const start = line;
    line += breaks;
    if (blank) return; // blank line
    count++;
    const group = groupCell.trim();
    if (group === "") {
      skippedNoGroup.push(start);
      return;
    }
    let entry = byName.get(group);
    if (!entry) {
      entry = new GroupValues(group);
      byName.set(group, entry);
    }
    // One reader of values for uploads and the command line; missing cells go on as NaN so
    // the engine counts them, refused cells are reported by line.
    const reading = readValue(outcomeCell, scratch);
    if (reading.kind === "refused") {
      refused.push({ line: start, reading });
      return;
    }
    if (reading.kind !== "number") {
      entry.push(NaN, start);
      return;
    }
    const d = scratch; // readValue's reading of the number
    if (d.mantissa !== 0) {
      const whole = d.exponent > 0 && !d.long;
      if (d.long || d.exponent < MIN_PLAIN_EXPONENT)
        (entry.texts ??= new Map()).set(entry.length, reading.text);
      else if (whole) (entry.wholeTexts ??= new Map()).set(entry.length, reading.text);
      exponents.add(d.exponent, whole);
    }
    // m·10^e with |m| < 10^15 and an exact power of ten is one correctly rounded division
    // (Clinger 1990), the same double Number(text) gives; other shapes go through Number.
    const e = d.exponent;
    const value =
      d.long || d.mantissa === 0 || e < -22 || e > 0
        ? Number(reading.text)
        : e === 0
          ? d.mantissa
          : d.mantissa / (POWERS_OF_TEN[-e] as number);
    entry.push(value, start);
  };

  if (body.indexOf('"') < 0) {
    // Without quotes papaparse splits rows at the line break and cells at the delimiter,
    // nothing more; doing that here reads only the two cells needed, with no row arrays.
    readQuoteFree(
      body,
      format,
      (cells) => readHeader(cells),
      (blank, breaks, cell) => readCells(blank, breaks, cell(gi), cell(oi)),
    );
  } else {
    // A string parsed in chunks: papaparse supports it, its typings list chunk only for files.
    const config = {
      header: false,
      skipEmptyLines: false,
      delimiter: format.delimiter,
      newline: format.newline as "\n",
      chunkSize: CHUNK_CHARS,
      chunk: (results: Papa.ParseResult<string[]>, parser: Papa.Parser) => {
        try {
          for (const row of results.data) {
            if (header === undefined) readHeader(row);
            else readRow(row);
          }
        } catch (e) {
          if (!(e instanceof CliError)) throw e;
          problem = e;
          parser.abort();
        }
      },
    };
    Papa.parse<string[]>(body, config as Papa.ParseConfig<string[]>);
  }
  if (problem) throw problem;
  if (header === undefined) throw new CliError("the CSV file is empty (no header row)");
  return {
    groups: [...byName.values()].map((g) => g.toInput(exponents.wholeNeedText())),
    rows: count,
    skippedNoGroup,
    delimiter: format.delimiter,
    refused,
  };
}

/**
 * Quote-free CSV the way papaparse reads it (rows = text.split(newline), cells =
 * row.split(delimiter)), handing each data row's cells on demand: cell(i) is the i-th cell
 * or "" when the row is shorter. `blank` is papaparse's one-empty-cell row; `breaks` counts
 * "\n" inside the row (possible only when rows end in "\r\n" or "\r").
 */
function readQuoteFree(
  body: string,
  format: { delimiter: string; newline: string },
  onHeader: (cells: string[]) => void,
  onRow: (blank: boolean, breaks: number, cell: (i: number) => string) => void,
): void {
  const { delimiter, newline } = format;
  let start = 0;
  let end = 0;
  const cell = (i: number): string => {
    let from = start;
    for (let f = 0; f < i; f++) {
      const d = body.indexOf(delimiter, from);
      if (d < 0 || d >= end) return "";
      from = d + delimiter.length;
    }
    const d = body.indexOf(delimiter, from);
    return body.slice(from, d < 0 || d >= end ? end : d);
  };
  let first = true;
  for (;;) {
    end = body.indexOf(newline, start);
    const last = end < 0;
    if (last) end = body.length;
    if (first) {
      onHeader(body.slice(start, end).split(delimiter));
      first = false;
    } else {
      let breaks = 0;
      if (newline !== "\n")
        for (let i = body.indexOf("\n", start); i >= 0 && i < end; i = body.indexOf("\n", i + 1)) breaks++;
      const d = body.indexOf(delimiter, start);
      const blank = (d < 0 || d >= end) && body.slice(start, end).trim() === "";
      onRow(blank, breaks, cell);
    }
    if (last) break;
    start = end + newline.length;
  }
}

function lineBreaks(row: readonly string[]): number {
  let n = 0;
  for (const cell of row) {
    if (cell.length > 0 && cell.indexOf("\n") >= 0) n += cell.split("\n").length - 1;
  }
  return n;
}
