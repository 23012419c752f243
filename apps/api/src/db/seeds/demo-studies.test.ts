import { analyze } from "@waymark/stats";
import { describe, expect, it } from "vitest";
import { demoScenarios } from "./demo-data/scenarios.js";

function groupsOf(csv: string) {
  const map = new Map<string, string[]>();
  for (const line of csv.trim().split("\n").slice(1)) {
    const m = /^"((?:[^"]|"")*)",(.*)$/.exec(line)!;
    const name = m[1]!.replace(/""/g, '"');
    map.set(name, [...(map.get(name) ?? []), m[2]!]);
  }
  return [...map].map(([name, values]) => ({ name, values }));
}

describe("demo scenarios", () => {
  it.each(demoScenarios().map((s) => [s.title, s] as const))(
    "%s lands on the test it was built for",
    (_t, s) => {
      const r = analyze({
        groups: groupsOf(s.csv),
        options: {
          policy: "classic-first",
          scale: s.design.scale === "ordinal" ? "ordinal" : "continuous",
          question: s.design.question === "larger-values" ? "larger-values" : "means",
          plannedSizes: s.design.groupSizes === "equal" ? "equal" : "unequal",
          ...(s.design.comparisons === "vs-control" && s.controlLevel ? { control: s.controlLevel } : {}),
        },
      });
      expect(r.recommendation.test).toBe(s.expectedTest);
      expect(groupsOf(s.csv).map((g) => g.name)).toEqual(s.levels);
    },
  );

  it("is the same data on every run (seeded)", () => {
    expect(demoScenarios().map((s) => s.csv)).toEqual(demoScenarios().map((s) => s.csv));
  });
});
