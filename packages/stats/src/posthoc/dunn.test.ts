import { describe, expect, it } from "vitest";
import { dunn } from "./dunn.js";

describe("Dunn's test", () => {
  it("worked by hand: mean ranks 2, 5, 8; σ² = 7.5; z(A, C) = −6/√5", () => {
    const r = dunn([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [4, 5, 6] },
      { name: "C", values: [7, 8, 9] },
    ]);
    if (!r.available) throw new Error(r.reason);
    const ac = r.pairs[1]!;
    expect([ac.a, ac.b, ac.meanRankA, ac.meanRankB]).toEqual(["A", "C", 2, 8]);
    expect(ac.z).toBeCloseTo(-6 / Math.sqrt(5), 13);
    expect(ac.pAdj).toBeGreaterThanOrEqual(ac.p);
    expect(ac.rankBiserial.available && ac.rankBiserial.r).toBe(-1);
  });

  it("ties lower σ² (Dunn's correction), so |z| grows", () => {
    const tied = dunn([
      { name: "A", values: [1, 1, 1, 2] },
      { name: "B", values: [2, 3, 3, 3] },
    ]);
    if (!tied.available) throw new Error(tied.reason);
    expect(tied.tieCorrection).toBe(3 * 3 * 3 - 3 + 8 - 2 + 24);
    // Untied σ² would be N(N+1)/12 = 6.
    const untiedZ = (tied.pairs[0]!.meanRankA - tied.pairs[0]!.meanRankB) / Math.sqrt(6 * 0.5);
    expect(Math.abs(tied.pairs[0]!.z)).toBeGreaterThan(Math.abs(untiedZ));
  });

  it("all values tied: unavailable with a reason, not NaN", () => {
    const r = dunn([
      { name: "A", values: [4, 4] },
      { name: "B", values: [4, 4, 4] },
    ]);
    expect(r.available).toBe(false);
    if (!r.available) expect(r.reason).toMatch(/all 5 values are equal/);
  });

  it("input errors name the group", () => {
    expect(() =>
      dunn([
        { name: "A", values: [1] },
        { name: "B", values: [] },
      ]),
    ).toThrow("Dunn's test needs at least one value in every group; group 'B' has 0");
    expect(() =>
      dunn([
        { name: "A", values: [1, Number.NaN] },
        { name: "B", values: [2] },
      ]),
    ).toThrow(/group 'A' contains NaN/);
  });
});
