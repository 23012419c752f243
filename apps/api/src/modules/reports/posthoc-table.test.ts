import { analyze, posthocFamilyFor } from "@waymark/stats";
import { describe, expect, it } from "vitest";
import { intervalPairs, posthocTable } from "./posthoc-table.js";

// Invented values; the interval numbers themselves are checked against scipy in
// packages/stats/src/posthoc/posthoc-intervals.test.ts. Here: every family the report can
// print carries its interval, and a missing one is explained, never a bare placeholder.
const groups = [
  { name: "Control", values: [10.2, 11.1, 9.8, 10.5, 10.9, 11.4, 9.7, 10.1, 10.8, 10.0] },
  { name: "B", values: [11.9, 12.4, 11.1, 12.8, 11.6, 12.2, 13.0, 11.4, 12.1, 12.6] },
  { name: "C", values: [10.6, 10.1, 11.8, 9.9, 10.4, 12.0, 10.9, 11.2, 10.3, 11.5] },
  { name: "D", values: [9.1, 10.4, 8.8, 9.6, 10.0, 9.3, 8.9, 9.9, 10.2, 9.4] },
];
const result = analyze({ groups, options: { control: "Control" } });

describe("post-hoc table intervals", () => {
  for (const [test, vsControl] of [
    ["welch", true],
    ["kruskal-wallis", true],
    ["kruskal-wallis", false],
    ["anova", true],
    ["welch", false],
  ] as const) {
    it(`${test}${vsControl ? " against the control" : ", all pairs"}: every row has an interval and the figure every pair`, () => {
      const family = posthocFamilyFor(test, vsControl ? "vs-control" : "all-pairs");
      const table = posthocTable(result.posthoc, family, "MPa", 0.05);
      if ("reason" in table) throw new Error(table.reason);
      expect(table.header).toContain("Simultaneous 95% CI");
      const col = table.header.indexOf("Simultaneous 95% CI");
      for (const row of table.rows) expect(row[col]).toMatch(/^\[−?\d+\.\d+, −?\d+\.\d+\]$/);
      expect(table.notes).toEqual([]);
      expect(intervalPairs(result.posthoc, family)).toHaveLength(vsControl ? 3 : 6);
    });
  }

  it("a rank comparison too small for its level says why in a note", () => {
    const tiny = analyze({
      groups: [
        { name: "A", values: [1, 2, 3] },
        { name: "B", values: [4, 5, 6] },
        { name: "C", values: [7, 8, 9] },
      ],
    });
    const table = posthocTable(tiny.posthoc, "dunn", "", 0.05);
    if ("reason" in table) throw new Error(table.reason);
    // 3 vs 3 values: the widest interval has confidence 1 − 2/20 = .90, below 1 − .05/3 (exact Mann–Whitney).
    expect(table.rows[0]![2]).toBe("none (note 1)");
    expect(table.notes[0]).toMatch(/No interval for A vs B: with 3 and 3 values .* confidence 0\.9000/);
    expect(JSON.stringify(table.rows)).not.toMatch(/—|NaN|undefined/);
  });
});

describe("a pair the method cannot compute", () => {
  it("is explained in a note, with no dashes in its row (Games–Howell, two constant groups)", () => {
    const r = analyze({
      groups: [
        { name: "A", values: [5, 5, 5] },
        { name: "B", values: [7, 7, 7] },
        { name: "C", values: [4, 6, 8, 5] },
      ],
    });
    const table = posthocTable(r.posthoc, "games-howell", "", 0.05);
    if ("reason" in table) throw new Error(table.reason);
    expect(table.rows[0]![1]).toBe("not computed (note 1)");
    expect(table.notes[0]).toMatch(/^A vs B was not computed: .*0\/0/);
    expect(JSON.stringify(table.rows)).not.toMatch(/—|NaN|undefined/);
  });
});
