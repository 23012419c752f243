import Papa from "papaparse";
import { HttpError } from "../../http/errors.js";
import { readXlsx } from "./read-xlsx.js";
import { TABLE_LIMITS } from "./table-limits.js";
import { decodeText } from "./decode-text.js";

/** A parsed sheet: header names and the data rows as text, with each row's number in the file. */
export interface Table {
  columns: string[];
  rows: { row: number; cells: string[] }[];
  format: "csv" | "xlsx";
}

export { TABLE_LIMITS };

const ZIP_MAGIC = Buffer.from([0x50, 0x4b, 0x03, 0x04]);

export function detectFormat(fileName: string, bytes: Buffer): "csv" | "xlsx" {
  const ext = fileName.toLowerCase().split(".").pop() ?? "";
  const isZip = bytes.subarray(0, 4).equals(ZIP_MAGIC);
  if (ext === "xlsx") {
    if (!isZip)
      throw new HttpError(
        415,
        "unsupported_media_type",
        `"${fileName}" is named .xlsx but is not an Excel workbook.`,
      );
    return "xlsx";
  }
  if (ext === "csv" || ext === "txt") {
    if (isZip || (bytes.includes(0) && !looksUtf16(bytes)))
      throw new HttpError(
        415,
        "unsupported_media_type",
        `"${fileName}" is named .${ext} but holds binary data, not text.`,
      );
    return "csv";
  }
  throw new HttpError(
    415,
    "unsupported_media_type",
    `Waymark reads .csv and .xlsx files; "${fileName}" is neither.`,
  );
}

function invalid(message: string): HttpError {
  return new HttpError(422, "invalid_file", message);
}

/** Header names must be present and distinct, so a column can be chosen by name. */
function checkHeader(columns: string[]): string[] {
  const cols = columns.map((c) => c.trim());
  if (cols.length === 0 || cols.every((c) => c === "")) throw invalid("The file has no header row.");
  if (cols.length > TABLE_LIMITS.maxColumns)
    throw invalid(`The file has ${cols.length} columns; Waymark reads at most ${TABLE_LIMITS.maxColumns}.`);
  const seen = new Set<string>();
  for (const c of cols) {
    if (seen.has(c) && c !== "")
      throw invalid(`The column name "${c}" appears more than once in the header; rename one of them.`);
    seen.add(c);
  }
  return cols;
}

/** The delimiter, guessed from the first 64 KB only, so guessing costs the same for any file. */
function guessDelimiter(text: string): string {
  const sample = text.slice(0, 65_536);
  const cut = sample.lastIndexOf("\n");
  const guess = Papa.parse<string[]>(cut > 0 ? sample.slice(0, cut) : sample, {
    preview: 20,
    delimitersToGuess: [",", ";", "\t"],
  });
  return guess.meta.delimiter || ",";
}

export function parseCsv(bytes: Buffer): Table {
  const text = decodeText(bytes);
  if (text.trim() === "") throw invalid("The file is empty.");
  // Without quotes every line break ends a row: a file with far too many lines is refused
  // before it is parsed (with quotes, a line break may sit inside a cell, so rows are counted below).
  if (text.indexOf('"') < 0 && lineCountAbove(text, TABLE_LIMITS.maxRows + 1))
    throw invalid(
      `The file has more than ${TABLE_LIMITS.maxRows.toLocaleString("en")} data rows; Waymark reads at most that many.`,
    );
  const delimiter = guessDelimiter(text);
  // A header far too wide is refused before any row is split into cells.
  const firstLine = text.slice(0, Math.max(0, text.indexOf("\n")) || text.length);
  if (firstLine.indexOf('"') < 0 && occurrencesAbove(firstLine, delimiter, TABLE_LIMITS.maxColumns - 1))
    throw invalid(
      `The header row has more than ${TABLE_LIMITS.maxColumns} columns; Waymark reads at most ${TABLE_LIMITS.maxColumns}.`,
    );
  let header: string[] | null = null;
  const rows: Table["rows"] = [];
  let problem: HttpError | null = null;
  // Rows are checked as the parser produces them and parsing stops at the first bound passed.
  Papa.parse<string[]>(text, {
    delimiter,
    skipEmptyLines: "greedy",
    step: (result, parser) => {
      const cells = result.data;
      // Line numbers as a spreadsheet shows them: the header is row 1.
      const row = rows.length + 2;
      if (cells.length > TABLE_LIMITS.maxColumns) {
        problem = invalid(
          `${header ? `Row ${row}` : "The header row"} has ${cells.length.toLocaleString("en")} columns; Waymark reads at most ${TABLE_LIMITS.maxColumns}.`,
        );
        return parser.abort();
      }
      for (let c = 0; c < cells.length; c++) {
        if (cells[c]!.length > TABLE_LIMITS.maxCellChars) {
          problem = invalid(
            `The cell in row ${header ? row : 1}, column ${c + 1} holds ${cells[c]!.length.toLocaleString("en")} characters; Waymark reads cells up to ${TABLE_LIMITS.maxCellChars.toLocaleString("en")}.`,
          );
          return parser.abort();
        }
      }
      if (!header) {
        header = cells;
        return;
      }
      if (rows.length >= TABLE_LIMITS.maxRows) {
        problem = invalid(
          `The file has more than ${TABLE_LIMITS.maxRows.toLocaleString("en")} data rows; Waymark reads at most that many.`,
        );
        return parser.abort();
      }
      rows.push({ row, cells });
    },
  });
  if (problem) throw problem;
  if (!header) throw invalid("The file is empty.");
  return { columns: checkHeader(header), rows, format: "csv" };
}

/** True when `needle` occurs more than `limit` times in `text`, stopping as soon as it knows. */
function occurrencesAbove(text: string, needle: string, limit: number): boolean {
  let n = 0;
  for (let at = text.indexOf(needle); at >= 0; at = text.indexOf(needle, at + 1))
    if (++n > limit) return true;
  return false;
}

/** True when the text has more than `limit` non-blank lines, stopping as soon as it knows. */
function lineCountAbove(text: string, limit: number): boolean {
  let lines = 0;
  let from = 0;
  while (from < text.length) {
    let to = text.indexOf("\n", from);
    if (to < 0) to = text.length;
    if (to - from > 1 || (to - from === 1 && text.charCodeAt(from) !== 13)) lines++;
    if (lines > limit) return true;
    from = to + 1;
  }
  return false;
}

/** UTF-16 text without a byte-order mark: ASCII letters each followed (or preceded) by a zero byte. */
function looksUtf16(bytes: Buffer): boolean {
  const n = Math.min(bytes.length, 512) & ~1;
  if (n < 8) return false;
  let zeroFirst = 0;
  let zeroSecond = 0;
  for (let i = 0; i < n; i += 2) {
    if (bytes[i] === 0 && bytes[i + 1]! > 0 && bytes[i + 1]! < 0x80) zeroFirst++;
    if (bytes[i + 1] === 0 && bytes[i]! > 0 && bytes[i]! < 0x80) zeroSecond++;
  }
  return Math.max(zeroFirst, zeroSecond) >= 0.8 * (n / 2);
}

export async function parseXlsx(bytes: Buffer): Promise<Table> {
  const table = await readXlsx(bytes);
  return { ...table, columns: checkHeader(table.columns) };
}

/** Reads an uploaded CSV or XLSX file into a table of text cells. */
export async function parseUpload(fileName: string, bytes: Buffer): Promise<Table> {
  if (bytes.length === 0) throw invalid("The file is empty.");
  const format = detectFormat(fileName, bytes);
  return format === "xlsx" ? parseXlsx(bytes) : parseCsv(bytes);
}
