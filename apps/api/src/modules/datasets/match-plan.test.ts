import { describe, expect, it } from "vitest";
import type { ValidationReport } from "./extract-groups.js";
import { applyLevelMap, levelKey, matchPlan, planMismatchMessage } from "./match-plan.js";

const report = (groups: [string, number][], unknown: string[] = []): ValidationReport => ({
  rowsRead: 0,
  rowsUsed: 0,
  excluded: [],
  excludedCount: 0,
  groupsFound: groups.map(([name, n]) => ({ name, n })),
  unknownLevels: unknown,
  missingLevels: [],
  messages: [],
  usable: true,
});
const PLAN = ["Open bay", "Sealed Dock", "Cold room", "Yard"];

describe("data against the plan's levels", () => {
  it("accepts every planned level with at least two values and nothing else", () => {
    expect(matchPlan(report(PLAN.map((l) => [l, 2])), PLAN).matches).toBe(true);
  });

  it("refuses 2 of 4 planned levels, naming the missing ones", () => {
    const m = matchPlan(
      report([
        ["Open bay", 5],
        ["Yard", 6],
      ]),
      PLAN,
    );
    expect(m).toMatchObject({ matches: false, missing: ["Sealed Dock", "Cold room"] });
    expect(planMismatchMessage(m)).toBe(
      'The data do not match the plan. No data for the planned levels "Sealed Dock", "Cold room".',
    );
  });

  it("refuses a planned level with one value and a group the plan does not name", () => {
    const m = matchPlan(
      report(
        [
          ["Open bay", 5],
          ["Sealed Dock", 1],
          ["Cold room", 4],
          ["Yard", 3],
        ],
        ["Roof"],
      ),
      PLAN,
    );
    expect(m.tooSmall).toEqual([{ level: "Sealed Dock", n: 1 }]);
    expect(m.unplanned).toEqual(["Roof"]);
    expect(planMismatchMessage(m)).toMatch(/"Sealed Dock" has 1 value; .* does not name: "Roof"; map it/);
  });

  it("offers near-miss names (case, spacing, punctuation, accents) for mapping", () => {
    expect(levelKey("Sealed  Dock")).toBe(levelKey("sealed dock"));
    expect(levelKey("Cold-room.")).toBe(levelKey("cold room"));
    expect(levelKey("Café")).toBe(levelKey("cafe"));
    expect(levelKey("Yard 1")).not.toBe(levelKey("Yard"));
    const m = matchPlan(
      report(
        [
          ["Open bay", 5],
          ["Yard", 6],
        ],
        ["sealed dock", "COLD ROOM", "Roof"],
      ),
      PLAN,
    );
    expect(m.suggestions).toEqual([
      { found: "sealed dock", planned: "Sealed Dock" },
      { found: "COLD ROOM", planned: "Cold room" },
    ]);
    expect(planMismatchMessage(m)).toMatch(
      /"sealed dock" looks like the planned level "Sealed Dock"; confirm it with levelMap/,
    );
  });

  it("applies a confirmed mapping: the group takes the planned name and the plan then matches", () => {
    const data = {
      groups: [
        { name: "Open bay", values: ["1", "2"], rows: [2, 3] },
        { name: "sealed dock", values: ["3", "4"], rows: [4, 5] },
        { name: "Cold room", values: ["5", "6"], rows: [6, 7] },
        { name: "Yard", values: ["7", "8"], rows: [8, 9] },
      ],
    };
    const r = report([
      ["Open bay", 2],
      ["sealed dock", 2],
      ["Cold room", 2],
      ["Yard", 2],
    ]);
    const mapped = applyLevelMap(data, r, PLAN, { "sealed dock": "Sealed Dock" });
    expect(mapped.data.groups.map((g) => g.name)).toEqual(PLAN);
    expect(matchPlan(mapped.report, PLAN).matches).toBe(true);
    expect(() => applyLevelMap(data, r, PLAN, { "sealed dock": "Loft" })).toThrow(
      /not one of the plan's levels/,
    );
  });
});
