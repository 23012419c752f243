import { readValue, type ValueReading } from "@waymark/stats";
import { controlCharacterIn, printable } from "../../text/printable.js";
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
/** Unknown group names listed in a report, and how much of each is quoted: reports stay small. */
const MAX_UNKNOWN_LISTED = 50;
const MAX_NAME_CHARS = 80;

function clip(text: string): string {
  return text.length > MAX_NAME_CHARS ? `${text.slice(0, MAX_NAME_CHARS)}…` : text;
}

function listColumns(columns: string[]): string {
  const shown = columns.slice(0, 20).map((c) => `"${clip(c)}"`);
  return columns.length > 20 ? `${shown.join(", ")} and ${columns.length - 20} more` : shown.join(", ");
}

/** Missing and decimal rules are the stats package's readValue, shared with the command line. */
export function isMissing(cell: string): boolean {
  return readValue(cell).kind === "missing";
}

export function isDecimal(cell: string): boolean {
  return readValue(cell).kind === "number";
}

/** Values the engine cannot hold: the upload is refused rather than storing them. */
const BLOCKING_PROBLEMS = new Set(["too-large", "too-small", "infinite", "too-long"]);

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
  // The first refused cell of each kind of problem, named in the messages with its place.
  const refusals = new Map<string, { row: number; column: string; message: string; count: number }>();
  const refuse = (row: number, column: string, r: Extract<ValueReading, { kind: "refused" }>) => {
    const seen = refusals.get(r.problem);
    if (seen) seen.count++;
    else refusals.set(r.problem, { row, column, message: r.message, count: 1 });
    exclude(row, "non-numeric", r.text, column);
  };
  // A group name is printed in figures, the report and e-mail: one with a control character is refused.
  let controlProblem: string | null = null;
  const controlIn = (name: string, where: string) => {
    const c = controlProblem ? null : controlCharacterIn(name);
    if (c)
      controlProblem = `${where}: the group name "${clip(printable(name, { singleLine: true }))}" contains the control character ${c}; remove it and upload again.`;
  };
  const byName = new Map<string, { values: string[]; rows: number[] }>();
  const add = (name: string, value: string, row: number) => {
    let g = byName.get(name);
    if (!g) byName.set(name, (g = { values: [], rows: [] }));
    g.values.push(value);
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
        `The group column "${clip(choice.groupColumn ?? "")}" is not in the file; its columns are ${listColumns(table.columns)}.`,
      );
    if (oi < 0)
      messages.push(
        `The outcome column "${clip(choice.outcomeColumn ?? "")}" is not in the file; its columns are ${listColumns(table.columns)}.`,
      );
    if (gi === oi && gi >= 0) messages.push("The group and outcome columns must be different columns.");
    if (messages.length === 0) {
      for (const { row, cells } of table.rows) {
        const group = (cells[gi] ?? "").trim();
        const value = cells[oi] ?? "";
        const r = readValue(value);
        controlIn(group, `Row ${row}, column "${clip(table.columns[gi]!)}"`);
        if (group === "") exclude(row, "missing-group", value, table.columns[gi]!);
        else if (r.kind === "missing") exclude(row, "missing", value, table.columns[oi]!);
        else if (r.kind === "refused") refuse(row, table.columns[oi]!, r);
        else if (known.size > 0 && !known.has(group)) {
          if (unknown.size < MAX_UNKNOWN_LISTED) unknown.add(clip(group));
          exclude(row, "unknown-level", group, table.columns[gi]!);
        } else add(group, r.text, row);
      }
    }
  } else {
    table.columns.forEach((col, ci) => {
      if (col === "") return;
      controlIn(col, `Column ${ci + 1} of the header row`);
      if (known.size > 0 && !known.has(col)) {
        if (unknown.size < MAX_UNKNOWN_LISTED) unknown.add(clip(col));
        return;
      }
      for (const { row, cells } of table.rows) {
        const value = cells[ci] ?? "";
        // In the wide layout blank cells are padding of shorter columns, not missing observations.
        if (value.trim() === "") continue;
        const r = readValue(value);
        if (r.kind === "missing") exclude(row, "missing", value, col);
        else if (r.kind === "refused") refuse(row, col, r);
        else add(col, r.text, row);
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
  // Each kind of refused value named once, at its first cell, with how many more there are.
  const refusalMessages: string[] = [];
  const blockingRefusals: string[] = [];
  for (const [problem, r] of refusals) {
    const more = r.count > 1 ? ` (${r.count - 1} more cell${r.count === 2 ? "" : "s"} like it)` : "";
    const text = `Row ${r.row}, column "${clip(r.column)}": ${r.message}${more}.`;
    (BLOCKING_PROBLEMS.has(problem) ? blockingRefusals : refusalMessages).push(text);
  }
  // Problems that stop the analysis come first, so a refusal names the one that matters:
  // a control character or a value that cannot be held, then the rest.
  const refused = [...(controlProblem ? [controlProblem] : []), ...blockingRefusals];
  const blocking = messages.filter((m) => m.startsWith("The "));
  const small = groups.filter((g) => g.values.length < 2);
  for (const g of small) {
    blocking.push(
      `Group "${clip(g.name)}" has ${g.values.length} usable value${g.values.length === 1 ? "" : "s"}; every group needs at least two.`,
    );
  }
  if (groups.length < 2 && blocking.length === 0 && refused.length === 0) {
    blocking.push(
      `Only ${groups.length} group${groups.length === 1 ? "" : "s"} with data; a comparison needs at least two.`,
    );
  }
  // When refused values are why too little data is left, they are the cause to name first.
  if (blocking.length > 0) blocking.unshift(...refusalMessages);
  blocking.unshift(...refused);
  const others = [...refusalMessages, ...messages.filter((m) => !m.startsWith("The "))];
  const rowsUsed = groups.reduce((s, g) => s + g.values.length, 0);
  const usable = blocking.length === 0;
  const allMessages = [...new Set([...blocking, ...others])];

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
