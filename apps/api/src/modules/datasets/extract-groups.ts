import type { Table } from "./parse-upload.js";

export interface ExtractedGroups {
  groups: { name: string; values: string[]; rows: number[] }[];
}

export type ExclusionReason = "missing" | "non-numeric" | "missing-group" | "unknown-level";

export interface ValidationReport {
  rowsRead: number;
  rowsUsed: number;
  excluded: { row: number; reason: ExclusionReason; value: string; column: string }[];
  /** How many exclusions there were in all; the list above is capped for very large files. */
  excludedCount: number;
  groupsFound: { name: string; n: number }[];
  unknownLevels: string[];
  missingLevels: string[];
  messages: string[];
  /** True when the data can be analysed: at least two groups with at least two values each. */
  usable: boolean;
}

export interface ColumnChoice {
  layout: "long" | "wide";
  groupColumn?: string | null;
  outcomeColumn?: string | null;
}

const MAX_LISTED = 500;
/** Cells read as "no value" rather than as bad text (common practice in data exchange). */
const MISSING = new Set(["", "na", "n/a", "null", ".", "-"]);
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function isMissing(cell: string): boolean {
  return MISSING.has(cell.trim().toLowerCase());
}

export function isDecimal(cell: string): boolean {
  return DECIMAL.test(cell.trim());
}

/**
 * Turns a table into groups of decimal-text values under the chosen layout, with a report of
 * everything read, excluded (and why, by row number) and how the groups match the plan's levels.
 */
