import { HttpError } from "../../http/errors.js";
import type { Table } from "./parse-upload.js";
import { TABLE_LIMITS } from "./table-limits.js";
import { XmlScanner, type XmlHandlers } from "./xml-scan.js";
import { InflateBudget, inflateEntry, listZipEntries, type ZipEntry } from "./zip-bounds.js";

/**
 * Reads the first sheet of an .xlsx workbook (ECMA-376 Part 1, §18.3 worksheets, §18.4 shared
 * strings) with every bound counted while reading: inflated bytes (zip-bounds.ts), sheets, rows,
 * columns, cells and the length of each text. Only the parts the first sheet needs are inflated,
 * and each is parsed as it inflates, so a hostile workbook is refused at the bound it passes
 * rather than after a full load.
 */

function invalid(message: string): HttpError {
  return new HttpError(422, "invalid_file", message);
}

const DAMAGED = "The workbook could not be read; it may be damaged or not an .xlsx file.";

/** "BC12" → 55 (1-based column), or 0 when the reference has no letters. */
function columnOf(ref: string): number {
  let col = 0;
  for (let i = 0; i < ref.length && i < 4; i++) {
    const c = ref.charCodeAt(i);
    if (c >= 65 && c <= 90) col = col * 26 + (c - 64);
    else break;
  }
  return col;
}

