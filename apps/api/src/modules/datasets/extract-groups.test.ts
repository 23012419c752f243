import { describe, expect, it } from "vitest";
import { extractGroups } from "./extract-groups.js";
import type { Table } from "./parse-upload.js";

const long = { layout: "long" as const, groupColumn: "Line", outcomeColumn: "Yield" };
function table(rows: [string, string][]): Table {
  return { columns: ["Line", "Yield"], rows: rows.map((cells, i) => ({ row: i + 2, cells })), format: "csv" };
}

describe("extractGroups on hostile cells", () => {
  it("refuses a 1 MB outcome cell (the old decimal pattern's worst case) by its length, naming the row", () => {
    // "1" × 1,000,000 followed by "x" made the former backtracking pattern run for minutes.
    const cell = "1".repeat(1_000_000) + "x";
    const { report } = extractGroups(
      table([
        ["North", "1"],
        ["North", "2"],
        ["South", cell],
        ["South", "3"],
        ["South", "4"],
      ]),
      long,
      [],
    );
    expect(report.usable).toBe(false);
    expect(report.messages[0]).toMatch(/^Row 4, column "Yield": "1{40}…" is 1,000,001 characters long/);
    expect(JSON.stringify(report).length).toBeLessThan(2000);
  });

  it("keeps a 10 MB unknown group name out of the report but for a short quote", () => {
    const name = "W".repeat(10_000_000);
    const { report } = extractGroups(
      table([
        ["North", "1"],
        ["North", "2"],
        ["South", "3"],
        ["South", "4"],
        [name, "5"],
      ]),
      long,
      ["North", "South"],
    );
    expect(report.usable).toBe(true);
    expect(report.unknownLevels).toEqual(["W".repeat(80) + "…"]);
    expect(JSON.stringify(report).length).toBeLessThan(2000);
  });
});
