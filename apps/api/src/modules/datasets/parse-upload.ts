import type * as ExcelJS from "exceljs";
import Papa from "papaparse";
import { HttpError } from "../../http/errors.js";
import { zipBoundsProblem } from "./zip-bounds.js";

/** A parsed sheet: header names and the data rows as text, with each row's number in the file. */
export interface Table {
  columns: string[];
  rows: { row: number; cells: string[] }[];
  format: "csv" | "xlsx";
}

/** Bounds that keep a hostile file from exhausting memory or time. */
export const TABLE_LIMITS = { maxRows: 2_000_000, maxColumns: 1000, maxXlsxCells: 5_000_000 };

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
    if (isZip || bytes.includes(0))
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

export function parseCsv(bytes: Buffer): Table {
  const text = new TextDecoder("utf-8", { fatal: false }).decode(bytes).replace(/^\uFEFF/, "");
  if (text.trim() === "") throw invalid("The file is empty.");
  // Stop one row past the bound, so a huge file costs no more than the bound to refuse.
  const parsed = Papa.parse<string[]>(text, {
    skipEmptyLines: "greedy",
    delimitersToGuess: [",", ";", "\t"],
    preview: TABLE_LIMITS.maxRows + 2,
  });
  const data = parsed.data;
  const header = data[0];
  if (!header) throw invalid("The file is empty.");
  const columns = checkHeader(header);
  if (data.length - 1 > TABLE_LIMITS.maxRows)
    throw invalid(
      `The file has more than ${TABLE_LIMITS.maxRows.toLocaleString("en")} data rows; Waymark reads at most that many.`,
    );
  // Line numbers as a spreadsheet shows them: the header is row 1.
  const rows = data.slice(1).map((cells, i) => ({ row: i + 2, cells }));
  return { columns, rows, format: "csv" };
}

function cellText(v: ExcelJS.CellValue): string {
  if (v === null || v === undefined) return "";
  if (typeof v === "number") return String(v);
  if (typeof v === "string") return v;
  if (typeof v === "boolean") return String(v);
  if (v instanceof Date) return v.toISOString();
  if (typeof v === "object") {
    if ("result" in v) return cellText(v.result as ExcelJS.CellValue);
    if ("richText" in v) return v.richText.map((r) => r.text).join("");
    if ("text" in v) return String(v.text);
    if ("error" in v) return String(v.error);
  }
  return "";
}

export async function parseXlsx(bytes: Buffer): Promise<Table> {
  const tooBig = zipBoundsProblem(bytes);
  if (tooBig) throw invalid(tooBig);
  // exceljs loads on the first workbook: it was a quarter of the API's start-up.
  const { default: excel } = await import("exceljs");
  const wb = new excel.Workbook();
  try {
    await wb.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch {
    throw invalid("The workbook could not be read; it may be damaged or not an .xlsx file.");
  }
  const sheet = wb.worksheets[0];
  if (!sheet || sheet.actualRowCount === 0) throw invalid("The workbook's first sheet is empty.");
  if (sheet.rowCount * sheet.columnCount > TABLE_LIMITS.maxXlsxCells) {
    throw invalid(
      `The first sheet spans ${sheet.rowCount} rows × ${sheet.columnCount} columns; Waymark reads at most ${TABLE_LIMITS.maxXlsxCells.toLocaleString("en")} cells.`,
    );
  }
  const width = sheet.columnCount;
  const read = (r: ExcelJS.Row) =>
    Array.from({ length: width }, (_, i) => cellText(r.getCell(i + 1).value).trim());
  let headerRow = 0;
  const rows: { row: number; cells: string[] }[] = [];
  let columns: string[] = [];
  sheet.eachRow({ includeEmpty: false }, (r, n) => {
    if (!headerRow) {
      headerRow = n;
      columns = read(r);
      return;
    }
    const cells = read(r);
    if (cells.some((c) => c !== "")) rows.push({ row: n, cells });
  });
  return { columns: checkHeader(columns), rows, format: "xlsx" };
}

/** Reads an uploaded CSV or XLSX file into a table of text cells. */
export async function parseUpload(fileName: string, bytes: Buffer): Promise<Table> {
  if (bytes.length === 0) throw invalid("The file is empty.");
  const format = detectFormat(fileName, bytes);
  return format === "xlsx" ? parseXlsx(bytes) : parseCsv(bytes);
}