/** Column number → letters, for naming a cell in a message. */
function letters(col: number): string {
  let s = "";
  for (let n = col; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

/** Streams one part through the XML reader as it inflates; `maxCarry` bounds an unfinished tag. */
async function parsePart(
  bytes: Buffer,
  entry: ZipEntry,
  budget: InflateBudget,
  handlers: XmlHandlers,
  maxCarry: number,
): Promise<void> {
  const scanner = new XmlScanner(handlers, maxCarry);
  const decoder = new TextDecoder("utf-8");
  try {
    await inflateEntry(bytes, entry, budget, (chunk) =>
      scanner.write(decoder.decode(chunk, { stream: true })),
    );
    scanner.write(decoder.decode());
    scanner.end();
  } catch (e) {
    if (e instanceof HttpError) throw e;
    throw invalid(DAMAGED);
  }
}

/** Ends a peek once it has what it needs. */
class PeekDone extends Error {}

/** Refuses a sheet whose declared size (`<dimension ref="A1:F1000000">`) passes the bounds. */
function refuseDeclaredSize(ref: string | undefined): void {
  const limits = TABLE_LIMITS;
  const m = /:([A-Z]{1,3})(\d{1,7})$/.exec(ref ?? "");
  if (!m) return;
  const cols = columnOf(m[1]!);
  if (cols > limits.maxColumns)
    throw invalid(
      `The first sheet spans ${m[1]} columns; Waymark reads at most ${limits.maxColumns} columns.`,
    );
  if (cols * Number(m[2]) > limits.maxCells)
    throw invalid(
      `The first sheet spans ${Number(m[2]).toLocaleString("en")} rows × ${cols} columns; Waymark reads at most ${limits.maxCells.toLocaleString("en")} cells.`,
    );
}

/**
 * Reads the sheet's declared size from its first inflated piece, before the shared strings or
 * any cell are parsed, so a workbook that says it is too large is refused at once. Only a hint:
 * a missing or small declaration proves nothing, and cells are still counted as they are read.
 * Damage is left for the full read to report.
 */
async function peekDeclaredSize(bytes: Buffer, sheet: ZipEntry): Promise<void> {
  let ref: string | undefined;
  const scanner = new XmlScanner(
    {
      open: (name, attrs) => {
        if (name === "dimension") ref = attrs.ref;
        if (name === "dimension" || name === "sheetData") throw new PeekDone();
      },
    },
    64 * 1024,
  );
  try {
    await inflateEntry(bytes, sheet, new InflateBudget(), (chunk) => {
      scanner.write(new TextDecoder("utf-8").decode(chunk, { stream: true }));
      throw new PeekDone(); // one piece (256 KB) is enough: the declaration comes before the cells
    });
  } catch (e) {
    if (!(e instanceof PeekDone)) return;
  }
  refuseDeclaredSize(ref);
}

export async function readXlsx(bytes: Buffer): Promise<Table> {
  const limits = TABLE_LIMITS;
  const entries = new Map<string, ZipEntry>();
  for (const e of listZipEntries(bytes)) entries.set(e.name.replace(/^\//, ""), e);
  const budget = new InflateBudget();
  const runLimit = 64 * 1024; // the longest tag a part may carry between chunks

  const workbook = entries.get("xl/workbook.xml");
  if (!workbook) throw invalid(DAMAGED);
  let sheets = 0;
  let firstSheetRel: string | null = null;
  await parsePart(
    bytes,
    workbook,
    budget,
    {
      open: (name, attrs) => {
        if (name !== "sheet") return;
        sheets++;
        if (sheets > limits.maxSheets)
          throw invalid(
            `The workbook has more than ${limits.maxSheets} sheets; Waymark reads at most that many.`,
          );
        firstSheetRel ??=
          attrs["r:id"] ?? Object.entries(attrs).find(([k]) => k.endsWith(":id"))?.[1] ?? null;
      },
    },
    runLimit,
  );
  if (sheets === 0) throw invalid("The workbook has no sheets.");

  let sheetPath = "xl/worksheets/sheet1.xml";
  const rels = entries.get("xl/_rels/workbook.xml.rels");
  if (rels && firstSheetRel) {
    await parsePart(
      bytes,
      rels,
      budget,
      {
        open: (name, attrs) => {
          if (name !== "Relationship" || attrs.Id !== firstSheetRel || !attrs.Target) return;
          const target = attrs.Target;
          sheetPath = target.startsWith("/") ? target.slice(1) : `xl/${target.replace(/^\.\//, "")}`;
        },
      },
      runLimit,
    );
  }
  const sheet = entries.get(sheetPath);
  if (!sheet) throw invalid(DAMAGED);
  await peekDeclaredSize(bytes, sheet);

  const shared: string[] = [];
  const sst = entries.get("xl/sharedStrings.xml");
  if (sst) {
    let inSi = false;
    let inT = false;
    let skip = 0; // inside phonetic runs, which are not part of the cell's text
    let text = "";
    await parsePart(
      bytes,
      sst,
      budget,
      {
        open: (name) => {
          if (name === "si") {
            inSi = true;
            text = "";
            if (shared.length >= limits.maxCells)
              throw invalid(
                `The workbook holds more than ${limits.maxCells.toLocaleString("en")} texts; Waymark reads at most that many cells.`,
              );
          } else if (name === "t") inT = true;
          else if (name === "rPh") skip++;
        },
        close: (name) => {
          if (name === "si") {
            inSi = false;
            shared.push(text);
          } else if (name === "t") inT = false;
          else if (name === "rPh") skip--;
        },
        text: (t) => {
          if (!inSi || !inT || skip > 0) return;
          text += t;
          if (text.length > limits.maxCellChars)
            throw invalid(
              `A text in the workbook is longer than ${limits.maxCellChars.toLocaleString("en")} characters; Waymark reads cells up to that length.`,
            );
        },
      },
      runLimit,
    );
  }

  const found: { row: number; cells: string[] }[] = [];
  let rowNo = 0;
  let rowsSeen = 0;
  let cellsSeen = 0;
  let width = 0;
  let cells: string[] = [];
  let col = 0;
  let type = "n";
  let capture = false;
  let inIs = false;
  let skip = 0;
  let value = "";
  const where = () => `cell ${letters(col)}${rowNo}`;
  await parsePart(
    bytes,
    sheet,
    budget,
    {
      open: (name, attrs) => {
        switch (name) {
          case "row": {
            rowNo = attrs.r ? Number(attrs.r) : rowNo + 1;
            if (!Number.isInteger(rowNo) || rowNo < 1) throw invalid(DAMAGED);
            if (++rowsSeen > limits.maxRows + 1)
              throw invalid(
                `The first sheet has more than ${limits.maxRows.toLocaleString("en")} data rows; Waymark reads at most that many.`,
              );
            cells = [];
            col = 0;
            break;
          }
          case "c": {
            col = attrs.r ? columnOf(attrs.r) || col + 1 : col + 1;
            if (col > limits.maxColumns)
              throw invalid(
                `The first sheet has data in ${where()}, beyond column ${letters(limits.maxColumns)}; Waymark reads at most ${limits.maxColumns} columns.`,
              );
            if (++cellsSeen > limits.maxCells)
              throw invalid(
                `The first sheet has more than ${limits.maxCells.toLocaleString("en")} cells (passed at ${where()}); Waymark reads at most that many.`,
              );
            type = attrs.t ?? "n";
            value = "";
            break;
          }
          case "v":
            capture = true;
            break;
          case "is":
            inIs = true;
            break;
          case "t":
            if (inIs) capture = true;
            break;
          case "rPh":
            skip++;
            break;
          case "dimension":
            // A declared size may refuse early; a small one proves nothing, so cells are counted too.
            refuseDeclaredSize(attrs.ref);
            break;
        }
      },
      close: (name) => {
        switch (name) {
          case "v":
          case "t":
            capture = false;
            break;
          case "is":
            inIs = false;
            break;
          case "rPh":
            skip--;
            break;
          case "c": {
            cells[col - 1] = cellText(type, value, shared).trim();
            break;
          }
          case "row": {
            if (cells.some((c) => c !== "")) {
              found.push({ row: rowNo, cells });
              if (cells.length > width) width = cells.length;
            }
            break;
          }
        }
      },
      text: (t) => {
        if (!capture || skip > 0) return;
        value += t;
        if (value.length > limits.maxCellChars)
          throw invalid(
            `The text in ${where()} is longer than ${limits.maxCellChars.toLocaleString("en")} characters; Waymark reads cells up to that length.`,
          );
      },
    },
    runLimit,
  );
  if (found.length === 0) throw invalid("The workbook's first sheet is empty.");
  // Short rows are padded to the widest one: that grid is bounded too, not only the cells written.
  if (width * found.length > limits.maxCells)
    throw invalid(
      `The first sheet spans ${found.length.toLocaleString("en")} rows × ${width} columns; Waymark reads at most ${limits.maxCells.toLocaleString("en")} cells.`,
    );
  const pad = (c: string[]) => Array.from({ length: width }, (_, i) => c[i] ?? "");
  const [header, ...rows] = found;
  return {
    columns: pad(header!.cells),
    rows: rows.map((r) => ({ row: r.row, cells: pad(r.cells) })),
    format: "xlsx",
  };
}

/** A cell's text as a spreadsheet shows it (numbers in their shortest round-trip form). */
function cellText(type: string, raw: string, shared: string[]): string {
  switch (type) {
    case "s":
      return shared[Number(raw)] ?? "";
    case "b":
      return raw === "1" ? "true" : raw === "0" ? "false" : raw;
    case "n": {
      // Spreadsheets write numbers in their shortest form already; only long or exponent forms
      // are rewritten (as the number they stand for), which also spares a conversion per cell.
      if (raw.length <= 15 && raw.indexOf("E") < 0 && raw.indexOf("e") < 0) return raw;
      if (raw.length > 40) return raw;
      const n = Number(raw);
      return raw.trim() !== "" && Number.isFinite(n) ? String(n) : raw;
    }
    default:
      return raw;
  }
}
