import { analyze, posthocFamilyFor } from "@waymark/stats";
import { describe, expect, it } from "vitest";
import type { Analysis } from "../analyses/analysis.entity.js";
import type { Dataset } from "../datasets/dataset.entity.js";
import type { Study } from "../studies/study.entity.js";
import { buildReport } from "./build-report.js";

// Invented data: four curing methods, the first the control.
const groups = [
  { name: "Standard", values: [30.1, 31.4, 29.8, 30.6, 31.0, 30.3, 29.5, 30.9] },
  { name: "Steam", values: [32.2, 33.0, 31.8, 32.6, 33.4, 32.1, 31.9, 32.8] },
  { name: "Membrane", values: [30.8, 31.1, 30.2, 31.6, 30.5, 31.9, 30.0, 31.3] },
  { name: "Wet burlap", values: [31.5, 30.9, 32.0, 31.2, 31.8, 30.7, 32.3, 31.1] },
];

function input(comparisons: "vs-control" | "all-pairs", test: "welch" | "kruskal-wallis") {
  const result = analyze({
    groups,
    options: { control: "Standard", comparisons, alpha: 0.05 },
  });
  const study = {
    id: 1,
    title: "Curing",
    context: "general",
    outcomeName: "Strength",
    outcomeUnit: "MPa",
    factorName: "Curing method",
    levels: groups.map((g) => g.name),
    controlLevel: "Standard",
    design: { comparisons, hasControl: "yes", scale: "continuous", assignment: "randomized" },
    plan: { policy: "welch-first", adjust: "holm", alpha: 0.05, power: null },
    planLockedAt: new Date("2026-11-01T10:00:00Z"),
  } as unknown as Study;
  const dataset = {
    version: 1,
    fileName: "curing.csv",
    sha256: "ab".repeat(32),
    uploadedAt: new Date("2026-11-02T10:00:00Z"),
    report: { rowsRead: 32, rowsUsed: 32, excluded: [], excludedCount: 0 },
  } as unknown as Dataset;
  const posthocMethod = posthocFamilyFor(test, comparisons);
  const analysis = {
    id: 7,
    chosenTest: test,
    recommendedTest: test,
    posthocMethod,
    engineVersion: "test",
    overrideJustification: null,
    summary: [],
    result,
  } as unknown as Analysis;
  return {
    study,
    dataset,
    analysis,
    signature: null,
    appVersion: "test",
    generatedAt: new Date(),
    draft: true,
  };
}

const text = (blocks: ReturnType<typeof buildReport>) => JSON.stringify(blocks);

describe("report: family size and intervals as planned", () => {
  it("each group against the control, k = 4: m = 3 and 1 − 0.95³ = .143 (arithmetic)", () => {
    const t = text(buildReport(input("vs-control", "welch")));
    expect(t).toMatch(/With m = 3 comparisons against Standard, .* up to \.143/);
    expect(t).not.toMatch(/m = 6/);
  });
  it("all pairs, k = 4: m = 6 and 1 − 0.95⁶ = .265 (arithmetic)", () => {
    expect(text(buildReport(input("all-pairs", "welch")))).toMatch(/With m = 6 comparisons, .* up to \.265/);
  });
  for (const [c, test] of [
    ["vs-control", "welch"],
    ["vs-control", "kruskal-wallis"],
    ["all-pairs", "kruskal-wallis"],
  ] as const) {
    it(`${test}, ${c}: the table holds intervals, the figure is there, no placeholder`, () => {
      const blocks = buildReport(input(c, test));
      const table = blocks.find((b) => b.type === "table" && b.caption.startsWith("Table 2"));
      expect(table).toBeDefined();
      expect(blocks.some((b) => b.type === "figure" && b.figure === "intervals")).toBe(true);
      const t = text([table!]);
      expect(t).toMatch(/Simultaneous 95% CI/);
      expect(t).not.toMatch(/—|NaN|undefined|not available/);
      expect(text(blocks)).toMatch(c === "vs-control" ? /level 1 − α\/3/ : /level 1 − α\/6/);
    });
  }
});
