import { describe, expect, it } from "vitest";
import { StatsInputError } from "../errors.js";
import { welchAnova } from "./welch-anova.js";

describe("welchAnova", () => {
  it("matches a hand computation (two groups: F is the squared Welch t)", () => {
    // A: mean 2, var 1, n 3; B: mean 6, var 4, n 3. t = 4/√(1/3 + 4/3) → t² = 9.6;
    // Λ = (0.2² + 0.8²)/2 = 0.34, df2 = 3/(3·0.34) = 2.941…
    const w = welchAnova([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [4, 6, 8] },
    ]);
    if (!w.available) throw new Error(w.reason);
    expect(w.F).toBeCloseTo(9.6, 13);
    expect(w.df1).toBe(1);
    expect(w.df2).toBeCloseTo(3 / 1.02, 13);
  });

  it("explains a zero-variance group instead of returning NaN", () => {
    const w = welchAnova([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [4, 4, 4] },
      { name: "C", values: [5, 6] },
    ]);
    expect(w).toEqual({
      available: false,
      reason:
        "Welch's ANOVA weights each group by n/variance; group 'B' has zero variance, so the weights cannot be formed",
    });
  });

  it("throws in the engine's message pattern for a one-value group", () => {
    expect(() =>
      welchAnova([
        { name: "A", values: [1, 2] },
        { name: "B", values: [3] },
      ]),
    ).toThrow(new StatsInputError("Welch's ANOVA needs at least two values in every group; group 'B' has 1"));
  });
});
