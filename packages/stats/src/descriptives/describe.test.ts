import { describe, expect, it } from "vitest";
import { tQuantile } from "../distributions/t.js";
import { describeGroups } from "./describe.js";
import { quantileSorted } from "./quantile.js";

describe("describeGroups", () => {
  it("matches a hand computation", () => {
    const [g] = describeGroups([{ name: "A", values: [1, 2, 3, 10, null] }]);
    if (!g) throw new Error("none");
    expect(g).toMatchObject({
      n: 4,
      missing: 1,
      mean: 4,
      min: 1,
      max: 10,
      median: 2.5,
      q1: 1.75,
      q3: 4.75,
      iqr: 3,
    });
    // SS = 9 + 4 + 1 + 36 = 50, sd = √(50/3).
    expect(g.sd).toBeCloseTo(Math.sqrt(50 / 3), 15);
    expect(g.ciUpper).toBeCloseTo(4 + (tQuantile(0.975, 3) * Math.sqrt(50 / 3)) / 2, 13);
    // m2 = 12.5, m3 = (−27 − 8 − 1 + 216)/4 = 45, g1 = 45/12.5^1.5, G1 = g1·√12/2.
    expect(g.skewness).toBeCloseTo((45 / 12.5 ** 1.5) * (Math.sqrt(12) / 2), 13);
    // m4 = (81 + 16 + 1 + 1296)/4 = 348.5, g2 = m4/m2² − 3, G2 = 3/(2·1)·(5·g2 + 6).
    expect(g.kurtosis).toBeCloseTo(1.5 * (5 * (348.5 / 156.25 - 3) + 6), 12);
  });

  it("reports quartiles of decimal data without binary noise", () => {
    const [g] = describeGroups([{ name: "C", values: ["4.6", "4.3", "5.2", "4.9", "4.4", "4.7"] }]);
    expect(g).toMatchObject({ median: 4.65, q1: 4.45, q3: 4.85, iqr: 0.4 });
  });

  it("marks skewness and kurtosis unavailable for tiny or constant groups", () => {
    const [a, b] = describeGroups([
      { name: "A", values: [1, 2] },
      { name: "B", values: [3, 3, 3, 3] },
    ]);
    expect(a?.skewness).toMatchObject({ available: false });
    expect(b?.kurtosis).toMatchObject({ available: false, reason: expect.stringContaining("equal") });
    expect(b?.sd).toBe(0);
  });

  it("uses type-7 linear interpolation", () => {
    expect(quantileSorted([1, 2, 3, 4], 0.25)).toBe(1.75);
    expect(quantileSorted([10], 0.5)).toBe(10);
  });
});
