import Papa from "papaparse";
import type { GroupInput } from "../numeric/centred-sample.js";
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

/**
 * Reads CSV text into groups of outcome values, keeping each outcome cell as text so the
 * engine's exact-decimal path sees exactly what was written. The header row names the
 * columns (any text: quoted, with spaces, non-ASCII); the delimiter (comma, semicolon or tab)
 * is detected; a byte-order mark is dropped; the decimal separator is the point. Each kept
 * value carries its CSV line number (1 = header), counted through quoted line breaks.
 * Groups keep the order of their first appearance.
 * Example: readGroupedCsv('g,y\nA,1\nA,2\nB,3\n', "g", "y").groups
 *   → [{ name: "A", values: ["1", "2"], rows: [2, 3] }, { name: "B", values: ["3"], rows: [4] }].
 * Cost: O(size of the text).
 */
export function readGroupedCsv(text: string, groupColumn: string, outcomeColumn: string): GroupedCsv {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const parsed = Papa.parse<string[]>(body, {
    header: false,
    skipEmptyLines: false,
    delimitersToGuess: [",", ";", "\t"],
  });
  const rows = parsed.data;
  const header = rows[0];
  if (!header || header.every((h) => h.trim() === ""))
    throw new CliError("the CSV file is empty (no header row)");
  const names = header.map((h) => h.trim());
  const gi = names.indexOf(groupColumn.trim());
  const oi = names.indexOf(outcomeColumn.trim());
  const listed = names.map((n) => `'${n}'`).join(", ");
  if (gi < 0) throw new CliError(`no column named '${groupColumn}' for --group; the columns are ${listed}`);
  if (oi < 0)
    throw new CliError(`no column named '${outcomeColumn}' for --outcome; the columns are ${listed}`);
  if (gi === oi) throw new CliError("--group and --outcome name the same column");

  const byName = new Map<string, { name: string; values: string[]; rows: number[] }>();
  const skippedNoGroup: number[] = [];
  const refused: GroupedCsv["refused"] = [];
  let line = 1 + lineBreaks(header);
  let count = 0;
  for (let r = 1; r < rows.length; r++) {
    const row = rows[r] as string[];
    line += 1;
    const start = line;
    line += lineBreaks(row);
    if (row.length === 1 && (row[0] ?? "").trim() === "") continue; // blank line
    count++;
    const group = (row[gi] ?? "").trim();
    if (group === "") {
      skippedNoGroup.push(start);
      continue;
    }
    let entry = byName.get(group);
    if (!entry) {
      entry = { name: group, values: [], rows: [] };
      byName.set(group, entry);
    }
    // One reader of values for uploads and the command line; missing cells go on as "" so the
    // engine counts them, refused cells are reported by line.
    const reading = readValue(row[oi] ?? "");
    if (reading.kind === "refused") {
      refused.push({ line: start, reading });
      continue;
    }
    entry.values.push(reading.kind === "number" ? reading.text : "");
    entry.rows.push(start);
  }
  return {
    groups: [...byName.values()],
    rows: count,
    skippedNoGroup,
    delimiter: parsed.meta.delimiter,
    refused,
  };
}

/** Line breaks inside a row's (quoted) fields, so later line numbers stay right. */
function lineBreaks(row: readonly string[]): number {
  let n = 0;
  for (const cell of row) {
    if (cell.length > 0 && cell.indexOf("\n") >= 0) n += cell.split("\n").length - 1;
  }
  return n;
}