export function extractGroups(
  table: Table,
  choice: ColumnChoice,
  levels: string[],
): { data: ExtractedGroups; report: ValidationReport } {
  const excluded: ValidationReport["excluded"] = [];
  let excludedCount = 0;
  const exclude = (row: number, reason: ExclusionReason, value: string, column: string) => {
    excludedCount++;
    if (excluded.length < MAX_LISTED) excluded.push({ row, reason, value: value.slice(0, 80), column });
  };
  const byName = new Map<string, { values: string[]; rows: number[] }>();
  const add = (name: string, value: string, row: number) => {
    let g = byName.get(name);
    if (!g) byName.set(name, (g = { values: [], rows: [] }));
    g.values.push(value.trim());
    g.rows.push(row);
  };
  const known = new Set(levels);
  const unknown = new Set<string>();
  const messages: string[] = [];

  if (choice.layout === "long") {
    const gi = table.columns.indexOf(choice.groupColumn ?? "");
    const oi = table.columns.indexOf(choice.outcomeColumn ?? "");
    if (gi < 0)
      messages.push(
        `The group column "${choice.groupColumn ?? ""}" is not in the file; its columns are ${table.columns.map((c) => `"${c}"`).join(", ")}.`,
      );
    if (oi < 0)
      messages.push(
        `The outcome column "${choice.outcomeColumn ?? ""}" is not in the file; its columns are ${table.columns.map((c) => `"${c}"`).join(", ")}.`,
      );
    if (gi === oi && gi >= 0) messages.push("The group and outcome columns must be different columns.");
    if (messages.length === 0) {
      for (const { row, cells } of table.rows) {
        const group = (cells[gi] ?? "").trim();
        const value = cells[oi] ?? "";
        if (group === "") exclude(row, "missing-group", value, table.columns[gi]!);
        else if (isMissing(value)) exclude(row, "missing", value, table.columns[oi]!);
        else if (!isDecimal(value)) exclude(row, "non-numeric", value, table.columns[oi]!);
        else if (known.size > 0 && !known.has(group)) {
          unknown.add(group);
          exclude(row, "unknown-level", group, table.columns[gi]!);
        } else add(group, value, row);
      }
    }
  } else {
    table.columns.forEach((col, ci) => {
      if (col === "") return;
      if (known.size > 0 && !known.has(col)) {
        unknown.add(col);
        return;
      }
      for (const { row, cells } of table.rows) {
        const value = cells[ci] ?? "";
        // In the wide layout blank cells are padding of shorter columns, not missing observations.
        if (value.trim() === "") continue;
        if (isMissing(value)) exclude(row, "missing", value, col);
        else if (!isDecimal(value)) exclude(row, "non-numeric", value, col);
        else add(col, value, row);
      }
    });
  }

  const order =
    levels.length > 0
      ? [...levels.filter((l) => byName.has(l)), ...[...byName.keys()].filter((k) => !known.has(k))]
      : [...byName.keys()];
  const groups = order.map((name) => ({ name, ...byName.get(name)! }));
  const missingLevels = levels.filter((l) => !byName.has(l));
  if (unknown.size > 0)
    messages.push(`Not in the plan's levels, so left out: ${[...unknown].map((u) => `"${u}"`).join(", ")}.`);
  if (missingLevels.length > 0)
    messages.push(
      `No data for the planned level${missingLevels.length > 1 ? "s" : ""} ${missingLevels.map((m) => `"${m}"`).join(", ")}.`,
    );
  const nonNumeric = excluded.filter((e) => e.reason === "non-numeric");
  const decimalComma = nonNumeric.some((e) => /^[+-]?\d+,\d+$/.test(e.value.trim()));
  if (decimalComma) {
    messages.push(
      "Some values use a decimal comma (e.g. 4,5); Waymark reads a decimal point. Convert the column and upload again.",
    );
  }
  // Problems that stop the analysis come first, so a refusal names the one that matters.
  const blocking = messages.filter((m) => m.startsWith("The "));
  const small = groups.filter((g) => g.values.length < 2);
  for (const g of small) {
    blocking.push(
      `Group "${g.name}" has ${g.values.length} usable value${g.values.length === 1 ? "" : "s"}; every group needs at least two.`,
    );
  }
  if (groups.length < 2 && blocking.length === 0) {
    blocking.push(
      `Only ${groups.length} group${groups.length === 1 ? "" : "s"} with data; a comparison needs at least two.`,
    );
  }
  // When decimal commas are why the data cannot be used, that is the cause to name first.
  const commaMessage = messages.find((m) => m.startsWith("Some values use a decimal comma"));
  if (blocking.length > 0 && commaMessage) blocking.unshift(commaMessage);
  const rowsUsed = groups.reduce((s, g) => s + g.values.length, 0);
  const usable = blocking.length === 0;
  const allMessages = [...new Set([...blocking, ...messages.filter((m) => !m.startsWith("The "))])];

  return {
    data: { groups },
    report: {
      rowsRead: table.rows.length,
      rowsUsed,
      excluded,
      excludedCount,
      groupsFound: groups.map((g) => ({ name: g.name, n: g.values.length })),
      unknownLevels: [...unknown],
      missingLevels,
      messages: allMessages,
      usable,
    },
  };
}

/** Guesses the layout and columns: a text column with few distinct values is the group, the first numeric column the outcome. */
export function guessColumns(table: Table, levels: string[]): Required<ColumnChoice> {
  const sample = table.rows.slice(0, 500);
  const numericShare = table.columns.map((_, ci) => {
    const cells = sample.map((r) => r.cells[ci] ?? "").filter((c) => !isMissing(c));
    return cells.length ? cells.filter(isDecimal).length / cells.length : 0;
  });
  const headerMatchesLevels = levels.length > 0 && levels.every((l) => table.columns.includes(l));
  if (headerMatchesLevels || (table.columns.length >= 2 && numericShare.every((s) => s > 0.9))) {
    return { layout: "wide", groupColumn: null, outcomeColumn: null };
  }
  const groupIdx = table.columns.findIndex((_, ci) => {
    if (numericShare[ci]! > 0.5) return false;
    const distinct = new Set(sample.map((r) => (r.cells[ci] ?? "").trim()).filter(Boolean));
    return distinct.size >= 2 && distinct.size <= 50;
  });
  const outcomeIdx = numericShare.findIndex((s, ci) => s > 0.5 && ci !== groupIdx);
  return {
    layout: "long",
    groupColumn: table.columns[groupIdx] ?? null,
    outcomeColumn: table.columns[outcomeIdx] ?? null,
  };
}
