import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import type { ValidationReport as Report } from "@waymark/contract";
import { ValidationReport } from "./validation-report";

const report: Report = {
  rowsRead: 34,
  rowsUsed: 30,
  usable: true,
  excluded: [
    { row: 5, reason: "missing", value: "", column: "Strength" },
    { row: 12, reason: "non-numeric", value: "n.m.", column: "Strength" },
    { row: 27, reason: "non-numeric", value: "41,2", column: "Strength" },
    { row: 31, reason: "unknown-level", value: "Steem", column: "Method" },
  ],
  excludedCount: 4,
  groupsFound: [
    { name: "Water bath", n: 8 },
    { name: "Steam", n: 7 },
    { name: "Air", n: 8 },
    { name: "Steem", n: 1 },
  ],
  unknownLevels: ["Steem"],
  missingLevels: ["Sealed"],
  messages: ["Row 1 was read as the header."],
};
const levels = ["Water bath", "Steam", "Air", "Sealed"];

describe("ValidationReport", () => {
  it("lists each excluded row with its number, value and reason", () => {
    render(<ValidationReport report={report} levels={levels} stored />);
    const table = screen.getByRole("table", { name: "Rows excluded" });
    const rows = within(table).getAllByRole("row").slice(1);
    expect(rows.map((r) => r.textContent)).toEqual([
      "row 5Strength(empty)missing value",
      "row 12Strengthn.m.not a number",
      "row 27Strength41,2not a number",
      "row 31MethodSteemgroup is not a planned level",
    ]);
    expect(screen.getByText(/34 rows read, 30 used, 4 excluded/)).toBeTruthy();
  });

  it("flags unknown and missing levels against the plan", () => {
    render(<ValidationReport report={report} levels={levels} stored />);
    expect(screen.getByText("not a planned level")).toBeTruthy();
    expect(screen.getByText("planned, not in the file")).toBeTruthy();
    expect(screen.getByText(/Unknown level: “Steem”/)).toBeTruthy();
    const sealed = screen.getByText("Sealed").closest("tr")!;
    expect(sealed.textContent).toMatch(/0/);
  });

  it("a refused file says nothing was stored", () => {
    render(<ValidationReport report={report} levels={levels} stored={false} />);
    expect(screen.getByRole("heading", { name: "The file was read but not stored" })).toBeTruthy();
    expect(screen.getByText(/nothing was saved/)).toBeTruthy();
  });
});
