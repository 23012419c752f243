import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { extractGroups } from "../../apps/api/src/modules/datasets/extract-groups.js";
import { parseCsv } from "../../apps/api/src/modules/datasets/parse-upload.js";
import { readGroupedCsv } from "../../packages/stats/src/cli/read-grouped-csv.js";

const fixture = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  "../fixtures/bad-input/value-cells.csv",
);

/** Row numbers each path kept (with the text kept), dropped as missing, and refused. */
interface Outcome {
  kept: [number, string][];
  dropped: number[];
  refused: number[];
}

const byRow = (a: [number, string], b: [number, string]) => a[0] - b[0];

function uploadPath(bytes: Buffer): Outcome {
  const { data, report } = extractGroups(
    parseCsv(bytes),
    { layout: "long", groupColumn: "Line", outcomeColumn: "Yield (g)" },
    [],
  );
  return {
    kept: data.groups.flatMap((g) => g.values.map((v, i) => [g.rows[i]!, v] as [number, string])).sort(byRow),
    dropped: report.excluded.filter((e) => e.reason === "missing").map((e) => e.row),
    refused: report.excluded.filter((e) => e.reason === "non-numeric").map((e) => e.row),
  };
}

function commandLinePath(text: string): Outcome {
  const csv = readGroupedCsv(text, "Line", "Yield (g)");
  // The command line hands over numbers (missing = NaN) or, where a number would change the
  // decimal the engine reads, the cell's text.
  const cells = csv.groups.flatMap((g) =>
    Array.from(
      g.values as ArrayLike<string | number | null | undefined>,
      (v, i) => [g.rows![i]!, Number.isNaN(v) ? "" : String(v ?? "")] as [number, string],
    ),
  );
  return {
    kept: cells.filter(([, v]) => v !== "").sort(byRow),
    dropped: cells
      .filter(([, v]) => v === "")
      .map(([r]) => r)
      .sort((a, b) => a - b),
    refused: csv.refused.map((r) => r.line),
  };
}

describe("one reader of values for uploads and the command line (tests/fixtures/bad-input/value-cells.csv)", () => {
  const bytes = fs.readFileSync(fixture);
  const upload = uploadPath(bytes);
  const cli = commandLinePath(bytes.toString("utf8"));

  it("keeps, drops and refuses the same cells on both paths", () => {
    expect(cli).toEqual(upload);
  });

  it("keeps plain decimals, drops the missing tokens, refuses the rest (stated rules of readValue)", () => {
    // Row numbers as a spreadsheet shows them (header = row 1); see the fixture.
    expect(upload.kept).toEqual([
      [2, "10.5"],
      [3, "11"],
      [9, "12"],
      [15, "9"],
      [22, "9.5"],
      [23, "12.5"],
      [26, "7.25"],
    ]);
    // NA . - null (empty) N/A NaN
    expect([...upload.dropped].sort((a, b) => a - b)).toEqual([4, 5, 6, 7, 8, 21, 27]);
    expect([...upload.refused].sort((a, b) => a - b)).toEqual([
      10, 11, 12, 13, 14, 16, 17, 18, 19, 20, 24, 25,
    ]);
  });

  it("names the cause and the place of each kind of refusal in the upload's report", () => {
    const { report } = extractGroups(
      parseCsv(bytes),
      { layout: "long", groupColumn: "Line", outcomeColumn: "Yield (g)" },
      [],
    );
    const text = report.messages.join("\n");
    expect(report.usable).toBe(false); // 1e309 and a 400-digit integer cannot be held
    expect(text).toMatch(/Row 18, column "Yield \(g\)": "1e309" is too large to hold/);
    expect(text).toMatch(/Row 10, .*"1,234\.5" uses a comma as a thousands separator/);
    expect(text).toMatch(/Row 11, .*"4,5" uses a decimal comma/);
    expect(text).toMatch(/Row 12, .*U\+2212/);
    expect(text).toMatch(/Row 13, .*digits other than 0–9.*\(1 more cell like it\)/);
    expect(text).toMatch(/Row 16, .*"12 kg" has text after the number.*\(1 more cell like it\)/);
    expect(text).toMatch(/Row 17, .*"0x1F" is a hexadecimal number/);
    expect(text).toMatch(/"Infinity" is infinite/);
    expect(text).toMatch(/"1e-400" is too close to 0/);
  });
});
